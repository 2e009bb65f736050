import type { ChecklistInput } from './checklist.schema';
import type { ChecklistEvaluation } from './evaluate-checklist';

/** GET/PUT /api/engines/:id/checklist answer. `id` is null until the checklist is first saved. */
export interface ChecklistView {
  id: string | null;
  engineId: string;
  entries: ChecklistInput;
  evaluation: ChecklistEvaluation;
  updatedAt: string | null;
  updatedBy: { id: string; name: string } | null;
  completedAt: string | null;
  completedBy: { id: string; name: string } | null;
  /** The latest time a completed checklist was reopened, and why; null if it never was. */
  reopened: { at: string; byName: string; reason: string } | null;
}
