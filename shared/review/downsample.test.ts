import { describe, expect, it } from 'vitest';
import { keepIndices } from './downsample';

describe('thinning a long series for the chart', () => {
  it('keeps every point of a short series', () => {
    expect(keepIndices([0, 1, 2], [5, 6, 7], [false, false, false], 10)).toEqual([0, 1, 2]);
  });

  it("keeps first, last, each bucket's lowest and highest and every lone excursion from the band", () => {
    const n = 36_000;
    const x = Array.from({ length: n }, (_, i) => i / 12); // a reading every 5 s, in minutes
    const y = x.map((_, i) => 3000 + ((i * 7919) % 400)); // wobble between 3000 and 3399
    const flagged = x.map(() => false);
    y[12_345] = 5200; // one spike over the band
    flagged[23_456] = true; // one reading over by throttle, rpm unremarkable
    const kept = keepIndices(x, y, flagged, 600);
    expect(kept.length).toBeLessThanOrEqual(600);
    expect(kept[0]).toBe(0);
    expect(kept.at(-1)).toBe(n - 1);
    expect(kept).toContain(12_345);
    expect(kept).toContain(23_456);
    expect([...kept].sort((a, b) => a - b)).toEqual(kept);
    expect(new Set(kept).size).toBe(kept.length);
    expect(Math.min(...kept.map((i) => y[i]))).toBe(Math.min(...y));
  });
});
