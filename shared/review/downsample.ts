/*
 * Long runs have tens of thousands of readings; a chart a few hundred pixels wide shows at most
 * a few hundred of them. Per bucket of the x axis we keep the lowest and the highest point and
 * the first flagged one (out of band), so peaks, troughs and every excursion from the band stay
 * visible while the rest is dropped. The first and the last point are always kept.
 */

/** Indices of the points to keep, in ascending order; all of them when there are few enough. */
export function keepIndices(
  x: readonly number[],
  y: readonly number[],
  flagged: readonly boolean[],
  maxPoints: number,
): number[] {
  const n = x.length;
  if (n <= Math.max(2, maxPoints)) return Array.from({ length: n }, (_, i) => i);
  const buckets = Math.max(1, Math.floor((maxPoints - 2) / 3));
  const first = x[0];
  const span = x[n - 1] - first || 1;
  const keep: number[] = [0];
  let bucket = -1;
  let low = -1;
  let high = -1;
  let flag = -1;
  const flush = () => {
    if (bucket < 0) return;
    for (const i of [low, high, flag].filter((v) => v > 0 && v < n - 1).sort((a, b) => a - b)) {
      if (keep[keep.length - 1] !== i) keep.push(i);
    }
  };
  for (let i = 1; i < n - 1; i++) {
    const b = Math.min(buckets - 1, Math.floor(((x[i] - first) / span) * buckets));
    if (b !== bucket) {
      flush();
      bucket = b;
      low = high = i;
      flag = flagged[i] ? i : -1;
      continue;
    }
    if (y[i] < y[low]) low = i;
    if (y[i] > y[high]) high = i;
    if (flag < 0 && flagged[i]) flag = i;
  }
  flush();
  keep.push(n - 1);
  return keep;
}
