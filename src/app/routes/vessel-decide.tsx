import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useInvalidateBoard } from '../../features/board/api';
import type { VesselDecisionView } from '../../features/review/api';
import type { EngineToDecide } from '../../features/review/components/engine-decision';
import { decideWords, enginesToDecide } from '../../features/review/vessel-decisions';
import { VesselDecisionsForm } from '../../features/review/components/vessel-decisions-form';
import { VesselDecisionsOutcome } from '../../features/review/components/vessel-decisions-outcome';
import { useInvalidateFleet, useVessel } from '../../features/vessels/api';
import { LoadError, Loading } from '../../components/ui/status-message';
import { StaffOnly } from './staff-only';

function DecidePage({ id }: { id: string }) {
  const vessel = useVessel(id);
  const invalidateFleet = useInvalidateFleet();
  const invalidateBoard = useInvalidateBoard();
  // Kept once saved: the vessel then has nothing left to decide, and the outcome stays on screen.
  const [saved, setSaved] = useState<{ results: VesselDecisionView[]; items: EngineToDecide[] }>();
  if (vessel.isPending) return <Loading label="Loading the vessel…" />;
  if (vessel.isError)
    return <LoadError error={vessel.error} what="the vessel" onRetry={() => vessel.refetch()} />;
  const v = vessel.data;
  const items = saved?.items ?? enginesToDecide(v);
  const heading = decideWords(items.length);
  return (
    <div className="flex max-w-6xl flex-col gap-5">
      <title>{`${heading} · ${v.name} · Ringseat`}</title>
      <Link
        to={`/vessels/${v.id}`}
        className="flex min-h-touch items-center self-start underline underline-offset-4"
      >
        ← {v.name}
      </Link>
      <div>
        <h1 className="text-3xl font-bold">{heading}</h1>
        <p className="text-muted">{v.name}</p>
      </div>
      {saved && <VesselDecisionsOutcome results={saved.results} items={saved.items} />}
      {!saved && items.length === 0 && <p>No run of {v.name} waits for a decision now.</p>}
      {!saved && items.length > 0 && (
        <VesselDecisionsForm
          vesselId={v.id}
          items={items}
          onSaved={(results) => {
            setSaved({ results, items });
            void invalidateFleet();
            void invalidateBoard();
          }}
        />
      )}
    </div>
  );
}

export function VesselDecideRoute() {
  const { id = '' } = useParams();
  return (
    <StaffOnly title="Decide">
      <DecidePage key={id} id={id} />
    </StaffOnly>
  );
}

export { VesselDecideRoute as Component };
