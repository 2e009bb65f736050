import { VesselPicker } from '../../features/deck/components/vessel-picker';

/** /deck: pick the vessel to run. Reads only the device, so it opens at sea. */
export function DeckRoute() {
  return (
    <div className="flex flex-col gap-4">
      <title>On deck · Ringseat</title>
      <h1 className="text-3xl font-bold">On deck</h1>
      <p>Choose the boat you are running. Everything here is stored on this device and works with no signal.</p>
      <VesselPicker />
    </div>
  );
}

export { DeckRoute as Component };
