import type { EngineInput } from '../engines/engine.schema';
import type { ChecklistGroup, ChecklistItemId } from './checklist-items';

/** open: not finished yet (something to measure or answer); the others are final. */
export type ItemVerdict = 'pass' | 'fail' | 'open' | 'not-applicable';

export interface Figure {
  label: string;
  value: string;
}

/** What one item's values mean, in words a technician reads at the boat. */
export interface ItemJudgement {
  verdict: ItemVerdict;
  reasons: string[];
  /** Values the computation worked out (computed RPM, voltage limit, slip…). */
  figures: Figure[];
}

export interface ItemEvaluation extends ItemJudgement {
  id: ChecklistItemId;
  /** Where the item sits in the checklist input, e.g. `tachometer` or `checks.steering`. */
  field: string;
  label: string;
  group: ChecklistGroup;
}

/** The engine facts the checklist judges against. */
export type ChecklistEngine = Pick<
  EngineInput,
  | 'installation'
  | 'ratedRpmMin'
  | 'ratedRpmMax'
  | 'gearRatio'
  | 'propPitchIn'
  | 'tachSource'
  | 'poles'
  | 'pulleyRatio'
>;

export const open = (...reasons: string[]): ItemJudgement => ({
  verdict: 'open',
  reasons,
  figures: [],
});

/** An item marked not applicable counts only with a note saying why. */
export function notApplicable(entry: {
  notApplicable: boolean;
  note: string;
}): ItemJudgement | null {
  if (!entry.notApplicable) return null;
  if (!entry.note) return open('Marked not applicable: say why in the note.');
  return { verdict: 'not-applicable', reasons: [`Not applicable: ${entry.note}`], figures: [] };
}

export const rpmText = (rpm: number) => `${Math.round(rpm)} rpm`;
export const percentText = (share: number) =>
  `${share >= 0 ? '+' : '−'}${Math.abs(share * 100).toFixed(1)} %`;
export const voltText = (v: number) => `${v.toFixed(2)} V`;
