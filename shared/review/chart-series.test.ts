import { describe, expect, it } from 'vitest';
import { accountRun } from '../runs/run-accounting';
import { orderEvents } from '../runs/event-order';
import {
  MIN,
  SEC,
  minutesAfterT0 as m,
  reading,
  start,
  stop,
  testPhase,
  T0,
} from '../runs/test-events';
import { phaseCharts, xAt } from './chart-series';

// Phases and times are made up to exercise the chart's axis; they are not break-in advice.
const phase = testPhase({
  id: 'cruise',
  band: { rpmMin: 1000, rpmMax: 3000 },
  throttleCeiling: 'half',
  requiredMs: 60 * MIN,
});

describe('the review chart of a phase', () => {
  const events = [
    start(m(0)),
    reading(m(0), 'cruise', 2000, 'half'),
    reading(m(10), 'cruise', 3600, 'half'),
    reading(m(13), 'cruise', 2400, 'half'),
    stop(m(20)),
    // A second outing a day later continues on the same axis.
    start(m(24 * 60)),
    reading(m(24 * 60), 'cruise', 2600, 'quarter'),
    stop(m(24 * 60 + 30)),
  ];
  const ordered = orderEvents(events);
  const account = accountRun(events, [phase]);
  const [chart] = phaseCharts(ordered, [phase], account);

  it("plots readings against the phase's running time, with the band and outing marks", () => {
    expect(chart.band).toEqual({ rpmMin: 1000, rpmMax: 3000 });
    expect(chart.points.map((p) => [p.x, p.rpm, p.state])).toEqual([
      [0, 2000, 'in-band'],
      [10, 3600, 'over'],
      [13, 2400, 'in-band'],
      [20, 2600, 'in-band'],
    ]);
    expect(chart.points[3].at).toBe(m(24 * 60));
    // The lone reading of the second outing holds for the 10-minute maximum (DEFAULT_MAX_HOLD_MS, our own choice).
    expect(chart.runMinutes).toBe(30);
    expect(chart.outingStarts).toEqual([20]);
  });

  it('marks each breach over the stretch it covers', () => {
    // Three minutes over the band is past the one-minute allowance (OVER_BAND_GRACE_MS, our own choice).
    expect(chart.breaches).toEqual([
      expect.objectContaining({
        code: 'over-band',
        fromMs: m(10),
        toMs: m(13),
        fromX: 10,
        toX: 13,
      }),
    ]);
  });

  it('maps a time between outings to where the next outing starts', () => {
    const segments = { from: [T0, T0 + 30 * MIN], to: [T0 + 10 * MIN, T0 + 40 * MIN], x: [0, 10] };
    expect(xAt(segments, T0 + 5 * MIN + 30 * SEC)).toBe(5.5);
    expect(xAt(segments, T0 + 20 * MIN)).toBe(10);
    expect(xAt(segments, T0 - 1)).toBe(0);
  });
});
