import { defineConfig } from 'vitest/config';

// One run over every workspace; each package keeps its own config.
// Browser (Chromium) tests have their own config: ui/e2e/vitest.config.ts.
export default defineConfig({
  test: {
    projects: ['core', 'schema', 'demo-wells', 'service', 'ui'],
    // Two cores; each service test file holds a PGlite instance (~300 MB).
    maxWorkers: 2,
  },
});
