import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['source'] },
  ssr: { resolve: { conditions: ['source'] } },
  test: {
    name: 'core',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
  },
});
