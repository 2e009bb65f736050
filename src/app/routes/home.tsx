import { Link } from 'react-router-dom';
import { runPerEngine, useRuns } from '../../features/run-page/api';
import { useVessels } from '../../features/vessels/api';
import { FleetTable } from '../../features/vessels/components/fleet-table';
import { VesselCard } from '../../features/vessels/components/vessel-card';
import { CautionCard } from '../../components/caution-card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { useSessionUser } from '../shell/session';

export function HomeRoute() {
  const user = useSessionUser();
  return user.role === 'skipper' ? <SkipperHome /> : <WorkshopHome />;
}

/** Under each engine of the skipper's vessels: its break-in run's page, or that there is none. */
function useEngineRunLink() {
  const runs = useRuns();
  const byEngine = runPerEngine(runs.data ?? []);
  return (engine: { id: string }) => {
    if (!runs.data) return null;
    const run = byEngine.get(engine.id);
    if (!run) return <p className="mt-2 text-muted">No break-in run assigned</p>;
    return (
      <Link
        to={`/runs/${encodeURIComponent(run.id)}`}
        className="mt-2 inline-flex min-h-touch items-center font-semibold underline underline-offset-4"
      >
        Run page
      </Link>
    );
  };
}

function SkipperHome() {
  const vessels = useVessels();
  const runLink = useEngineRunLink();
  return (
    <div className="flex flex-col gap-5">
      <title>Your vessels · Ringseat</title>
      <h1 className="text-3xl font-bold">Your vessels</h1>
      {vessels.isPending && <Loading label="Loading your vessels…" />}
      {vessels.isError && (
        <LoadError error={vessels.error} what="your vessels" onRetry={() => vessels.refetch()} />
      )}
      {vessels.data?.length === 0 && (
        <p className="text-lg">
          No vessel is linked to you yet. Your workshop links your boat when it sets up the engine.
        </p>
      )}
      {vessels.data?.map((vessel) => (
        <VesselCard key={vessel.id} vessel={vessel} engineExtra={runLink} />
      ))}
      <CautionCard />
    </div>
  );
}

function WorkshopHome() {
  const vessels = useVessels();
  return (
    <div className="flex flex-col gap-5">
      <title>Workshop · Ringseat</title>
      <h1 className="text-3xl font-bold">Workshop</h1>
      <h2 className="text-xl font-bold">Vessels and engines</h2>
      {vessels.isPending && <Loading label="Loading the workshop's vessels…" />}
      {vessels.isError && (
        <LoadError error={vessels.error} what="the vessels" onRetry={() => vessels.refetch()} />
      )}
      {vessels.data?.length === 0 && (
        <p>No vessels yet. Vessels and their engines appear here once they are added.</p>
      )}
      {vessels.data && vessels.data.length > 0 && (
        <>
          {/* A table on wide screens, cards on phones: display:none keeps the hidden one out of the accessibility tree. */}
          <div className="hidden sm:block">
            <FleetTable vessels={vessels.data} />
          </div>
          <div className="flex flex-col gap-4 sm:hidden">
            {vessels.data.map((vessel) => (
              <VesselCard key={vessel.id} vessel={vessel} showSkippers />
            ))}
          </div>
        </>
      )}
    </div>
  );
}

export { HomeRoute as Component };
