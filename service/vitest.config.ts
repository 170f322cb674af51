import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['source'] },
  ssr: { resolve: { conditions: ['source'] } },
  test: {
    name: 'service',
    include: ['src/**/*.spec.ts', 'test/**/*.spec.ts'],
    // One migrated PGlite template per run (test/global-setup.ts); each file copies it.
    globalSetup: ['test/global-setup.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
