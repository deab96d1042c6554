import { fileURLToPath } from 'node:url';

import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// The API server; in production it serves client/dist itself, so only dev and preview proxy.
const apiTarget = process.env.ENDGRAIN_API_URL ?? 'http://127.0.0.1:3000';
// The workspace's own shared package (symlinks resolve to this real path).
const sharedDir = fileURLToPath(new URL('../shared/', import.meta.url));
const inShared = new RegExp(`^${sharedDir.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`);
const proxy = Object.fromEntries(['/graphql', '/api', '/health'].map((prefix) => [prefix, { target: apiTarget, changeOrigin: false }]));

export default defineConfig({
  root: fileURLToPath(new URL('.', import.meta.url)),
  plugins: [react()],
  server: { port: 5173, strictPort: true, proxy },
  preview: { port: 4173, proxy },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    target: 'es2022',
    rolldownOptions: {
      treeshake: {
        // @endgrain/shared is pure by design but does not say so in its package.json: without this
        // rule one import from its barrel drags zod and the statistics library into the first page.
        moduleSideEffects: [
          { test: inShared, sideEffects: false },
          { test: /\.css$/, sideEffects: true },
        ],
      },
    },
  },
});
