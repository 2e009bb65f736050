import { z } from 'zod/mini';
import '../zod-english';

/** Highest rpm the app accepts anywhere; no engine in scope turns faster (our sanity bound). */
export const RPM_UPPER_BOUND = 20_000;

const rpmField = (label: string, key: string) =>
  z.number({ error: `Enter the ${label} (${key}) as a number of rpm.` }).check(
    z.minimum(0, { error: `The ${label} (${key}) cannot be negative.` }),
    z.maximum(RPM_UPPER_BOUND, {
      error: `The ${label} (${key}) must be at most ${RPM_UPPER_BOUND} rpm.`,
    }),
  );

const shareField = (label: string, key: string) =>
  z
    .number({
      error: `Enter the ${label} (${key}) as a share of rated full-throttle rpm, from 0 to 1.`,
    })
    .check(
      z.minimum(0, { error: `The ${label} (${key}) must be a share from 0 to 1; it is below 0.` }),
      z.maximum(1, { error: `The ${label} (${key}) must be a share from 0 to 1; it is above 1.` }),
    );

/*
 * "Overlapping or inverted bands" are rejected. We read that as a band whose own limits
 * overlap or cross (lowest ≥ highest), or a share band reaching outside 0..1. Bands of
 * different phases may overlap: "below half" and "below three-quarter" share their lower part.
 */
export const AbsoluteBandSchema = z
  .object({
    kind: z.literal('absolute'),
    rpmMin: rpmField('lowest rpm of the band', 'rpmMin'),
    rpmMax: rpmField('highest rpm of the band', 'rpmMax'),
  })
  .check(
    z.refine((band) => band.rpmMin < band.rpmMax, {
      error: 'The highest rpm of the band (rpmMax) must be above its lowest rpm (rpmMin).',
      path: ['rpmMax'],
    }),
  );

export const ShareOfRatedBandSchema = z
  .object({
    kind: z.literal('share-of-rated'),
    shareMin: shareField('lowest share of the band', 'shareMin'),
    shareMax: shareField('highest share of the band', 'shareMax'),
  })
  .check(
    z.refine((band) => band.shareMin < band.shareMax, {
      error: 'The highest share of the band (shareMax) must be above its lowest share (shareMin).',
      path: ['shareMax'],
    }),
  );

export const PhaseBandSchema = z.discriminatedUnion(
  'kind',
  [AbsoluteBandSchema, ShareOfRatedBandSchema],
  {
    error:
      'The band kind (kind) must be "absolute" (rpm) or "share-of-rated" (share of rated full-throttle rpm).',
  },
);
export type PhaseBand = z.infer<typeof PhaseBandSchema>;

/** A band in engine rpm, after a share band is resolved against an engine's rating. */
export interface RpmBand {
  rpmMin: number;
  rpmMax: number;
}
