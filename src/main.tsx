import { registerSW } from 'virtual:pwa-register';
import '@fontsource-variable/atkinson-hyperlegible-next';
import '@fontsource-variable/atkinson-hyperlegible-mono';
import './styles/app.css';
import { isDeckPath } from './features/deck/deck-navigation';
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
      if (!isDeckPath(window.location.pathname) || document.visibilityState === 'hidden')
        return window.location.reload();
      const reloadWhenHidden = () =>
        document.visibilityState === 'hidden' && window.location.reload();
      document.addEventListener('visibilitychange', reloadWhenHidden);
    },
  });
}

const container = document.getElementById('root');
if (!container) throw new Error('Ringseat: the page has no #root element.');

/*
 * Two apps share this page. /deck addresses get the deck app, which a phone opens cold at sea and
 * which therefore loads only what the deck needs; every other address gets the workshop app.
 * Moving between them is a page load (both are precached, so it works offline too).
 */
if (isDeckPath(window.location.pathname))
  void import('./deck/deck-main').then((m) => m.renderDeckApp(container));
else void import('./app/app-main').then((m) => m.renderWorkshopApp(container));
