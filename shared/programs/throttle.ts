import { z } from 'zod/mini';
import '../zod-english';

/** Where the skipper's throttle lever sits, as logged with a reading. */
export const THROTTLE_POSITIONS = ['idle', 'quarter', 'half', 'three-quarter', 'full'] as const;
export const ThrottlePositionSchema = z.enum(THROTTLE_POSITIONS, {
  error:
    'The throttle position (throttle) must be one of idle, quarter, half, three-quarter or full.',
});
export type ThrottlePosition = z.infer<typeof ThrottlePositionSchema>;

/** A phase's throttle ceiling; 'varied' sets no ceiling and leaves the limits to the rules. */
export const THROTTLE_CEILINGS = ['idle', 'half', 'three-quarter', 'full', 'varied'] as const;
export const ThrottleCeilingSchema = z.enum(THROTTLE_CEILINGS, {
  error:
    'The throttle ceiling (throttleCeiling) must be one of idle, half, three-quarter, full or varied.',
});
export type ThrottleCeiling = z.infer<typeof ThrottleCeilingSchema>;

const POSITION_RANK: Record<ThrottlePosition, number> = {
  idle: 0,
  quarter: 1,
  half: 2,
  'three-quarter': 3,
  full: 4,
};
const CEILING_RANK: Record<ThrottleCeiling, number> = {
  idle: 0,
  half: 2,
  'three-quarter': 3,
  full: 4,
  varied: 4,
};

export const throttleAboveCeiling = (
  position: ThrottlePosition,
  ceiling: ThrottleCeiling,
): boolean => POSITION_RANK[position] > CEILING_RANK[ceiling];
