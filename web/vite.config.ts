import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const webRoot = fileURLToPath(new URL('.', import.meta.url));
// The fonts live in the repository's fonts/ folder, outside web/, so the dev server must be allowed to read them.
const repoRoot = fileURLToPath(new URL('..', import.meta.url));

export default defineConfig({
  root: webRoot,
  plugins: [react(), tailwindcss()],
  resolve: { tsconfigPaths: true },
  build: {
    outDir: fileURLToPath(new URL('./dist', import.meta.url)),
    emptyOutDir: true,
  },
  server: {
    host: '127.0.0.1',
    port: 4316,
    strictPort: true,
    fs: { allow: [repoRoot] },
    // Keep the browser's Host and cookies: the API sees the same origin the page was loaded from.
    proxy: { '/api': { target: 'http://127.0.0.1:4310', changeOrigin: false } },
  },
  preview: { host: '127.0.0.1', port: 4316, strictPort: true },
});
