import { BUILT_IN_PROGRAMS } from '../../../shared/programs/built-in-programs';
import { resolvePhaseBand } from '../../../shared/programs/resolve-band';
import type { RpmBand } from '../../../shared/programs/phase-band.schema';
import type { EnginePosition } from '../../../shared/engines/engine.schema';
import type { RunRecord } from '../../lib/db';
import type { VesselView } from '../../../shared/vessels/vessel-view';

/*
 * Made-up records for tests: a twin-engined boat on the built-in four-stroke program, engines
 * rated 5000–6000 rpm with 12-pole charging coils. Demo figures, not advice.
 */

export const T0 = Date.UTC(2026, 11, 2, 9, 0, 0);
export const MIN = 60_000;
export const VESSEL_ID = '11111111-1111-4111-8111-111111111111';

const program = BUILT_IN_PROGRAMS['four-stroke-outboard'];
const rating = { ratedRpmMin: 5000, ratedRpmMax: 6000 };
const bands: Record<string, RpmBand> = Object.fromEntries(
  program.phases.map((p) => [p.id, resolvePhaseBand(p, rating)]),
);

export function testRun(
  position: 'port' | 'starboard',
  overrides: Partial<RunRecord> = {},
): RunRecord {
  const n = position === 'port' ? '1' : '2';
  return {
    id: `2222222${n}-2222-4222-8222-22222222222${n}`,
    state: 'under-way',
    vessel: { id: VESSEL_ID, name: 'Test Tern' },
    engine: {
      id: `3333333${n}-3333-4333-8333-33333333333${n}`,
      position,
      maker: 'Demo',
      model: 'D-150',
      serialNumber: `D150-${n}`,
      ...rating,
    },
    programId: '44444444-4444-4444-8444-444444444444',
    programName: program.name,
    phaseCount: program.phases.length,
    totalMinutes: program.phases.reduce((sum, p) => sum + p.requiredMinutes, 0),
    program,
    bands,
    currentPhaseId: null,
    notes: '',
    clockSkewMs: null,
    lastEventAt: null,
    submittedAt: null,
    submitNote: null,
    rerunFrom: {},
    lastDecision: null,
    certificateNumber: null,
    signedOffAt: null,
    createdAt: new Date(T0).toISOString(),
    updatedAt: new Date(T0).toISOString(),
    ...overrides,
  };
}

export function testVessel(runs: RunRecord[]): VesselView {
  const at = new Date(T0).toISOString();
  return {
    id: VESSEL_ID,
    name: 'Test Tern',
    hin: 'TST00001A626',
    type: 'sport-fishing',
    lengthM: 8,
    homePort: 'Test Harbour',
    skippers: [],
    engines: runs.map((run) => ({
      id: run.engine.id,
      vesselId: VESSEL_ID,
      position: run.engine.position as EnginePosition,
      installation: 'outboard',
      maker: run.engine.maker,
      model: run.engine.model,
      serialNumber: run.engine.serialNumber,
      ratedPowerKw: 110,
      fuel: 'petrol',
      cycle: 'four-stroke',
      ratedRpmMin: run.engine.ratedRpmMin,
      ratedRpmMax: run.engine.ratedRpmMax,
      gearRatio: null,
      propBlades: null,
      propDiameterIn: null,
      propPitchIn: null,
      tachSource: 'charging-coil',
      poles: 12,
      pulleyRatio: null,
      hourMeterAtCommissioning: 1,
      commissionedOn: '2026-11-24',
      createdAt: at,
      updatedAt: at,
    })),
    archivedAt: null,
    updatedAt: at,
  };
}

export const refOf = (run: RunRecord) => ({ runId: run.id, engineId: run.engine.id });
