import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['source'] },
  ssr: { resolve: { conditions: ['source'] } },
  test: {
    name: 'schema',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
    // A new PGlite database takes ~6 s to initialise (more on a loaded machine).
    hookTimeout: 60_000,
  },
});
