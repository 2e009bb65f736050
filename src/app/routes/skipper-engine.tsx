import { Navigate } from 'react-router-dom';
import { useVessels } from '../../features/vessels/api';
import { LoadError, Loading } from '../../components/ui/status-message';
import { StaffOnly } from './staff-only';

/**
 * A skipper who follows a link to an engine (the first-service reminder goes to the skipper and
 * the workshop alike) is taken to that engine's newest run, whose page shows the service due.
 */
export function SkipperEngine({ id }: { id: string }) {
  const vessels = useVessels();
  if (vessels.isPending) return <Loading label="Loading your engine…" />;
  if (vessels.isError)
    return (
      <LoadError error={vessels.error} what="your vessels" onRetry={() => vessels.refetch()} />
    );
  const engine = vessels.data.flatMap((v) => v.engines).find((e) => e.id === id);
  if (engine?.latestRun) return <Navigate to={`/runs/${engine.latestRun.id}`} replace />;
  return <StaffOnly title="Engine">{null}</StaffOnly>;
}
