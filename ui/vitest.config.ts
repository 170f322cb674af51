import react from '@vitejs/plugin-react';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';

// Component tests in jsdom. Browser (Chromium) tests live in e2e/ with their own config.
export default defineConfig({
  plugins: [react()],
  resolve: { conditions: ['source', ...defaultClientConditions] },
  ssr: { resolve: { conditions: ['source'] } },
  test: {
    name: 'ui',
    environment: 'jsdom',
    include: ['src/**/*.test.tsx', 'src/**/*.test.ts'],
    exclude: ['e2e/**', 'node_modules/**', 'dist/**'],
    setupFiles: ['./src/test/setup.ts'],
    // jsdom renders of whole panels take 1-2 s alone and 5 s or more while the full suite loads
    // both cores; the default 5 s limit then fails tests that are merely slow.
    testTimeout: 20_000,
  },
});
