import type { Program } from '../../../../shared/programs/program.schema';
import type { ProgramDetail } from '../api';

/* A workshop's own program for the program form's tests. */

export const id = '6c1d2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f';

// Figures below are common practice for a small outboard, not one maker's schedule.
export const definition: Program = {
  name: 'Workshop outboard break-in',
  suits: { engineKind: 'outboard-4-stroke', label: '' },
  firstService: { hours: 20, months: 1 }, // common practice; BoatUS "Long Life – Outboard Maintenance"
  notes: '',
  source: 'Common practice; the engine maker’s manual comes first.',
  phases: [
    {
      id: 'p1',
      name: 'Dock run at idle',
      performedBy: 'workshop',
      requiredMinutes: 15,
      throttleCeiling: 'idle', // common practice
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.2 },
      rules: {},
      instructions: 'Check the tell-tale stream.',
    },
    {
      id: 'p2',
      name: 'Below half throttle',
      performedBy: 'skipper',
      requiredMinutes: 60,
      throttleCeiling: 'half', // common practice
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 },
      rules: { changeSpeedEveryMinutes: 15 },
      instructions: 'Vary speed.',
    },
    {
      id: 'p3',
      name: 'Up to three-quarter',
      performedBy: 'skipper',
      requiredMinutes: 60,
      throttleCeiling: 'three-quarter', // common practice
      band: { kind: 'absolute', rpmMin: 2000, rpmMax: 4500 },
      rules: {},
      instructions: 'Vary speed.',
    },
  ],
};

export const program: ProgramDetail = {
  id,
  name: definition.name,
  builtInKey: null,
  copiedFromId: null,
  retiredAt: null,
  suits: definition.suits,
  phaseCount: 3,
  totalMinutes: 135,
  firstService: definition.firstService,
  updatedAt: '2026-05-02T08:00:00.000Z',
  definition,
};
