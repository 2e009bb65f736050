import type { Program } from './program.schema';
import { FOUR_STROKE_OUTBOARD } from './program-four-stroke-outboard';
import { INBOARD_DIESEL } from './program-inboard-diesel';
import { TWO_STROKE_OUTBOARD } from './program-two-stroke-outboard';

/** Keys are stable: demo data and copied templates refer to them. */
export const BUILT_IN_PROGRAM_KEYS = [
  'four-stroke-outboard',
  'two-stroke-outboard',
  'small-inboard-diesel',
] as const;
export type BuiltInProgramKey = (typeof BUILT_IN_PROGRAM_KEYS)[number];

export const BUILT_IN_PROGRAMS: Readonly<Record<BuiltInProgramKey, Program>> = {
  'four-stroke-outboard': FOUR_STROKE_OUTBOARD,
  'two-stroke-outboard': TWO_STROKE_OUTBOARD,
  'small-inboard-diesel': INBOARD_DIESEL,
};
