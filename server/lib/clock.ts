/** The server's notion of "now"; tests pass a fake one where time matters. */
export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };
