import { useParams } from 'react-router-dom';
import { RunPage } from '../../features/run-page/components/run-page';
import { useSessionUser } from '../shell/session';

/** /runs/:id: the run as its skipper reads it; staff get a link on to the full review. */
export function RunRoute() {
  const { id = '' } = useParams();
  const user = useSessionUser();
  return <RunPage key={id} runId={id} staff={user.role !== 'skipper'} />;
}

export { RunRoute as Component };
