/** Gives the event loop back for a moment (after pending I/O), so long work does not hold up other requests. */
export const nextTurn = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));
