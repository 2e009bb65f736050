import type { SignalSource } from '../engine-speed/signal-source.schema';
import { engineRpmFromFrequency, tachDialSetting } from '../engine-speed/engine-speed';
import type { TachometerEntry } from './checklist.schema';
import {
  notApplicable,
  open,
  percentText,
  rpmText,
  type ChecklistEngine,
  type ItemJudgement,
} from './evaluation';

/**
 * A helm tachometer within ±3 % of the true engine speed passes. Analogue marine tachometers are
 * commonly read to a few percent, and 3 % is about one needle width at cruising speed (common practice).
 */
export const TACH_TOLERANCE = 0.03;

/** The engine's AC signal source, when its record has one the frequency can be turned into RPM with. */
export function signalSourceOf(engine: ChecklistEngine): SignalSource | null {
  if (engine.tachSource === 'charging-coil' && engine.poles)
    return { kind: 'charging-coil', poles: engine.poles };
  if (engine.tachSource === 'belt-alternator' && engine.poles && engine.pulleyRatio) {
    return { kind: 'belt-alternator', poles: engine.poles, pulleyRatio: engine.pulleyRatio };
  }
  return null;
}

type TrueSpeed = { rpm: number; how: string } | { problem: string };

function trueSpeed(entry: TachometerEntry, source: SignalSource | null): TrueSpeed {
  if (entry.measuredHz !== null) {
    if (!source) {
      return {
        problem:
          'The engine record has no charging-coil or alternator signal with its poles, so a frequency cannot be turned into RPM. ' +
          'Enter a hand-held tachometer reading instead, or complete the engine record.',
      };
    }
    return {
      rpm: engineRpmFromFrequency(entry.measuredHz, source),
      how: `from ${entry.measuredHz} Hz`,
    };
  }
  if (entry.referenceRpm !== null)
    return { rpm: entry.referenceRpm, how: 'by hand-held tachometer' };
  return { problem: 'Enter the measured frequency, or the RPM read with a hand-held tachometer.' };
}

/** A reading about double or half the true speed is the classic wrong dial setting. */
function dialAdvice(ratio: number, source: SignalSource | null): string | null {
  const doubled = Math.abs(ratio - 2) <= 0.1;
  const halved = Math.abs(ratio - 0.5) <= 0.05;
  if (!doubled && !halved) return null;
  const which = doubled ? 'about double' : 'about half';
  const settings = source
    ? ` For this engine set ${tachDialSetting(source, 'poles')} on a dial labelled in poles, or ${tachDialSetting(source, 'pulses-per-rev')} ` +
      'on one labelled in pulses per revolution (half-wave signal; a full-wave signal doubles both).'
    : '';
  return `The tachometer shows ${which} the true speed: its dial is probably set in poles where it expects pulses per revolution, or the other way round.${settings}`;
}

/** Tachometer calibration: the helm tachometer against the speed worked out from the signal. */
export function evaluateTachometer(entry: TachometerEntry, engine: ChecklistEngine): ItemJudgement {
  const skipped = notApplicable(entry);
  if (skipped) return skipped;
  const source = signalSourceOf(engine);
  const truth = trueSpeed(entry, source);
  if ('problem' in truth) return open(truth.problem);
  if (entry.tachReadingRpm === null)
    return open('Enter what the helm tachometer showed at the same moment.');

  const deviation = (entry.tachReadingRpm - truth.rpm) / truth.rpm;
  const figures = [
    { label: `True engine speed (${truth.how})`, value: rpmText(truth.rpm) },
    { label: 'Tachometer error', value: percentText(deviation) },
  ];
  const limit = `±${TACH_TOLERANCE * 100} %`;
  if (Math.abs(deviation) <= TACH_TOLERANCE) {
    return {
      verdict: 'pass',
      reasons: [`The tachometer reads within ${limit} of the true speed.`],
      figures,
    };
  }
  const reasons = [
    `The tachometer reads ${percentText(deviation)} off the true speed; it should be within ${limit}.`,
  ];
  const advice = dialAdvice(entry.tachReadingRpm / truth.rpm, source);
  if (advice) reasons.push(advice);
  return { verdict: 'fail', reasons, figures };
}
