import { Button } from '../../../components/ui/button';
import type { ReadingPadState } from '../use-reading-pad';

/** The details that will go with the next reading, in a few words each. */
function detailParts(pad: ReadingPadState): string[] {
  const v = pad.details?.values;
  const speed = pad.gpsOn
    ? pad.gps.speedKn === null
      ? 'GPS speed (no fix yet)'
      : `${pad.gps.speedKn} kn GPS`
    : v?.speedKn !== undefined
      ? `${v.speedKn} kn`
      : null;
  return [
    speed,
    v?.fuelLph !== undefined ? `${v.fuelLph} L/h` : null,
    v?.hourMeter !== undefined ? `${v.hourMeter} h` : null,
    v?.note ? 'note' : null,
    pad.details?.photo ? 'photo' : null,
  ].filter((part): part is string => Boolean(part));
}

export function DetailsSummary({ pad, onOpen }: { pad: ReadingPadState; onOpen: () => void }) {
  const parts = detailParts(pad);
  return (
    <div className="flex items-center justify-between gap-2">
      <p className="text-sm">
        {parts.length
          ? `With: ${parts.join(' · ')}`
          : 'Speed, fuel flow, hour meter, note, photo: optional.'}
      </p>
      <Button variant="secondary" onClick={onOpen}>
        Details
      </Button>
    </div>
  );
}
