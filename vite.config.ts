import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { VitePWA } from 'vite-plugin-pwa';

// The API runs as its own process in development; the client reaches it through this proxy so
// every request stays same-origin (the session cookie is HttpOnly and SameSite).
const apiTarget = `http://localhost:${process.env.RINGSEAT_API_PORT ?? 3001}`;

/*
 * Installable app that opens at sea with no signal. Workbox precaches the app shell, every
 * route's code, the fonts and the icons; any page address falls back to index.html (the router
 * decides), except the API and the development pages, which must never get the app instead.
 * The service worker is registered from src/main.tsx; with injectRegister off, clientsClaim and
 * skipWaiting must be set here or a new version waits for every tab to close.
 */
const pwa = VitePWA({
  registerType: 'autoUpdate',
  injectRegister: false,
  // The glob below already takes every public file (icons included): listing them again would
  // only repeat them in the precache list.
  includeManifestIcons: false,
  manifest: {
    id: '/',
    name: 'Ringseat break-in logbook',
    short_name: 'Ringseat',
    description:
      'Log a new marine engine\u2019s break-in on deck, with no signal; the workshop reviews and signs it off.',
    lang: 'en',
    start_url: '/deck',
    scope: '/',
    display: 'standalone',
    orientation: 'any',
    // The day palette's paper and ink (src/styles/theme.css); night mode recolours the page itself.
    theme_color: '#f3ead6',
    background_color: '#f3ead6',
    categories: ['productivity', 'utilities'],
    icons: [
      { src: '/icons/ringseat-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/ringseat-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      {
        src: '/icons/ringseat-maskable-512.png',
        sizes: '512x512',
        type: 'image/png',
        purpose: 'maskable',
      },
      { src: '/icons/ringseat.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
    ],
  },
  workbox: {
    globPatterns: ['**/*.{js,css,html,woff2,svg,png}'],
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api\//, /^\/dev\//],
    clientsClaim: true,
    skipWaiting: true,
    cleanupOutdatedCaches: true,
  },
});

export default defineConfig({
  plugins: [react(), tailwindcss(), pwa],
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
