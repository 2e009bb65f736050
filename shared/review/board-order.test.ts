import { describe, expect, it } from 'vitest';
import { actionGroup, compareForAction, needsAction, type RankedRun } from './board-order';

const run = (over: Partial<RankedRun> & Pick<RankedRun, 'state'>): RankedRun => ({
  flags: [],
  lastActivityMs: 0,
  submittedAtMs: null,
  ...over,
});

describe('the runs board order', () => {
  it('puts submitted runs first, then flagged open runs, then engines due for service, then the rest', () => {
    const rows = {
      planned: run({ state: 'planned', lastActivityMs: 900 }),
      quiet: run({ state: 'under-way', lastActivityMs: 800 }),
      breached: run({ state: 'under-way', flags: ['breach'], lastActivityMs: 100 }),
      skewed: run({ state: 'returned', flags: ['clock-skew'], lastActivityMs: 200 }),
      serviceDue: run({ state: 'signed-off', flags: ['service-overdue'], lastActivityMs: 50 }),
      done: run({ state: 'signed-off', lastActivityMs: 1000 }),
      waiting: run({ state: 'returned', lastActivityMs: 700 }),
      submittedLate: run({ state: 'submitted', submittedAtMs: 500, lastActivityMs: 500 }),
      submittedEarly: run({ state: 'submitted', submittedAtMs: 300, lastActivityMs: 300 }),
    };
    const order = Object.entries(rows)
      .sort(([, a], [, b]) => compareForAction(a, b))
      .map(([name]) => name);
    expect(order).toEqual([
      'submittedEarly',
      'submittedLate',
      'skewed',
      'breached',
      'serviceDue',
      'quiet',
      'waiting',
      'planned',
      'done',
    ]);
  });

  it('says which groups need the workshop now', () => {
    expect(needsAction(actionGroup(run({ state: 'submitted' })))).toBe(true);
    expect(needsAction(actionGroup(run({ state: 'under-way', flags: ['breach'] })))).toBe(true);
    expect(
      needsAction(actionGroup(run({ state: 'signed-off', flags: ['service-due-soon'] }))),
    ).toBe(true);
    expect(needsAction(actionGroup(run({ state: 'under-way' })))).toBe(false);
    expect(needsAction(actionGroup(run({ state: 'signed-off' })))).toBe(false);
  });
});
