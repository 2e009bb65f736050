import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// The API runs as its own process in development; the client reaches it through this proxy so
// every request stays same-origin (the session cookie is HttpOnly and SameSite).
const apiTarget = `http://localhost:${process.env.RINGSEAT_API_PORT ?? 3001}`;

export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    sourcemap: true,
  },
  server: {
    proxy: {
      '/api': { target: apiTarget, changeOrigin: false },
      '/dev': { target: apiTarget, changeOrigin: false },
    },
  },
  preview: {
    proxy: {
      '/api': { target: apiTarget, changeOrigin: false },
      '/dev': { target: apiTarget, changeOrigin: false },
    },
  },
});
