import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';

// Lazy routes are transformed on first import; on a busy machine that outlasts the 1 s default.
configure({ asyncUtilTimeout: 5000 });

// Testing Library unmounts after each test only when test globals exist; we keep them off.
afterEach(() => {
  cleanup();
  window.localStorage.clear();
});

// jsdom lacks ResizeObserver, which Radix primitives (scroll areas) observe.
if (!('ResizeObserver' in globalThis)) {
  class ResizeObserverStub {
    observe() {}
    unobserve() {}
    disconnect() {}
  }
  (globalThis as unknown as { ResizeObserver: typeof ResizeObserverStub }).ResizeObserver = ResizeObserverStub;
}
