import { get, type FieldErrors } from 'react-hook-form';
import type { ProgramFormValues } from './program-form-schema';

/** Empty means "none" for the optional limits; a comma counts as the decimal point. */
export const toNumberOrUndefined = (value: unknown): number | undefined => {
  if (value === null || value === undefined) return undefined;
  if (typeof value === 'number') return Number.isNaN(value) ? undefined : value;
  const text = String(value).trim().replace(',', '.');
  return text === '' ? undefined : Number(text);
};

export const numberOptions = { setValueAs: toNumberOrUndefined };

/** A fresh phase: its id must stay unique within the program, since readings refer to it. */
export const newPhase = (): ProgramFormValues['phases'][number] => ({
  id: `phase-${crypto.randomUUID().slice(0, 8)}`,
  name: '',
  performedBy: 'skipper',
  requiredMinutes: 60,
  throttleCeiling: 'half',
  band: { kind: 'percent-of-rated', percentMin: 0, percentMax: 50 },
  rules: {},
  instructions: '',
});

const PHASE_FIELDS = [
  'id',
  'name',
  'performedBy',
  'requiredMinutes',
  'throttleCeiling',
  'instructions',
  'band',
  'band.kind',
  'band.rpmMin',
  'band.rpmMax',
  'band.percentMin',
  'band.percentMax',
  'rules.changeSpeedEveryMinutes',
  'rules.fullThrottleMaxSeconds',
  'rules.fullThrottleMaxMinutesPerHour',
  'rules.idleMaxMinutes',
] as const;

/** Every field name the server may name in its errors, so each message lands beside its field. */
export function formFieldPaths(phaseCount: number): string[] {
  const top = [
    'name',
    'suits.engineKind',
    'suits.label',
    'notes',
    'firstService.hours',
    'firstService.months',
  ];
  const phases = Array.from({ length: phaseCount }, (_, index) =>
    PHASE_FIELDS.map((field) => `phases.${index}.${field}`),
  );
  return [...top, ...phases.flat()];
}

export type { ProgramFormValues };

/** The server names a stored share band's fields; the form shows them as percent fields. */
export const formFieldOf = (field: string): string =>
  field
    .replace(/\.band\.shareMin$/, '.band.percentMin')
    .replace(/\.band\.shareMax$/, '.band.percentMax');

/** The message of the error at a dotted field name; phase fields sit inside a list and a union, so plain paths are simplest. */
export const errorAt = (errors: FieldErrors, name: string): string | undefined =>
  (get(errors, name) as { message?: string } | undefined)?.message;
