import { z } from 'zod';
import { percentToShare, shareToPercent } from '../../../shared/programs/band-units';
import { AbsoluteBandSchema, type PhaseBand } from '../../../shared/programs/phase-band.schema';
import {
  MAX_PHASES,
  PhaseSchema,
  ProgramSchema,
  type Program,
  type ProgramInput,
} from '../../../shared/programs/program.schema';

/*
 * The program form enters a share band in percent of rated full-throttle rpm; the stored program
 * keeps its 0–1 share. Converting here, at the form's edge, keeps one stored shape everywhere
 * else (the runs frozen from it, the device, the accounting). Messages name the form's own fields.
 */

const percentField = (label: string, key: string) =>
  z
    .number({ error: `Enter the ${label} (${key}) as a percent of rated full-throttle rpm.` })
    .min(0, { error: `The ${label} (${key}) cannot be below 0 %.` })
    .max(100, { error: `The ${label} (${key}) cannot be above 100 %.` });

const PercentBandSchema = z
  .object({
    kind: z.literal('percent-of-rated'),
    percentMin: percentField('lowest percent of the band', 'percentMin'),
    percentMax: percentField('highest percent of the band', 'percentMax'),
  })
  .refine((band) => band.percentMin < band.percentMax, {
    error: 'The highest percent of the band (percentMax) must be above its lowest (percentMin).',
    path: ['percentMax'],
  });

const FormBandSchema = z.discriminatedUnion('kind', [AbsoluteBandSchema, PercentBandSchema], {
  error: 'Choose whether the band (kind) is given in rpm or in percent of rated rpm.',
});
export type FormBand = z.input<typeof FormBandSchema>;

const FormPhaseSchema = PhaseSchema.extend({ band: FormBandSchema });

/** A band as stored from a band as entered. */
export function storedBand(band: z.infer<typeof FormBandSchema>): PhaseBand {
  if (band.kind === 'absolute') return band;
  return {
    kind: 'share-of-rated',
    shareMin: percentToShare(band.percentMin),
    shareMax: percentToShare(band.percentMax),
  };
}

/** A band as the form shows it from a band as stored. */
export function formBand(band: PhaseBand): FormBand {
  if (band.kind === 'absolute') return band;
  return {
    kind: 'percent-of-rated',
    percentMin: shareToPercent(band.shareMin),
    percentMax: shareToPercent(band.shareMax),
  };
}

/** Checks the form as entered, then the stored program it becomes (the rules across phases). */
export const ProgramFormSchema = z
  .object({
    ...ProgramSchema.shape,
    phases: z
      .array(FormPhaseSchema, { error: 'The phases (phases) must be a list.' })
      .min(1, { error: 'A program needs at least one phase (phases).' })
      .max(MAX_PHASES, { error: `A program can have at most ${MAX_PHASES} phases (phases).` }),
  })
  .transform((values): ProgramInput => ({
    ...values,
    phases: values.phases.map((phase) => ({ ...phase, band: storedBand(phase.band) })),
  }))
  .pipe(ProgramSchema);

export type ProgramFormValues = Omit<ProgramInput, 'phases'> & {
  phases: Array<Omit<ProgramInput['phases'][number], 'band'> & { band: FormBand }>;
};

/** The form's values for a stored program. */
export const formValuesOf = (program: Program): ProgramFormValues => ({
  ...program,
  phases: program.phases.map((phase) => ({ ...phase, band: formBand(phase.band) })),
});
