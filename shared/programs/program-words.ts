import type { PhaseBand } from './phase-band.schema';
import type { EngineKind } from './program.schema';
import type { ThrottleCeiling } from './throttle';
import { shareToPercent } from './band-units';

/** How a program's stored values read on screen (type imports only). */

export const ENGINE_KIND_WORDS: Record<EngineKind, string> = {
  'outboard-4-stroke': 'Four-stroke outboard',
  'outboard-2-stroke': 'Two-stroke outboard',
  'inboard-diesel': 'Inboard diesel',
  'sterndrive-petrol': 'Petrol sterndrive',
  any: 'Any engine',
};

export const PERFORMED_BY_WORDS: Record<'workshop' | 'skipper', string> = {
  workshop: 'The workshop',
  skipper: 'The skipper',
};

export const CEILING_WORDS: Record<ThrottleCeiling, string> = {
  idle: 'Idle',
  half: 'Half throttle',
  'three-quarter': 'Three-quarter throttle',
  full: 'Full throttle',
  varied: 'Varied (limits set by the rules)',
};

/** A band as the workshop reads it: rpm, or percent of rated full-throttle rpm (never a 0–1 share). */
export const bandWords = (band: PhaseBand): string =>
  band.kind === 'absolute'
    ? `${band.rpmMin}–${band.rpmMax} rpm`
    : `${shareToPercent(band.shareMin)}–${shareToPercent(band.shareMax)} % of rated full-throttle rpm`;
