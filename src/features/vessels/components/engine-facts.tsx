import {
  fuelAndCycleWords,
  INSTALLATION_WORDS,
  TACH_SOURCE_WORDS,
} from '../../../../shared/engines/engine-words';
import type { EngineView } from '../../../../shared/vessels/vessel-view';
import { formatDate, formatHours, formatRpmRange } from '../../../lib/format';

const orDash = (value: string | null) => value ?? '—';

/** Each fact as label, value, and whether the value is figures. */
function engineFacts(engine: EngineView): Array<[string, string, boolean?]> {
  const propeller = [
    engine.propBlades !== null ? `${engine.propBlades} blades` : null,
    engine.propDiameterIn !== null ? `${engine.propDiameterIn} in diameter` : null,
    engine.propPitchIn !== null ? `${engine.propPitchIn} in pitch` : null,
  ]
    .filter(Boolean)
    .join(', ');
  const tach = [
    TACH_SOURCE_WORDS[engine.tachSource],
    engine.poles !== null ? `${engine.poles} poles` : null,
    engine.pulleyRatio !== null ? `pulley ratio ${engine.pulleyRatio}` : null,
  ]
    .filter(Boolean)
    .join(', ');
  return [
    ['Serial number', engine.serialNumber, true],
    ['Installation', INSTALLATION_WORDS[engine.installation]],
    ['Fuel and cycle', fuelAndCycleWords(engine)],
    ['Rated power', engine.ratedPowerKw !== null ? `${engine.ratedPowerKw} kW` : '—', true],
    ['Rated full throttle', `${formatRpmRange(engine.ratedRpmMin, engine.ratedRpmMax)} RPM`, true],
    ['Gear ratio', engine.gearRatio !== null ? `${engine.gearRatio}:1` : '—', true],
    ['Propeller', propeller || '—'],
    ['Tachometer signal', tach],
    [
      'Hour meter at commissioning',
      engine.hourMeterAtCommissioning !== null
        ? `${formatHours(engine.hourMeterAtCommissioning)} h`
        : '—',
      true,
    ],
    ['Commissioned', orDash(engine.commissionedOn && formatDate(engine.commissionedOn))],
  ];
}

/** Every recorded fact of an engine, for the workshop's engine page. */
export function EngineFacts({ engine }: { engine: EngineView }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[auto_1fr]">
      {engineFacts(engine).map(([label, value, figures]) => (
        <div key={label} className="contents">
          <dt className="text-muted">{label}</dt>
          <dd className={figures ? 'figures break-all' : undefined}>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
