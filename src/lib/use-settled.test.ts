import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, renderHook } from '@testing-library/react';
import { useSettled } from './use-settled';

afterEach(() => vi.useRealTimers());

describe('useSettled', () => {
  it('follows the value only once it has stopped changing for the pause', () => {
    vi.useFakeTimers();
    const { result, rerender } = renderHook(({ value }) => useSettled(value, 250), {
      initialProps: { value: '' },
    });
    rerender({ value: 'ska' });
    act(() => vi.advanceTimersByTime(200));
    rerender({ value: 'skag' });
    act(() => vi.advanceTimersByTime(200));
    expect(result.current).toBe('');
    act(() => vi.advanceTimersByTime(50));
    expect(result.current).toBe('skag');
  });
});
