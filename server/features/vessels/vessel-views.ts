import type { EngineView, VesselView } from '../../../shared/vessels/vessel-view.js';
import type { Engine } from './engine.entity.js';
import type { Vessel } from './vessel.entity.js';

const POSITION_ORDER = ['port', 'centre', 'starboard', 'single', 'inboard'];

/** Port to starboard, as the engines sit across the transom. */
export const byPosition = (a: Engine, b: Engine) =>
  POSITION_ORDER.indexOf(a.position) - POSITION_ORDER.indexOf(b.position);

export function toEngineView(engine: Engine): EngineView {
  const { createdAt, updatedAt, archivedAt, vessel: _v, workshopId: _w, ...fields } = engine;
  return {
    ...fields,
    createdAt: createdAt.toISOString(),
    updatedAt: updatedAt.toISOString(),
    archivedAt: archivedAt?.toISOString() ?? null,
  };
}

/** A vessel with its skippers and the engines in use (archived engines are left out). */
export function toVesselView(vessel: Vessel): VesselView {
  return {
    id: vessel.id,
    name: vessel.name,
    hin: vessel.hin,
    type: vessel.type,
    lengthM: vessel.lengthM,
    homePort: vessel.homePort,
    skippers: (vessel.skippers ?? [])
      .map((s) => ({ id: s.userId, name: s.user?.name ?? '' }))
      .sort((a, b) => a.name.localeCompare(b.name)),
    engines: (vessel.engines ?? [])
      .filter((e) => !e.archivedAt)
      .sort(byPosition)
      .map(toEngineView),
    archivedAt: vessel.archivedAt?.toISOString() ?? null,
    updatedAt: vessel.updatedAt.toISOString(),
  };
}

const folded = (text: string) => text.toLocaleLowerCase('en-GB');

/** Search text matches a vessel by its name, HIN, home port, skippers, or any engine's maker, model or serial. */
export function vesselMatches(view: VesselView, q: string): boolean {
  if (!q) return true;
  const needle = folded(q);
  const haystack = [
    view.name,
    view.hin,
    view.homePort,
    ...view.skippers.map((s) => s.name),
    ...view.engines.flatMap((e) => [e.maker, e.model, e.serialNumber]),
  ];
  return haystack.some((text) => folded(text).includes(needle));
}

export function engineMatches(engine: Engine, vesselName: string, q: string): boolean {
  if (!q) return true;
  const needle = folded(q);
  return [engine.maker, engine.model, engine.serialNumber, engine.position, vesselName].some(
    (text) => folded(text).includes(needle),
  );
}
