/**
 * Pseudo-random numbers in [0, 1) that come out the same every time from the same start, so demo
 * data and benchmark data are identical on every machine (a linear congruential generator with
 * the constants from Numerical Recipes; nothing here needs more than that).
 */
export function repeatableRandom(start: number): () => number {
  let state = start >>> 0;
  return () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 4294967296;
}
