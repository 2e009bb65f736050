import { useSyncExternalStore } from 'react';

/** Keep the key and values in step with public/display-mode-boot.js (runs before first paint). */
export const DISPLAY_MODES = ['day', 'night', 'system'] as const;
export type DisplayMode = (typeof DISPLAY_MODES)[number];

const STORAGE_KEY = 'ringseat.display-mode';
// Browser chrome (address bar) colour per mode: the paper colour of each palette.
const THEME_COLOR = { day: '#f3ead6', night: '#000000' } as const;

const isDisplayMode = (value: unknown): value is DisplayMode =>
  typeof value === 'string' && (DISPLAY_MODES as readonly string[]).includes(value);

export function readDisplayMode(): DisplayMode {
  try {
    const saved = window.localStorage.getItem(STORAGE_KEY);
    return isDisplayMode(saved) ? saved : 'system';
  } catch {
    return 'system';
  }
}

const prefersDark = () =>
  typeof window.matchMedia === 'function' &&
  window.matchMedia('(prefers-color-scheme: dark)').matches;

export function applyDisplayMode(mode: DisplayMode): void {
  const root = document.documentElement;
  root.dataset.theme = mode;
  const shown = mode === 'system' ? (prefersDark() ? 'night' : 'day') : mode;
  document.querySelector('meta[name="theme-color"]')?.setAttribute('content', THEME_COLOR[shown]);
}

const listeners = new Set<() => void>();

export function setDisplayMode(mode: DisplayMode): void {
  try {
    window.localStorage.setItem(STORAGE_KEY, mode);
  } catch {
    // Storage blocked: the choice still applies until the page is closed.
  }
  applyDisplayMode(mode);
  listeners.forEach((notify) => notify());
}

function subscribe(notify: () => void) {
  listeners.add(notify);
  return () => listeners.delete(notify);
}

const currentMode = (): DisplayMode => {
  const attribute = document.documentElement.dataset.theme;
  return isDisplayMode(attribute) ? attribute : readDisplayMode();
};

export function useDisplayMode(): [DisplayMode, (mode: DisplayMode) => void] {
  const mode = useSyncExternalStore(subscribe, currentMode, () => 'system' as const);
  return [mode, setDisplayMode];
}

/** In system mode the browser's theme colour must follow the device when it switches. */
export function watchSystemScheme(): () => void {
  if (typeof window.matchMedia !== 'function') return () => {};
  const query = window.matchMedia('(prefers-color-scheme: dark)');
  const onChange = () => applyDisplayMode(currentMode());
  query.addEventListener('change', onChange);
  return () => query.removeEventListener('change', onChange);
}
