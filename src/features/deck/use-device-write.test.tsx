import { describe, expect, it } from 'vitest';
import { act, renderHook, waitFor } from '@testing-library/react';
import { useDeviceWrite } from './use-device-write';

function deferred<T>() {
  let resolve!: (value: T) => void;
  let reject!: (error: unknown) => void;
  const promise = new Promise<T>((res, rej) => {
    resolve = res;
    reject = rej;
  });
  return { promise, resolve, reject };
}

describe('useDeviceWrite', () => {
  it('is pending until every overlapping write ends, and hands back the result', async () => {
    const writes = [deferred<string>(), deferred<string>()];
    let call = 0;
    const { result } = renderHook(() => useDeviceWrite((_: number) => writes[call++].promise));
    let first!: Promise<string>;
    act(() => {
      first = result.current.mutateAsync(1);
      result.current.mutate(2);
    });
    expect(result.current.isPending).toBe(true);
    await act(async () => writes[0].resolve('stored'));
    expect(await first).toBe('stored');
    expect(result.current.isPending).toBe(true);
    await act(async () => writes[1].resolve('stored too'));
    expect(result.current.isPending).toBe(false);
    expect(result.current.error).toBeNull();
  });

  it('keeps the failure for the screen, clears it on the next write, and rejects mutateAsync', async () => {
    let fail = true;
    const { result } = renderHook(() =>
      useDeviceWrite(async (_: number) => {
        if (fail) throw new Error('The device database is full.');
        return 'ok';
      }),
    );
    act(() => result.current.mutate(1));
    await waitFor(() => expect(result.current.error?.message).toBe('The device database is full.'));
    expect(result.current.isPending).toBe(false);
    await expect(act(() => result.current.mutateAsync(2))).rejects.toThrow(
      'The device database is full.',
    );
    fail = false;
    await act(async () => {
      expect(await result.current.mutateAsync(3)).toBe('ok');
    });
    expect(result.current.error).toBeNull();
  });
});
