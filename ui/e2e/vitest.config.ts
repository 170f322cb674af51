import { defineConfig } from 'vitest/config';

// Browser tests: Debian's Chromium driven by playwright-core against the built app served
// by the real service (global-setup.ts starts it on a free port with a fresh data folder).
export default defineConfig({
  test: {
    name: 'browser',
    root: new URL('.', import.meta.url).pathname,
    include: ['**/*.e2e.ts'],
    globalSetup: ['./global-setup.ts'],
    testTimeout: 120_000,
    hookTimeout: 180_000,
    fileParallelism: false,
  },
});
