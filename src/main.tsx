import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { registerSW } from 'virtual:pwa-register';
import '@fontsource-variable/atkinson-hyperlegible-next';
import '@fontsource-variable/atkinson-hyperlegible-mono';
import './styles/app.css';
import { AppProviders, createAppQueryClient } from './app/providers';
import { createAppRouter } from './app/router';
import { applyDisplayMode, readDisplayMode, watchSystemScheme } from './lib/display-mode';

applyDisplayMode(readDisplayMode());
watchSystemScheme();

/*
 * The service worker makes the app open with no signal (built app only; the dev server has none).
 * A new version takes over at once; the reload that follows waits while the deck is on screen
 * (a reading may be half typed) until the page is next hidden, e.g. when the phone locks.
 */
if (import.meta.env.PROD) {
  registerSW({
    immediate: true,
    onNeedReload: () => {
      if (!window.location.pathname.startsWith('/deck') || document.visibilityState === 'hidden') return window.location.reload();
      const reloadWhenHidden = () => document.visibilityState === 'hidden' && window.location.reload();
      document.addEventListener('visibilitychange', reloadWhenHidden);
    },
  });
}

const queryClient = createAppQueryClient();
const router = createAppRouter(queryClient);

const container = document.getElementById('root');
if (!container) throw new Error('Ringseat: the page has no #root element.');

createRoot(container).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);
