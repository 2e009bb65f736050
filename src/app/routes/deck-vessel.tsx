import { useParams } from 'react-router-dom';
import { DeckScreen } from '../../features/deck/components/deck-screen';
import { useSessionUser } from '../shell/session';

/** /deck/:vesselId: the run screen for one vessel's engines. */
export function DeckVesselRoute() {
  const { vesselId = '' } = useParams();
  const user = useSessionUser();
  return <DeckScreen key={vesselId} vesselId={vesselId} role={user.role} />;
}

export { DeckVesselRoute as Component };
