import { engineNameWords, fuelAndCycleWords } from '../../../../shared/engines/engine-words';
import { formatDate, formatHours, formatRpmRange } from '../../../lib/format';
import type { EngineView } from '../../../../shared/vessels/vessel-view';

export const engineTitle = (engine: EngineView) => engineNameWords(engine);

export function RatedRpm({ engine }: { engine: EngineView }) {
  return (
    <span className="figures whitespace-nowrap">
      {formatRpmRange(engine.ratedRpmMin, engine.ratedRpmMax)} RPM
    </span>
  );
}

/** One engine's identity and ratings, as a definition list. */
export function EngineDetails({ engine }: { engine: EngineView }) {
  return (
    <div className="rounded-md border-2 border-line bg-paper p-3">
      <h3 className="font-bold">{engineTitle(engine)}</h3>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-muted">Serial</dt>
        <dd className="figures break-all">{engine.serialNumber}</dd>
        <dt className="text-muted">Rated full throttle</dt>
        <dd>
          <RatedRpm engine={engine} />
        </dd>
        <dt className="text-muted">Fuel and cycle</dt>
        <dd>{fuelAndCycleWords(engine)}</dd>
        {engine.ratedPowerKw !== null && (
          <>
            <dt className="text-muted">Rated power</dt>
            <dd className="figures">{engine.ratedPowerKw} kW</dd>
          </>
        )}
        {engine.hourMeterAtCommissioning !== null && (
          <>
            <dt className="text-muted">Hour meter at commissioning</dt>
            <dd className="figures">{formatHours(engine.hourMeterAtCommissioning)} h</dd>
          </>
        )}
        {engine.commissionedOn && (
          <>
            <dt className="text-muted">Commissioned</dt>
            <dd>{formatDate(engine.commissionedOn)}</dd>
          </>
        )}
      </dl>
    </div>
  );
}
