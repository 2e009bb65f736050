import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, renderHook, waitFor } from '@testing-library/react';
import { useWakeLock } from './device';

/** A stand-in for the browser's wake lock at the device boundary (jsdom has none). */
function fakeWakeLock(refuse = false) {
  const sentinels: Array<EventTarget & { released: boolean; release: () => Promise<void> }> = [];
  const request = vi.fn(async () => {
    if (refuse) throw new DOMException('Battery saver is on', 'NotAllowedError');
    const sentinel = Object.assign(new EventTarget(), {
      released: false,
      release: async () => {
        sentinel.released = true;
        sentinel.dispatchEvent(new Event('release'));
      },
    });
    sentinels.push(sentinel);
    return sentinel;
  });
  Object.defineProperty(navigator, 'wakeLock', { value: { request }, configurable: true });
  return { request, sentinels };
}

const setVisibility = (state: 'visible' | 'hidden') => {
  Object.defineProperty(document, 'visibilityState', { value: state, configurable: true });
  document.dispatchEvent(new Event('visibilitychange'));
};

afterEach(() => {
  Reflect.deleteProperty(navigator, 'wakeLock');
  Object.defineProperty(document, 'visibilityState', { value: 'visible', configurable: true });
});

describe('keeping the screen awake during an outing', () => {
  it('takes the lock, and takes it again when the page comes back after the browser dropped it', async () => {
    const { request, sentinels } = fakeWakeLock();
    const { result } = renderHook(() => useWakeLock(true));
    await waitFor(() => expect(result.current).toBe('on'));
    await act(async () => {
      setVisibility('hidden');
      await sentinels[0].release(); // browsers drop the lock when the page is hidden
    });
    expect(result.current).toBe('off');
    await act(async () => setVisibility('visible'));
    await waitFor(() => expect(result.current).toBe('on'));
    expect(request).toHaveBeenCalledTimes(2);
  });

  it('says when the device refuses', async () => {
    fakeWakeLock(true);
    const { result } = renderHook(() => useWakeLock(true));
    await waitFor(() => expect(result.current).toBe('refused'));
  });

  it('says when the browser has no wake lock at all, and asks nothing when no outing runs', () => {
    expect(renderHook(() => useWakeLock(true)).result.current).toBe('unsupported');
    const { request } = fakeWakeLock();
    renderHook(() => useWakeLock(false));
    expect(request).not.toHaveBeenCalled();
  });
});
