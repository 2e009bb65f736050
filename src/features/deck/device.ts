import { useEffect, useState } from 'react';

/*
 * The phone's own abilities used on deck: a clock that ticks, the screen wake lock, vibration
 * and the position fix. Each says plainly when the device does not offer it.
 */

/** Now, refreshed every `everyMs`. The timer is computed from stored times, so a late tick never drifts. */
export function useNow(everyMs = 1000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), everyMs);
    const onVisible = () => document.visibilityState === 'visible' && setNow(Date.now());
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      clearInterval(timer);
      document.removeEventListener('visibilitychange', onVisible);
    };
  }, [everyMs]);
  return now;
}

export type WakeLockStatus = 'off' | 'on' | 'refused' | 'unsupported';

/** Keeps the screen on while `active`; the browser drops the lock when the page is hidden, so take it again on return. */
export function useWakeLock(active: boolean): WakeLockStatus {
  const supported = typeof navigator !== 'undefined' && 'wakeLock' in navigator;
  const [status, setStatus] = useState<WakeLockStatus>('off');
  useEffect(() => {
    if (!active || !supported) return;
    let sentinel: WakeLockSentinel | null = null;
    let cancelled = false;
    const acquire = async () => {
      if (document.visibilityState !== 'visible') return;
      try {
        const lock = await navigator.wakeLock.request('screen');
        if (cancelled) return void lock.release();
        sentinel = lock;
        setStatus('on');
        lock.addEventListener('release', () => !cancelled && setStatus('off'));
      } catch {
        if (!cancelled) setStatus('refused');
      }
    };
    const onVisible = () =>
      void (document.visibilityState === 'visible' && sentinel?.released !== false && acquire());
    void acquire();
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      cancelled = true;
      document.removeEventListener('visibilitychange', onVisible);
      void sentinel?.release().catch(() => undefined);
      setStatus('off');
    };
  }, [active, supported]);
  return active && !supported ? 'unsupported' : status;
}

/** A buzz where the device can (most phones; not iPhones). */
export function buzz(pattern: number | number[]): void {
  if (typeof navigator !== 'undefined' && typeof navigator.vibrate === 'function')
    navigator.vibrate(pattern);
}

export type GpsStatus = 'off' | 'waiting' | 'ok' | 'denied' | 'unsupported';

export interface GpsFix {
  status: GpsStatus;
  speedKn: number | null;
  lat: number | null;
  lon: number | null;
}

const KNOTS_PER_M_PER_S = 3600 / 1852; // a knot is 1852 m per hour

/** Speed over ground from the device's position while `enabled` (the browser asks the skipper first). */
export function useGpsSpeed(enabled: boolean): GpsFix {
  const supported = typeof navigator !== 'undefined' && 'geolocation' in navigator;
  const [fix, setFix] = useState<GpsFix>({
    status: 'waiting',
    speedKn: null,
    lat: null,
    lon: null,
  });
  useEffect(() => {
    if (!enabled || !supported) return;
    const watch = navigator.geolocation.watchPosition(
      ({ coords }) =>
        setFix({
          status: 'ok',
          speedKn:
            coords.speed === null || Number.isNaN(coords.speed)
              ? null
              : Math.round(coords.speed * KNOTS_PER_M_PER_S * 10) / 10,
          lat: coords.latitude,
          lon: coords.longitude,
        }),
      (error) =>
        setFix({
          status: error.code === error.PERMISSION_DENIED ? 'denied' : 'waiting',
          speedKn: null,
          lat: null,
          lon: null,
        }),
      { enableHighAccuracy: true, maximumAge: 5000 },
    );
    return () => navigator.geolocation.clearWatch(watch);
  }, [enabled, supported]);
  if (!enabled) return { status: 'off', speedKn: null, lat: null, lon: null };
  return supported ? fix : { status: 'unsupported', speedKn: null, lat: null, lon: null };
}
