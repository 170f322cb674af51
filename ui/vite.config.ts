import react from '@vitejs/plugin-react';
import { defaultClientConditions, defineConfig } from 'vite';

// `source` first: workspace libraries (@poreline/core) resolve to their TypeScript source,
// so the UI never needs a prior `tsc` build of core to run or bundle.
export default defineConfig({
  plugins: [react()],
  resolve: { conditions: ['source', ...defaultClientConditions] },
  server: {
    port: 5173,
    proxy: { '/api': { target: 'http://localhost:3000', changeOrigin: true } },
  },
  preview: {
    proxy: { '/api': { target: 'http://localhost:3000', changeOrigin: true } },
  },
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: true },
});
