import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { durationWords } from './duration-words';
import { orderEvents } from './event-order';
import { maxTotalInWindow, SteadyTracker, StretchTracker, type Stretch } from './stretches';
import { reading, start, T0 } from './test-events';

// Made-up segments; the expectations are arithmetic.
describe('StretchTracker', () => {
  it('joins back-to-back segments and breaks at gaps and segments that do not belong', () => {
    const tracker = new StretchTracker();
    tracker.add(0, 10, true);
    tracker.add(10, 20, true);
    tracker.add(25, 30, true);
    tracker.add(30, 40, false);
    tracker.add(40, 50, true);
    tracker.close();
    expect(tracker.kept).toEqual([
      { fromMs: 0, toMs: 20 },
      { fromMs: 25, toMs: 30 },
      { fromMs: 40, toMs: 50 },
    ]);
  });

  it('keeps only stretches longer than its limit', () => {
    const tracker = new StretchTracker(10);
    tracker.add(0, 10, true);
    tracker.add(20, 31, true);
    tracker.close();
    expect(tracker.kept).toEqual([{ fromMs: 20, toMs: 31 }]);
  });
});

describe('SteadyTracker', () => {
  it('measures against the starting rpm; a segment that does not count ends the stretch', () => {
    const tracker = new SteadyTracker();
    tracker.add(0, 10, 2000, true);
    tracker.add(10, 20, 2199, true);
    tracker.add(20, 30, 2200, true); // 200 rpm from 2000: a change (common practice, no single source)
    tracker.add(30, 40, 800, false);
    tracker.add(40, 50, 2200, true);
    tracker.close();
    expect(tracker.kept).toEqual([
      { fromMs: 0, toMs: 20, rpm: 2000 },
      { fromMs: 20, toMs: 30, rpm: 2200 },
      { fromMs: 40, toMs: 50, rpm: 2200 },
    ]);
  });
});

/** Brute force over every millisecond-aligned window start, for small inputs. */
function bruteForceMax(stretches: Stretch[], windowMs: number): number {
  let best = 0;
  const starts = stretches.flatMap((s) => [
    s.fromMs,
    s.toMs - windowMs,
    s.fromMs - windowMs,
    s.toMs,
  ]);
  for (const from of starts) {
    const to = from + windowMs;
    const total = stretches.reduce(
      (sum, s) => sum + Math.max(0, Math.min(to, s.toMs) - Math.max(from, s.fromMs)),
      0,
    );
    best = Math.max(best, total);
  }
  return best;
}

describe('maxTotalInWindow', () => {
  it('is 0 with no stretches', () => {
    expect(maxTotalInWindow([], 60).totalMs).toBe(0);
  });

  it('caps a stretch longer than the window at the window', () => {
    expect(
      maxTotalInWindow(
        [
          { fromMs: 0, toMs: 500 },
          { fromMs: 600, toMs: 620 },
        ],
        100,
      ),
    ).toEqual({ fromMs: 0, toMs: 100, totalMs: 100 });
  });

  it('matches a brute-force search', () => {
    const stretchesArb = fc
      .array(fc.tuple(fc.integer({ min: 0, max: 50 }), fc.integer({ min: 1, max: 40 })), {
        maxLength: 15,
      })
      .map((parts) => {
        let at = 0;
        return parts.map(([gap, length]) => {
          const fromMs = at + gap;
          at = fromMs + length;
          return { fromMs, toMs: at };
        });
      });
    fc.assert(
      fc.property(stretchesArb, fc.integer({ min: 1, max: 120 }), (stretches, windowMs) => {
        expect(maxTotalInWindow(stretches, windowMs).totalMs).toBe(
          bruteForceMax(stretches, windowMs),
        );
      }),
      { numRuns: 500 },
    );
  });
});

describe('orderEvents', () => {
  it('drops copies delivered twice, wherever they arrive', () => {
    const first = reading(T0, 'p', 2000, 'half');
    const other = reading(T0, 'p', 2500, 'half');
    const ordered = orderEvents([
      { ...first },
      other,
      start(T0 - 1),
      first,
      { ...other },
      { ...first },
    ]);
    expect(ordered.map((e) => e.id)).toEqual([ordered[0].id, first.id, other.id]);
  });

  it('filters to one engine', () => {
    expect(
      orderEvents([start(T0), start(T0, 'engine-starboard')], 'engine-starboard'),
    ).toHaveLength(1);
  });

  it('breaks ties in time by id', () => {
    const a = { ...start(T0), id: '00000000-0000-4000-8000-00000000000b' };
    const b = { ...start(T0), id: '00000000-0000-4000-8000-00000000000a' };
    expect(orderEvents([a, b]).map((e) => e.id)).toEqual([b.id, a.id]);
  });
});

describe('durationWords', () => {
  it.each([
    [0, '0 s'],
    [45_000, '45 s'],
    [120_000, '2 min'],
    [150_000, '2 min 30 s'],
    [3_600_000, '1 h 00 min'],
    [3_900_000, '1 h 05 min'],
    [-5, '0 s'],
  ])('%i ms reads "%s"', (ms, words) => {
    expect(durationWords(ms)).toBe(words);
  });
});
