import { Card } from './ui/card';

/** Safety reminders shown wherever an engine is about to be run. */
export function CautionCard() {
  return (
    <Card
      title="Before you run the engine"
      strong
      role="note"
      aria-label="Caution before running the engine"
    >
      <ul className="list-disc space-y-2 pl-5">
        <li>
          Put the engine in gear only when the propeller is clear of people, swimmers, lines and the
          dock. Tied up at a berth, check that the lines and cleats will take the pull.
        </li>
        <li>Wear the kill-switch lanyard whenever the engine runs and you are at the helm.</li>
        <li>
          Ventilate the engine space before starting (run the blower on petrol inboards). Exhaust
          carries carbon monoxide: keep people off the swim platform and away from the stern while
          it runs.
        </li>
        <li>Stop if you smell fuel, see a leak or the cooling-water tell-tale stops.</li>
      </ul>
      <p className="mt-3 font-semibold">
        The engine maker&rsquo;s manual, local rules and your licensed technician come first. Where
        Ringseat says anything different, follow them.
      </p>
    </Card>
  );
}
