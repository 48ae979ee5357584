import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

export default defineConfig({
  // `vite build --config web/vite.config.ts` runs from the repository root: the app's root is this folder.
  root: import.meta.dirname,
  plugins: [react(), tailwindcss()],
  resolve: { tsconfigPaths: true },
  // Relative to root: web/dist.
  build: { outDir: 'dist', emptyOutDir: true },
  server: {
    host: '127.0.0.1',
    port: 4316,
    strictPort: true,
    // The fonts live in the repository's fonts/ folder, outside web/: the dev server may read the whole repository.
    fs: { allow: ['..'] },
    // Keep the browser's Host and cookies: the API sees the same origin the page was loaded from.
    proxy: { '/api': { target: 'http://127.0.0.1:4310', changeOrigin: false } },
  },
  preview: { host: '127.0.0.1', port: 4316, strictPort: true },
});
