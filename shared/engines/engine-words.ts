import type { EnginePosition, Installation, TachSource } from './engine.schema';

/*
 * How an engine's stored values read on screen. Type imports only: the deck loads this module and
 * must not pull in the schema library. "Four-stroke" and "two-stroke" are spelt this one way
 * everywhere (capital only at the start of a label).
 */

type Fuel = 'petrol' | 'diesel';
type Cycle = 'two-stroke' | 'four-stroke';

export const POSITION_WORDS: Record<EnginePosition, string> = {
  single: 'Single',
  port: 'Port',
  starboard: 'Starboard',
  centre: 'Centre',
  inboard: 'Inboard',
};

export const INSTALLATION_WORDS: Record<Installation, string> = {
  outboard: 'Outboard',
  inboard: 'Inboard (shaft)',
  sterndrive: 'Sterndrive',
};

export const FUEL_WORDS: Record<Fuel, string> = { petrol: 'Petrol', diesel: 'Diesel' };

export const CYCLE_WORDS: Record<Cycle, string> = {
  'four-stroke': 'Four-stroke',
  'two-stroke': 'Two-stroke',
};

export const TACH_SOURCE_WORDS: Record<TachSource, string> = {
  'charging-coil': 'Charging coil (under the flywheel)',
  'belt-alternator': 'Belt-driven alternator',
  ignition: 'Ignition pulses',
  none: 'No tachometer signal',
};

/** A position as stored, or a position word for one the list does not know (older devices). */
export const positionWords = (position: string): string =>
  POSITION_WORDS[position as EnginePosition] ?? position;

/** "Petrol, four-stroke": fuel first, the cycle in lower case mid-phrase. */
export const fuelAndCycleWords = (engine: { fuel: Fuel; cycle: Cycle }): string =>
  `${FUEL_WORDS[engine.fuel]}, ${CYCLE_WORDS[engine.cycle].toLowerCase()}`;

/** "Port · Norrvik NV-150 4S": how an engine is named in lists and headings. */
export const engineNameWords = (engine: { position: string; maker: string; model: string }) =>
  `${positionWords(engine.position)} · ${engine.maker} ${engine.model}`.trim();
