import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// Paths are relative to the package root, where the npm scripts run (`vite build --config renderer/vite.config.ts`).
export default defineConfig({
  root: 'renderer',
  base: './',
  plugins: [react()],
  // The recompute worker imports app/review and app/engine: bundle it as an ES module worker.
  worker: { format: 'es' },
  build: {
    outDir: '../dist/renderer',
    emptyOutDir: true,
    target: 'chrome130',
    sourcemap: true,
    chunkSizeWarningLimit: 1200,
  },
  server: { strictPort: true },
});
