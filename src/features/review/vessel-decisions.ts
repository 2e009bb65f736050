import type { VesselView } from '../../../shared/vessels/vessel-view';
import type { EngineToDecide } from './components/engine-decision';

/** The engines whose newest run waits for the workshop's decision. */
export const enginesToDecide = (vessel: VesselView): EngineToDecide[] =>
  vessel.engines
    .filter((engine) => engine.latestRun?.state === 'submitted')
    .map((engine) => ({ runId: engine.latestRun!.id, engine }));

/** "Decide both engines" for a twin, "Decide the run" for one: the page's heading and its link. */
export const decideWords = (count: number) =>
  count === 2 ? 'Decide both engines' : count > 2 ? 'Decide all engines' : 'Decide the run';
