import { readFileSync } from 'node:fs';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const { version } = JSON.parse(readFileSync(new URL('./package.json', import.meta.url), 'utf8')) as { version: string };
const apiPort = process.env.API_PORT ?? '3001';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  define: { __APP_VERSION__: JSON.stringify(version) },
  server: {
    host: '127.0.0.1',
    port: 5173,
    // `npm run dev`: Vite serves the client with hot reload and hands /api to the Express server.
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  // The design route's chunk carries three.js (about 1 MB before gzip); every other route stays small.
  build: { outDir: 'dist', sourcemap: true, chunkSizeWarningLimit: 1200 },
});
