// Shapes of GET /api/vessels. Replace with types inferred from shared/ schemas once they exist.
export interface EngineSummary {
  id: string;
  position: string;
  maker: string;
  model: string;
  serialNumber: string;
  ratedPowerKw: number | null;
  fuel: 'petrol' | 'diesel';
  cycle: 'two-stroke' | 'four-stroke';
  ratedRpmMin: number;
  ratedRpmMax: number;
  hourMeterAtCommissioning: number | null;
  commissionedOn: string | null;
}

export interface VesselSummary {
  id: string;
  name: string;
  hin: string;
  type: string;
  lengthM: number | null;
  homePort: string;
  skippers: Array<{ id: string; name: string }>;
  engines: EngineSummary[];
}
