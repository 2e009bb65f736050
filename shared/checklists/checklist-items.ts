/*
 * The commissioning checklist a workshop fills in at handover. Measured items are judged by the
 * computation core; the rigging and safety items are a technician's pass or fail. The wording is
 * ours, from common practice; the engine maker's manual comes first where it says otherwise.
 */

export const MEASURED_ITEM_IDS = ['tachometer', 'charging', 'idleInGear', 'fullThrottle'] as const;
export type MeasuredItemId = (typeof MEASURED_ITEM_IDS)[number];

export const CHECK_ITEM_IDS = [
  'steering',
  'throttleCable',
  'shiftCable',
  'neutralStart',
  'killSwitch',
  'coolingTellTale',
  'leaks',
  'propellerNut',
] as const;
export type CheckItemId = (typeof CHECK_ITEM_IDS)[number];

export type ChecklistItemId = MeasuredItemId | CheckItemId;
export type ChecklistGroup = 'measured' | 'rigging' | 'safety';

export interface ChecklistItemDefinition {
  id: ChecklistItemId;
  group: ChecklistGroup;
  label: string;
  /** What to do and what counts as a pass, in plain words. */
  guidance: string;
}

export const MEASURED_ITEMS: Record<MeasuredItemId, ChecklistItemDefinition> = {
  tachometer: {
    id: 'tachometer',
    group: 'measured',
    label: 'Tachometer calibration',
    guidance:
      'At a steady speed, measure the AC frequency at the charging coil or alternator tachometer terminal (or read a hand-held ' +
      'optical tachometer) and note what the helm tachometer shows at the same moment.',
  },
  charging: {
    id: 'charging',
    group: 'measured',
    label: 'Charging voltage at cruising RPM',
    guidance:
      'With the engine held at cruising RPM for a few minutes, measure the voltage across the starting battery terminals. ' +
      'Limits are for a 12 V system.',
  },
  idleInGear: {
    id: 'idleInGear',
    group: 'measured',
    label: 'Idle RPM in gear',
    guidance:
      "Engine warm, in forward gear, boat secured or clear water: compare the idle speed with the maker's figure.",
  },
  fullThrottle: {
    id: 'fullThrottle',
    group: 'measured',
    label: 'Full-throttle RPM',
    guidance:
      'On open water with a normal load, trimmed for best speed: hold full throttle briefly and note the steady RPM and, ' +
      'if you have it, the speed over ground.',
  },
};

export const CHECK_ITEMS: Record<CheckItemId, ChecklistItemDefinition> = {
  steering: {
    id: 'steering',
    group: 'rigging',
    label: 'Steering',
    guidance:
      'Lock to lock with the engine stopped: smooth, no binding or slack, every fastener and retaining clip in place.',
  },
  throttleCable: {
    id: 'throttleCable',
    group: 'rigging',
    label: 'Throttle cable adjustment',
    guidance:
      'The lever at idle leaves the engine on its idle stop; the lever fully forward reaches the full-throttle stop.',
  },
  shiftCable: {
    id: 'shiftCable',
    group: 'rigging',
    label: 'Shift cable adjustment',
    guidance:
      'The control detents match forward, neutral and reverse at the gearcase, and each gear engages fully.',
  },
  neutralStart: {
    id: 'neutralStart',
    group: 'safety',
    label: 'Starts in neutral only',
    guidance: 'The starter does not turn with the control in forward or reverse.',
  },
  killSwitch: {
    id: 'killSwitch',
    group: 'safety',
    label: 'Kill switch and lanyard',
    guidance:
      'At idle in neutral, pulling the lanyard stops the engine; the lanyard and its clip are aboard and reach the helm.',
  },
  coolingTellTale: {
    id: 'coolingTellTale',
    group: 'safety',
    label: 'Cooling-water tell-tale',
    guidance:
      'A steady stream from the tell-tale (or raw water at the exhaust) within seconds of starting; temperature normal.',
  },
  leaks: {
    id: 'leaks',
    group: 'safety',
    label: 'No fuel, oil or water leaks',
    guidance:
      'Running and stopped: no leak or fuel smell at fuel lines, filters, hoses, gaskets and hull fittings.',
  },
  propellerNut: {
    id: 'propellerNut',
    group: 'rigging',
    label: 'Propeller and nut',
    guidance:
      "Right propeller for the engine, hub undamaged, nut at the maker's torque with its cotter pin or tab washer in place.",
  },
};

export const ALL_ITEMS: ChecklistItemDefinition[] = [
  ...MEASURED_ITEM_IDS.map((id) => MEASURED_ITEMS[id]),
  ...CHECK_ITEM_IDS.map((id) => CHECK_ITEMS[id]),
];

export const itemLabel = (id: ChecklistItemId): string =>
  (MEASURED_ITEMS as Record<string, ChecklistItemDefinition>)[id]?.label ??
  CHECK_ITEMS[id as CheckItemId].label;
