import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { positionWords } from '../../../../shared/engines/engine-words';
import type { VesselDecisionView } from '../api';
import type { EngineToDecide } from './engine-decision';

const mailWords = (result: VesselDecisionView) =>
  result.mail.sent
    ? `The skipper was e-mailed (${result.mail.to.join(', ')}).`
    : `The e-mail to the skipper was not sent: ${result.mail.problem}`;

/** One engine's outcome: what was decided, the e-mail, the run's review and its certificate. */
function OutcomeItem({
  result,
  engine,
}: {
  result: VesselDecisionView;
  engine: EngineToDecide['engine'] | undefined;
}) {
  const name = engine ? `${positionWords(engine.position)} engine` : 'Engine';
  return (
    <li className="flex flex-col gap-1">
      <p className="font-semibold">
        {result.state === 'signed-off'
          ? `${name}: signed off, certificate ${result.certificate?.number}.`
          : `${name}: returned to the skipper.`}
      </p>
      <p className="text-sm">{mailWords(result)}</p>
      <p className="flex flex-wrap gap-x-4">
        <Link
          to={`/runs/${result.runId}/review`}
          className="inline-flex min-h-touch items-center underline underline-offset-4"
        >
          {name}: review
        </Link>
        {result.certificate && (
          <a
            href={result.certificate.downloadUrl}
            className="inline-flex min-h-touch items-center underline underline-offset-4"
          >
            {name}: certificate (PDF)
          </a>
        )}
      </p>
    </li>
  );
}

/** What was saved for each engine, with each run's page and certificate; focused when shown. */
export function VesselDecisionsOutcome({
  results,
  items,
}: {
  results: VesselDecisionView[];
  items: EngineToDecide[];
}) {
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => box.current?.focus(), []);
  return (
    <div
      ref={box}
      tabIndex={-1}
      role="status"
      className="flex flex-col gap-3 rounded-md border-4 border-ink bg-surface p-4"
    >
      <p className="text-lg font-bold">Saved.</p>
      <ul className="flex flex-col gap-3">
        {results.map((result) => (
          <OutcomeItem
            key={result.runId}
            result={result}
            engine={items.find((i) => i.runId === result.runId)?.engine}
          />
        ))}
      </ul>
    </div>
  );
}
