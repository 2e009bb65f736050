import { randomUUID } from 'node:crypto';
import type { ResolvedPhase } from '../../shared/programs/resolve-band.js';
import type { RunEvent } from '../../shared/runs/run-event.schema.js';
import { repeatableRandom } from '../lib/repeatable-random.js';
import type { SimulatedEvent } from './simulate-outings.js';

/**
 * The second engine of a twin installation, run together with the first: the same moments and
 * levers, each speed a few rpm apart (no two tachometers agree exactly), kept inside the band.
 */
export function twinOf(
  events: SimulatedEvent[],
  engineId: string,
  phases: ResolvedPhase[],
  randomStart: number,
): SimulatedEvent[] {
  const random = repeatableRandom(randomStart);
  const bands = new Map(phases.map((p) => [p.id, p.band]));
  return events.map(({ event, ...rest }) => {
    const copy = { ...event, id: randomUUID(), engineId } as RunEvent;
    if (copy.kind === 'reading' && copy.throttle !== 'full') {
      const band = bands.get(copy.phaseId)!;
      copy.rpm = Math.min(
        band.rpmMax - 10,
        Math.max(band.rpmMin + 10, copy.rpm + Math.round((random() - 0.5) * 60)),
      );
    }
    return { event: copy, ...rest };
  });
}
