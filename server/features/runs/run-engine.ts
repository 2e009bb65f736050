import type { CommissionedEngine, RunEngine } from '../../../shared/runs/run-view.js';
import type { Engine } from '../vessels/engine.entity.js';

/** The engine facts a run carries (the run view, the device copy). */
export const runEngineOf = (engine: Engine): RunEngine => ({
  id: engine.id,
  position: engine.position,
  maker: engine.maker,
  model: engine.model,
  serialNumber: engine.serialNumber,
  ratedRpmMin: engine.ratedRpmMin,
  ratedRpmMax: engine.ratedRpmMax,
});

/** The same with the commissioning record (the review and the certificate). */
export const commissionedEngineOf = (engine: Engine): CommissionedEngine => ({
  ...runEngineOf(engine),
  hourMeterAtCommissioning: engine.hourMeterAtCommissioning,
  commissionedOn: engine.commissionedOn,
});
