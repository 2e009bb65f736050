import { DeckScreen } from '../features/deck/components/deck-screen';
import { VesselPicker } from '../features/deck/components/vessel-picker';
import type { SessionUser } from '../../shared/auth/auth.schema';

/** /deck: pick the vessel to run. Reads only the device, so it opens at sea. */
export function DeckHome() {
  return (
    <div className="flex flex-col gap-4">
      <title>On deck · Ringseat</title>
      <h1 className="text-3xl font-bold">On deck</h1>
      <p>
        Choose the boat you are running. Everything here is stored on this device and works with no
        signal.
      </p>
      <VesselPicker />
    </div>
  );
}

/** /deck/:vesselId: the run screen for one vessel's engines. */
export function DeckVesselPage({ vesselId, user }: { vesselId: string; user: SessionUser }) {
  return <DeckScreen key={vesselId} vesselId={vesselId} role={user.role} />;
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
