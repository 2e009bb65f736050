import {
  ALL_ITEMS,
  CHECK_ITEM_IDS,
  CHECK_ITEMS,
  MEASURED_ITEMS,
  type CheckItemId,
} from './checklist-items';
import type { CheckEntry, ChecklistInput } from './checklist.schema';
import { evaluateCharging } from './evaluate-charging';
import { evaluateFullThrottle, evaluateIdle } from './evaluate-speeds';
import { evaluateTachometer } from './evaluate-tachometer';
import { open, type ChecklistEngine, type ItemEvaluation, type ItemJudgement } from './evaluation';

export interface ChecklistSummary {
  total: number;
  passed: number;
  failed: number;
  open: number;
  notApplicable: number;
  /** Every item passed or was marked not applicable with a reason. */
  readyToComplete: boolean;
}

export interface ChecklistEvaluation {
  items: ItemEvaluation[];
  summary: ChecklistSummary;
}

/** A rigging or safety item: the technician's own pass or fail. */
export function evaluateCheck(entry: CheckEntry): ItemJudgement {
  if (entry.result === null) return open('Not checked yet.');
  if (entry.result === 'not-applicable') {
    return entry.note
      ? { verdict: 'not-applicable', reasons: [`Not applicable: ${entry.note}`], figures: [] }
      : open('Marked not applicable: say why in the note.');
  }
  const reasons =
    entry.result === 'fail'
      ? ['Marked as failed: put it right and check again before handover.']
      : ['Checked and passed.'];
  if (entry.note && entry.result === 'fail') reasons.push(`Note: ${entry.note}`);
  return { verdict: entry.result, reasons, figures: [] };
}

function checkItem(id: CheckItemId, entry: CheckEntry): ItemEvaluation {
  const { label, group } = CHECK_ITEMS[id];
  return { id, field: `checks.${id}`, label, group, ...evaluateCheck(entry) };
}

function measuredItems(input: ChecklistInput, engine: ChecklistEngine): ItemEvaluation[] {
  const judged = {
    tachometer: evaluateTachometer(input.tachometer, engine),
    charging: evaluateCharging(input.charging),
    idleInGear: evaluateIdle(input.idleInGear),
    fullThrottle: evaluateFullThrottle(input.fullThrottle, engine),
  };
  return (Object.keys(judged) as Array<keyof typeof judged>).map((id) => {
    const { label, group } = MEASURED_ITEMS[id];
    return { id, field: id, label, group, ...judged[id] };
  });
}

/** Every item judged by the computation core, with a count of where the checklist stands. */
export function evaluateChecklist(
  input: ChecklistInput,
  engine: ChecklistEngine,
): ChecklistEvaluation {
  const items = [
    ...measuredItems(input, engine),
    ...CHECK_ITEM_IDS.map((id) => checkItem(id, input.checks[id])),
  ];
  const count = (verdict: ItemEvaluation['verdict']) =>
    items.filter((i) => i.verdict === verdict).length;
  const summary: ChecklistSummary = {
    total: ALL_ITEMS.length,
    passed: count('pass'),
    failed: count('fail'),
    open: count('open'),
    notApplicable: count('not-applicable'),
    readyToComplete: count('fail') === 0 && count('open') === 0,
  };
  return { items, summary };
}

/** Why a checklist cannot be completed yet, one message per item, naming the item. */
export function completionProblems(
  evaluation: ChecklistEvaluation,
): Array<{ field: string; message: string }> {
  return evaluation.items
    .filter((item) => item.verdict === 'fail' || item.verdict === 'open')
    .map((item) => ({
      field: item.field,
      message:
        `${item.label}: ${item.verdict === 'fail' ? 'failed' : 'not finished'}. ${item.reasons[0] ?? ''}`.trim(),
    }));
}
