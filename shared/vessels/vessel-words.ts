import type { VesselType } from './vessel.schema';

/** How each vessel type reads on screen (type import only, so the deck may load it). */
export const VESSEL_TYPE_WORDS: Record<VesselType, string> = {
  workboat: 'Workboat',
  'sport-fishing': 'Sport-fishing boat',
  'sailing-yacht': 'Sailing yacht',
  'motor-yacht': 'Motor yacht',
  rib: 'RIB',
  runabout: 'Runabout',
  other: 'Other',
};
