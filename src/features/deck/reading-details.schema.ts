import { z } from 'zod/mini';
import '../../../shared/zod-english';
import type { PhotoInput } from './deck-store';

/*
 * The optional details of a reading as typed in the form (text in, numbers out). Limits match
 * the shared ReadingSchema, which checks the stored reading again; the speed limit is our own
 * sanity bound (no boat in scope does 80 kn), there to catch a slipped finger.
 */
export const MAX_SPEED_KN = 80;

const NUMBER = /^\d+([.,]\d+)?$/;

const numberText = (label: string, key: string, max: number, unit: string) =>
  z
    .pipe(
      z.string().check(
        z.trim(),
        z.refine((v) => v === '' || !v.startsWith('-'), {
          error: `The ${label} (${key}) cannot be negative.`,
        }),
        z.refine((v) => v === '' || v.startsWith('-') || NUMBER.test(v), {
          error: `Enter the ${label} (${key}) as a number.`,
        }),
      ),
      z.transform((v: string) => (v === '' ? undefined : Number(v.replace(',', '.')))),
    )
    .check(
      z.refine((v) => v === undefined || v <= max, {
        error: `The ${label} (${key}) must be at most ${max} ${unit}.`,
      }),
    );

export const ReadingDetailsSchema = z.object({
  speedKn: numberText('speed over ground', 'speedKn', MAX_SPEED_KN, 'kn'),
  fuelLph: numberText('fuel flow', 'fuelLph', 400, 'L/h'),
  hourMeter: numberText('hour meter', 'hourMeter', 100_000, 'h'),
  note: z
    .string()
    .check(
      z.trim(),
      z.maxLength(1000, { error: 'The note (note) can have at most 1000 characters.' }),
    ),
});
export type ReadingDetailsInput = z.input<typeof ReadingDetailsSchema>;
export type ReadingDetailsValues = z.output<typeof ReadingDetailsSchema>;

export const EMPTY_DETAILS: ReadingDetailsInput = {
  speedKn: '',
  fuelLph: '',
  hourMeter: '',
  note: '',
};

/** The details kept for the next reading: the form's values, its text (to reopen it) and the photo. */
export interface ReadingDetails {
  values: ReadingDetailsValues;
  input: ReadingDetailsInput;
  photo: PhotoInput | null;
}
