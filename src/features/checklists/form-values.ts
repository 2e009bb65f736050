import {
  ChargingEntrySchema,
  CheckEntrySchema,
  ChecklistInputSchema,
  FullThrottleEntrySchema,
  IdleEntrySchema,
  TachometerEntrySchema,
  type ChecklistFormInput,
  type ChecklistInput,
} from '../../../shared/checklists/checklist.schema';
import { CHECK_ITEM_IDS } from '../../../shared/checklists/checklist-items';

/** Text to number; empty is "not measured yet" (null); a comma counts as the decimal point. */
export const toNumberOrNull = (value: unknown): number | null => {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number') return value;
  const text = String(value).trim().replace(',', '.');
  return text === '' ? null : Number(text);
};

/** A select's empty choice is "not chosen yet". */
export const toChoiceOrNull = (value: unknown) =>
  value === '' || value === undefined ? null : value;

const sectionOr = <T>(
  schema: { safeParse: (v: unknown) => { success: boolean; data?: T }; parse: (v: unknown) => T },
  value: unknown,
): T => {
  const parsed = schema.safeParse(value);
  return parsed.success ? (parsed.data as T) : schema.parse({});
};

/**
 * What the form holds, judged while it is typed: each part is read on its own, so a typing slip in
 * one field leaves the rest of the checklist judged (the slip itself shows at the field on save).
 */
export function liveEntries(values: ChecklistFormInput): ChecklistInput {
  const checks = Object.fromEntries(
    CHECK_ITEM_IDS.map((id) => [id, sectionOr(CheckEntrySchema, values.checks?.[id] ?? {})]),
  );
  return ChecklistInputSchema.parse({
    tachometer: sectionOr(TachometerEntrySchema, values.tachometer ?? {}),
    charging: sectionOr(ChargingEntrySchema, values.charging ?? {}),
    idleInGear: sectionOr(IdleEntrySchema, values.idleInGear ?? {}),
    fullThrottle: sectionOr(FullThrottleEntrySchema, values.fullThrottle ?? {}),
    checks,
    notes: typeof values.notes === 'string' ? values.notes.slice(0, 2000) : '',
  });
}
