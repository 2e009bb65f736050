import { describe, expect, it } from 'vitest';
import { ALL_ITEMS, CHECK_ITEM_IDS } from './checklist-items';
import { ChecklistInputSchema, emptyChecklist, type ChecklistFormInput } from './checklist.schema';
import { completionProblems, evaluateChecklist } from './evaluate-checklist';
import type { ChecklistEngine } from './evaluation';

// Rated range 5000–6000 rpm as makers print it for four-stroke outboards (common practice);
// 12-pole charging coil (common practice: rpm = 10 × Hz).
const engine: ChecklistEngine = {
  installation: 'outboard',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2,
  propPitchIn: 21,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
};

const allChecks = (result: 'pass' | 'fail') =>
  Object.fromEntries(CHECK_ITEM_IDS.map((id) => [id, { result }]));

const finished: ChecklistFormInput = {
  tachometer: { measuredHz: 300, tachReadingRpm: 3000 }, // 300 Hz × 10 = 3000 rpm (common practice)
  charging: { chemistry: 'agm', measuredV: 14.4, batteryTemperatureC: 25, atRpm: 3000 }, // inside 13.5–14.7 V (BU-403)
  idleInGear: { specMinRpm: 650, specMaxRpm: 750, idleRpm: 700 }, // the technician's typed maker figure, not a trade value
  fullThrottle: { rpm: 5500 }, // middle of the rated range
  checks: allChecks('pass'),
};

describe('the whole commissioning checklist', () => {
  it('has every item open when nothing is filled in', () => {
    const { items, summary } = evaluateChecklist(emptyChecklist(), engine);
    expect(items.map((i) => i.id)).toEqual(ALL_ITEMS.map((i) => i.id));
    expect(summary).toEqual({
      total: 12,
      passed: 0,
      failed: 0,
      open: 12,
      notApplicable: 0,
      readyToComplete: false,
    });
  });

  it('is ready to complete when every item passes', () => {
    const { summary } = evaluateChecklist(ChecklistInputSchema.parse(finished), engine);
    expect(summary).toMatchObject({ passed: 12, failed: 0, open: 0, readyToComplete: true });
  });

  it('counts a not-applicable item with its reason as done', () => {
    const input = ChecklistInputSchema.parse({
      ...finished,
      checks: {
        ...allChecks('pass'),
        neutralStart: {
          result: 'not-applicable',
          note: 'Tiller model with no start-in-gear lockout',
        },
      },
    });
    expect(evaluateChecklist(input, engine).summary).toMatchObject({
      passed: 11,
      notApplicable: 1,
      readyToComplete: true,
    });
  });

  it('names each item that stops completion', () => {
    const input = ChecklistInputSchema.parse({
      ...finished,
      fullThrottle: { rpm: 6400 },
      checks: { ...allChecks('pass'), killSwitch: { result: 'fail', note: 'Clip missing' } },
    });
    const evaluation = evaluateChecklist(input, engine);
    expect(evaluation.summary.readyToComplete).toBe(false);
    const problems = completionProblems(evaluation);
    expect(problems.map((p) => p.field)).toEqual(['fullThrottle', 'checks.killSwitch']);
    expect(problems[1].message).toBe(
      'Kill switch and lanyard: failed. Marked as failed: put it right and check again before handover.',
    );
  });

  it('keeps what a part-done checklist holds through the schema', () => {
    const parsed = ChecklistInputSchema.parse({
      charging: { chemistry: 'gel' },
      checks: { steering: { result: 'pass' } },
    });
    expect(parsed.charging.chemistry).toBe('gel');
    expect(parsed.checks.steering.result).toBe('pass');
    expect(parsed.checks.leaks.result).toBeNull();
    expect(parsed.tachometer.measuredHz).toBeNull();
  });

  it('names the field of a bad value', () => {
    const result = ChecklistInputSchema.safeParse({
      charging: { measuredV: 48 },
      checks: { steering: { result: 'maybe' } },
    });
    const issues = result.error?.issues.map((i) => [i.path.join('.'), i.message]);
    expect(issues).toEqual([
      ['charging.measuredV', 'Charging voltage must be at most 20 V.'],
      ['checks.steering.result', 'Choose pass, fail or not applicable.'],
    ]);
  });
});
