import { z } from 'zod';
import { BatteryChemistrySchema } from '../charging/chemistry';
import { CHECK_ITEM_IDS, type CheckItemId } from './checklist-items';

/** An optional measured figure: empty until the technician has measured it. */
const measured = (label: string, min: number, max: number, unit: string) =>
  z
    .number({ error: `${label} must be a number.` })
    .min(min, { error: `${label} must be at least ${min}${unit}.` })
    .max(max, { error: `${label} must be at most ${max}${unit}.` })
    .nullable()
    .default(null);

const wholeRpm = (label: string, min = 100) =>
  z
    .number({ error: `${label} must be a number.` })
    .int({ error: `${label} must be a whole number.` })
    .min(min, { error: `${label} must be at least ${min} rpm.` })
    .max(12000, { error: `${label} must be at most 12,000 rpm.` })
    .nullable()
    .default(null);

const NoteSchema = z
  .string({ error: 'The note must be text.' })
  .trim()
  .max(500, { error: 'A note can have at most 500 characters.' })
  .default('');
const NotApplicableSchema = z
  .boolean({ error: 'Not applicable must be yes or no.' })
  .default(false);

export const TachometerEntrySchema = z.object({
  /** AC frequency at the coil or alternator terminal, Hz. */
  measuredHz: measured('Measured frequency', 1, 5000, ' Hz'),
  /** Engine speed read with a hand-held (optical) tachometer, for engines with no AC signal. */
  referenceRpm: wholeRpm('Hand-held tachometer RPM'),
  /** What the helm tachometer showed at the same moment. */
  tachReadingRpm: wholeRpm('Tachometer reading', 0),
  notApplicable: NotApplicableSchema,
  note: NoteSchema,
});

export const ChargingEntrySchema = z.object({
  chemistry: BatteryChemistrySchema.nullable().default(null),
  measuredV: measured('Charging voltage', 5, 20, ' V'),
  batteryTemperatureC: measured('Battery temperature', -30, 70, ' °C'),
  /** Engine speed while the voltage was read: the check is made at cruising RPM. */
  atRpm: wholeRpm('RPM during the charging check', 500),
  /** The voltage held for minutes, not a passing spike. */
  sustained: z.boolean({ error: 'Held for minutes must be yes or no.' }).default(false),
  notApplicable: NotApplicableSchema,
  note: NoteSchema,
});

export const IdleEntrySchema = z
  .object({
    idleRpm: wholeRpm('Idle RPM in gear'),
    /** The maker's idle range in gear, from the engine manual. */
    specMinRpm: wholeRpm("Maker's idle RPM (low end)"),
    specMaxRpm: wholeRpm("Maker's idle RPM (high end)"),
    notApplicable: NotApplicableSchema,
    note: NoteSchema,
  })
  .refine((e) => e.specMinRpm === null || e.specMaxRpm === null || e.specMinRpm < e.specMaxRpm, {
    path: ['specMaxRpm'],
    error: "The maker's idle RPM high end must be above the low end.",
  });

export const FullThrottleEntrySchema = z.object({
  rpm: wholeRpm('Full-throttle RPM', 500),
  /** Speed over ground at full throttle, knots, for the propeller slip. */
  speedKn: measured('Speed at full throttle', 0, 120, ' kn'),
  notApplicable: NotApplicableSchema,
  note: NoteSchema,
});

export const CHECK_RESULTS = ['pass', 'fail', 'not-applicable'] as const;
export const CheckResultSchema = z.enum(CHECK_RESULTS, {
  error: 'Choose pass, fail or not applicable.',
});
export type CheckResult = z.infer<typeof CheckResultSchema>;

export const CheckEntrySchema = z.object({
  result: CheckResultSchema.nullable().default(null),
  note: NoteSchema,
});

const checkShape = Object.fromEntries(
  CHECK_ITEM_IDS.map((id) => [id, CheckEntrySchema.prefault({})]),
) as Record<CheckItemId, z.ZodPrefault<typeof CheckEntrySchema>>;

/** The whole checklist as the form holds it and the API stores it; every part may still be empty. */
export const ChecklistInputSchema = z.object({
  tachometer: TachometerEntrySchema.prefault({}),
  charging: ChargingEntrySchema.prefault({}),
  idleInGear: IdleEntrySchema.prefault({}),
  fullThrottle: FullThrottleEntrySchema.prefault({}),
  checks: z.object(checkShape).prefault({}),
  notes: z
    .string({ error: 'Notes must be text.' })
    .trim()
    .max(2000, { error: 'Notes can have at most 2000 characters.' })
    .default(''),
});
export type ChecklistInput = z.infer<typeof ChecklistInputSchema>;
export type ChecklistFormInput = z.input<typeof ChecklistInputSchema>;

export type TachometerEntry = z.infer<typeof TachometerEntrySchema>;
export type ChargingEntry = z.infer<typeof ChargingEntrySchema>;
export type IdleEntry = z.infer<typeof IdleEntrySchema>;
export type FullThrottleEntry = z.infer<typeof FullThrottleEntrySchema>;
export type CheckEntry = z.infer<typeof CheckEntrySchema>;

/** A checklist with nothing filled in yet. */
export const emptyChecklist = (): ChecklistInput => ChecklistInputSchema.parse({});

/** POST /api/engines/:id/checklist/reopen: why the handover record is opened again. */
export const ReopenChecklistInputSchema = z.object({
  reason: z
    .string({ error: 'Give the reason (reason) for reopening the checklist.' })
    .trim()
    .min(1, { error: 'Give the reason (reason) for reopening the checklist.' })
    .max(500, { error: 'The reason (reason) can have at most 500 characters.' }),
});
export type ReopenChecklistInput = z.infer<typeof ReopenChecklistInputSchema>;
