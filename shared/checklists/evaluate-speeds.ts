import { adviseOnPitch } from '../propeller/pitch-advice';
import { checkPropellerSpeed } from '../propeller/propeller';
import type { FullThrottleEntry, IdleEntry } from './checklist.schema';
import {
  notApplicable,
  open,
  rpmText,
  type ChecklistEngine,
  type Figure,
  type ItemJudgement,
} from './evaluation';

/** Idle in gear against the maker's idle range, typed from the engine manual. */
export function evaluateIdle(entry: IdleEntry): ItemJudgement {
  const skipped = notApplicable(entry);
  if (skipped) return skipped;
  if (entry.specMinRpm === null || entry.specMaxRpm === null)
    return open("Enter the maker's idle RPM range in gear from the engine manual.");
  if (entry.idleRpm === null) return open('Enter the idle RPM measured in gear.');
  const range = `${entry.specMinRpm}–${entry.specMaxRpm} rpm`;
  const figures = [{ label: "Maker's idle range", value: range }];
  if (entry.idleRpm < entry.specMinRpm) {
    return {
      verdict: 'fail',
      reasons: [
        `Idle in gear is ${rpmText(entry.idleRpm)}, below the maker's ${range}: the engine may stall when shifted or at the dock.`,
      ],
      figures,
    };
  }
  if (entry.idleRpm > entry.specMaxRpm) {
    return {
      verdict: 'fail',
      reasons: [
        `Idle in gear is ${rpmText(entry.idleRpm)}, above the maker's ${range}: shifting will clunk and the boat creeps hard at the dock.`,
      ],
      figures,
    };
  }
  return {
    verdict: 'pass',
    reasons: [`Idle in gear is ${rpmText(entry.idleRpm)}, inside the maker's ${range}.`],
    figures,
  };
}

/** Sterndrive legs take propellers like outboards, so they share the outboard rpm-per-inch rule (common practice). */
const propulsionOf = (engine: ChecklistEngine) =>
  engine.installation === 'inboard' ? 'inboard' : 'outboard';

function propellerFigures(
  entry: FullThrottleEntry,
  engine: ChecklistEngine,
  rpm: number,
): { figures: Figure[]; reasons: string[] } {
  if (!engine.gearRatio || !engine.propPitchIn) return { figures: [], reasons: [] };
  const speed = checkPropellerSpeed({
    engineRpm: rpm,
    gearRatio: engine.gearRatio,
    pitchIn: engine.propPitchIn,
    measuredKn: entry.speedKn ?? undefined,
  });
  const figures: Figure[] = [
    { label: 'Propeller shaft', value: rpmText(speed.shaftRpm) },
    { label: 'Pitch speed', value: `${speed.pitchSpeedKn.toFixed(1)} kn` },
  ];
  const reasons: string[] = [];
  if (speed.slip !== null) {
    figures.push({ label: 'Propeller slip', value: `${(speed.slip * 100).toFixed(1)} %` });
    if (speed.slip < 0)
      reasons.push(
        'The logged speed is above the pitch speed: check the speed reading and the propeller pitch on the engine record.',
      );
  }
  return { figures, reasons };
}

function rangeOnly(rpm: number, engine: ChecklistEngine): ItemJudgement {
  const range = `${engine.ratedRpmMin}–${engine.ratedRpmMax} rpm`;
  const where = rpm < engine.ratedRpmMin ? 'below' : rpm > engine.ratedRpmMax ? 'above' : 'inside';
  return {
    verdict: where === 'inside' ? 'pass' : 'fail',
    reasons: [
      `Full throttle is ${rpmText(rpm)}, ${where} the rated range (${range}).`,
      'Add the propeller pitch to the engine record to get pitch advice.',
    ],
    figures: [],
  };
}

/** Full-throttle RPM against the rated range, with the usual pitch advice and propeller slip. */
export function evaluateFullThrottle(
  entry: FullThrottleEntry,
  engine: ChecklistEngine,
): ItemJudgement {
  const skipped = notApplicable(entry);
  if (skipped) return skipped;
  if (entry.rpm === null) return open('Enter the steady RPM reached at full throttle.');
  const propeller = propellerFigures(entry, engine, entry.rpm);
  if (!engine.propPitchIn) {
    const judged = rangeOnly(entry.rpm, engine);
    return {
      ...judged,
      figures: propeller.figures,
      reasons: [...judged.reasons, ...propeller.reasons],
    };
  }
  const advice = adviseOnPitch({
    fullThrottleRpm: entry.rpm,
    ratedRpmMin: engine.ratedRpmMin,
    ratedRpmMax: engine.ratedRpmMax,
    pitchIn: engine.propPitchIn,
    propulsion: propulsionOf(engine),
  });
  const figures: Figure[] = [
    { label: 'Middle of the rated range', value: rpmText(advice.targetRpm) },
    ...propeller.figures,
  ];
  if (advice.verdict !== 'in-range')
    figures.push({
      label: 'Pitch by proportion',
      value: `${advice.proportionalPitchIn.toFixed(1)} in`,
    });
  return {
    verdict: advice.verdict === 'in-range' ? 'pass' : 'fail',
    reasons: [advice.advice, ...propeller.reasons],
    figures,
  };
}
