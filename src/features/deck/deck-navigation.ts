import { useSyncExternalStore, type MouseEvent } from 'react';

/*
 * The deck is its own small app (src/deck): it opens cold at sea and must load little, so it
 * carries no router. It has two pages, /deck and /deck/:vesselId; moving between them uses the
 * History API directly, and any other address is a full page load into the workshop app.
 */

const NAVIGATED = 'ringseat:navigated';

export const isDeckPath = (pathname: string): boolean =>
  pathname === '/deck' || pathname.startsWith('/deck/');

function subscribe(onChange: () => void) {
  window.addEventListener('popstate', onChange);
  window.addEventListener(NAVIGATED, onChange);
  return () => {
    window.removeEventListener('popstate', onChange);
    window.removeEventListener(NAVIGATED, onChange);
  };
}

/** The current path; the component renders again when it changes. */
export const usePathname = (): string =>
  useSyncExternalStore(subscribe, () => window.location.pathname);

/** Goes to `to`: within the deck without reloading, anywhere else as a full page load. */
export function goTo(to: string, options: { replace?: boolean } = {}): void {
  const url = new URL(to, window.location.href);
  if (url.origin !== window.location.origin || !isDeckPath(url.pathname)) {
    if (options.replace) window.location.replace(url.href);
    else window.location.assign(url.href);
    return;
  }
  if (options.replace) window.history.replaceState(null, '', url.href);
  else window.history.pushState(null, '', url.href);
  window.dispatchEvent(new Event(NAVIGATED));
  window.scrollTo(0, 0);
}

/** Click handler for a deck link: plain clicks stay in the page, new-tab and modified clicks do not. */
export function followDeckLink(event: MouseEvent<HTMLAnchorElement>, to: string): void {
  if (
    event.defaultPrevented ||
    event.button !== 0 ||
    event.metaKey ||
    event.ctrlKey ||
    event.shiftKey ||
    event.altKey
  )
    return;
  if (event.currentTarget.target && event.currentTarget.target !== '_self') return;
  event.preventDefault();
  goTo(to);
}
