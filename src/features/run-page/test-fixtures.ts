import { BUILT_IN_PROGRAMS } from '../../../shared/programs/built-in-programs';
import type { ReviewPhase, RunReviewView } from '../../../shared/review/views';
import type { RunDetail } from '../../../shared/runs/run-view';

/*
 * Made-up answers of GET /api/runs/:id and /review for screen tests: a single outboard on the
 * built-in four-stroke program (bands for a demo engine rated 5000–6000 rpm). Demo figures.
 */

export const RUN_ID = '66666666-6666-4666-8666-666666666666';
const program = BUILT_IN_PROGRAMS['four-stroke-outboard'];
const bands = { 'dock-run': [0, 3000], 'below-half': [0, 3000], 'below-three-quarter': [0, 4500] };

export function runDetail(overrides: Partial<RunDetail> = {}): RunDetail {
  return {
    id: RUN_ID,
    state: 'under-way',
    vessel: { id: '77777777-7777-4777-8777-777777777777', name: 'Little Auk' },
    engine: {
      id: '88888888-8888-4888-8888-888888888888',
      position: 'single',
      maker: 'Demo',
      model: 'D-60',
      serialNumber: 'D60-1',
      ratedRpmMin: 5000,
      ratedRpmMax: 6000,
    },
    programId: '99999999-9999-4999-8999-999999999999',
    programName: program.name,
    phaseCount: program.phases.length,
    totalMinutes: 600,
    currentPhaseId: 'below-half',
    notes: '',
    clockSkewMs: null,
    lastEventAt: null,
    submittedAt: null,
    submitNote: null,
    rerunFrom: {},
    lastDecision: null,
    certificateNumber: null,
    signedOffAt: null,
    createdAt: '2026-05-01T08:00:00Z',
    updatedAt: '2026-05-10T08:00:00Z',
    program,
    bands: Object.fromEntries(
      Object.entries(bands).map(([id, [rpmMin, rpmMax]]) => [id, { rpmMin, rpmMax }]),
    ),
    ...overrides,
  };
}

const MIN = 60_000;

function phase(index: number, timeInBandMs: number, more: Partial<ReviewPhase> = {}): ReviewPhase {
  const p = program.phases[index];
  const [rpmMin, rpmMax] = bands[p.id as keyof typeof bands];
  const requiredMs = p.requiredMinutes * MIN;
  const done = timeInBandMs >= requiredMs;
  return {
    id: p.id,
    name: p.name,
    performedBy: p.performedBy,
    throttleCeiling: p.throttleCeiling,
    band: { rpmMin, rpmMax },
    rules: p.rules,
    requiredMs,
    timeInBandMs,
    timeOverMs: 0,
    timeUnderMs: 0,
    longestFullThrottleMs: 0,
    progressShare: Math.min(1, timeInBandMs / requiredMs),
    setAsideMs: 0,
    countsFromMs: null,
    verdict: done ? 'complete' : 'incomplete',
    reasons: [],
    firstAt: null,
    lastAt: null,
    ...more,
  };
}

export function runOverview(overrides: Partial<RunReviewView> = {}): RunReviewView {
  const run = runDetail();
  return {
    run: {
      id: run.id,
      state: run.state,
      programName: run.programName,
      programSource: 'built-in',
      notes: '',
      currentPhaseId: run.currentPhaseId,
      createdAt: run.createdAt,
      submittedAt: null,
      submitNote: null,
      signedOffAt: null,
      lastEventAt: null,
      clockSkewMs: null,
      clockSkewFlag: false,
    },
    vessel: {
      id: run.vessel.id,
      name: run.vessel.name,
      hin: 'TST00002A626',
      homePort: 'Test Quay',
    },
    engine: { ...run.engine, hourMeterAtCommissioning: 0.5, commissionedOn: '2026-05-01' },
    skippers: [{ id: 'user-skipper', name: 'Noor Skeg' }],
    account: { verdict: 'complete', overallProgress: 1, sessionMs: 600 * MIN, unassignedMs: 0 },
    phases: [phase(0, 10 * MIN), phase(1, 110 * MIN), phase(2, 480 * MIN)],
    charts: [],
    events: [],
    eventsTotal: 0,
    readingCount: 0,
    voidedCount: 0,
    reviews: [],
    certificate: null,
    firstService: null,
    trail: [],
    canDecide: false,
    ...overrides,
  };
}

export { phase as reviewPhase, MIN };
