import { DeckScreen } from '../features/deck/components/deck-screen';
import { VesselPicker } from '../features/deck/components/vessel-picker';
import type { SessionUser } from '../../shared/auth/auth.schema';
import { requestSync } from '../features/sync/api';

/** /deck: pick the vessel to run. Reads only the device, so it opens at sea. */
export function DeckHome({ user }: { user: SessionUser }) {
  return (
    <div className="flex flex-col gap-4">
      <title>On deck · Ringseat</title>
      <h1 className="text-3xl font-bold">On deck</h1>
      <p>
        Choose the boat you are running. Everything here is stored on this device and works with no
        signal.
      </p>
      <VesselPicker role={user.role} />
    </div>
  );
}

/** /deck/:vesselId: the run screen for one vessel's engines. */
export function DeckVesselPage({ vesselId, user }: { vesselId: string; user: SessionUser }) {
  // A submit waits in the outbox like everything else; ask for a sync now rather than in a minute.
  return (
    <DeckScreen
      key={vesselId}
      vesselId={vesselId}
      role={user.role}
      onSubmitted={() => void requestSync()}
    />
  );
}

/** Which deck page a path shows; null for an address the deck does not have. */
export function deckPageFor(
  pathname: string,
): { page: 'home' } | { page: 'vessel'; vesselId: string } | null {
  const parts = pathname.split('/').filter(Boolean);
  if (parts[0] !== 'deck' || parts.length > 2) return null;
  if (parts.length === 1) return { page: 'home' };
  return { page: 'vessel', vesselId: decodeURIComponent(parts[1]) };
}
