import { Card } from '../../../components/ui/card';

/** Shown above the checklist: commissioning means running a new engine at the dock and at sea. */
export function CommissioningCautions() {
  return (
    <Card
      title="Safety while commissioning"
      strong
      role="note"
      aria-label="Safety while commissioning"
    >
      <ul className="list-disc space-y-2 pl-5">
        <li>
          In gear at the dock, the boat pulls hard: check lines and cleats, keep people and lines
          clear of the propeller, and keep the throttle at idle. Full-throttle checks belong on open
          water, not tied up.
        </li>
        <li>
          Petrol vapour is explosive: ventilate the engine space (run the blower on inboards) before
          starting, and look and sniff for fuel leaks first. No smoking or sparks near fuel.
        </li>
        <li>
          Batteries give off hydrogen when charging and can short with a large current: no sparks
          near them, insulated tools, eye protection, and disconnect the negative lead first when
          working on the wiring.
        </li>
        <li>
          Exhaust carries carbon monoxide: run in the open, keep people away from the stern, and
          never in a closed shed.
        </li>
        <li>Wear the kill-switch lanyard at the helm whenever the engine runs.</li>
      </ul>
      <p className="mt-3 font-semibold">
        The engine maker&rsquo;s manual and service data, local rules and licensed technicians come
        first. Where this checklist says anything different, follow them.
      </p>
    </Card>
  );
}
