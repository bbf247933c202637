import { defineConfig } from 'vite';
import vue from '@vitejs/plugin-vue';

// The Express server serves dist/client in production; in development Vite serves the client and
// hands /api to the server, so cookies stay same-origin in both.
const apiProxy = { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } };

export default defineConfig({
  plugins: [vue()],
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    target: 'es2022',
  },
  server: { host: '127.0.0.1', port: 5173, proxy: apiProxy },
  preview: { host: '127.0.0.1', port: 4173, proxy: apiProxy },
});
