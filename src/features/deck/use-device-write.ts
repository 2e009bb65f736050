import { useCallback, useLayoutEffect, useRef, useState } from 'react';

export interface DeviceWrite<A, R> {
  /** Starts the write; a failure shows in `error` (the promise is not left unhandled). */
  mutate: (args: A) => void;
  /** Starts the write and lets the caller await it (and see it fail). */
  mutateAsync: (args: A) => Promise<R>;
  isPending: boolean;
  error: Error | null;
}

/**
 * A write to the device database with its pending and error state, for the deck. The deck loads
 * no server-state library: these writes never touch the network, so retries, caching and
 * network modes have nothing to do. Several writes may overlap; pending lasts until all end.
 */
export function useDeviceWrite<A, R>(write: (args: A) => Promise<R>): DeviceWrite<A, R> {
  const [state, setState] = useState<{ running: number; error: Error | null }>({
    running: 0,
    error: null,
  });
  // The newest write function, for callbacks that keep one identity across renders.
  const latest = useRef(write);
  useLayoutEffect(() => {
    latest.current = write;
  });
  const mutateAsync = useCallback(async (args: A) => {
    setState((s) => ({ running: s.running + 1, error: null }));
    try {
      const result = await latest.current(args);
      setState((s) => ({ ...s, running: s.running - 1 }));
      return result;
    } catch (cause) {
      const error = cause instanceof Error ? cause : new Error(String(cause));
      setState((s) => ({ running: s.running - 1, error }));
      throw error;
    }
  }, []);
  const mutate = useCallback(
    (args: A) => void mutateAsync(args).catch(() => undefined),
    [mutateAsync],
  );
  return { mutate, mutateAsync, isPending: state.running > 0, error: state.error };
}
