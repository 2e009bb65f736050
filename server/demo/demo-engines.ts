/** The demo fleet's engines (all invented for the demo: makers, models, serials and figures). */
export type DemoEngine = {
  position: 'single' | 'port' | 'starboard' | 'inboard';
  installation: 'outboard' | 'inboard';
  /** Stable key the demo runs refer to. */
  key: string;
  maker: string;
  model: string;
  serialNumber: string;
  ratedPowerKw: number;
  fuel: 'petrol' | 'diesel';
  cycle: 'two-stroke' | 'four-stroke';
  ratedRpmMin: number;
  ratedRpmMax: number;
  gearRatio: number;
  propBlades: number;
  propDiameterIn: number;
  propPitchIn: number;
  tachSource: 'charging-coil' | 'belt-alternator';
  poles: number;
  pulleyRatio: number | null;
  hourMeterAtCommissioning: number;
  commissionedOn: string;
};

export const twinOutboard = (position: 'port' | 'starboard', serial: string): DemoEngine => ({
  key: `blue-tern-${position}`,
  position,
  installation: 'outboard',
  maker: 'Norrvik',
  model: 'NV-150 4S',
  serialNumber: serial,
  ratedPowerKw: 110,
  fuel: 'petrol',
  cycle: 'four-stroke',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2.0,
  propBlades: 3,
  propDiameterIn: 14.75,
  propPitchIn: 19,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
  hourMeterAtCommissioning: 1.1,
  commissionedOn: '2026-11-24',
});

export const cormorantOutboard = (position: 'port' | 'starboard', serial: string): DemoEngine => ({
  ...twinOutboard(position, serial),
  key: `cormorant-${position}`,
  model: 'NV-115 4S',
  ratedPowerKw: 85,
  propPitchIn: 17,
  hourMeterAtCommissioning: 0.8,
  commissionedOn: '2026-11-25',
});

export const GANNET_OUTBOARD: DemoEngine = {
  key: 'gannet-single',
  position: 'single',
  installation: 'outboard',
  maker: 'Norrvik',
  model: 'NV-60 4S',
  serialNumber: 'NV60-26-00418',
  ratedPowerKw: 44,
  fuel: 'petrol',
  cycle: 'four-stroke',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2.33,
  propBlades: 3,
  propDiameterIn: 11.6,
  propPitchIn: 15,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
  hourMeterAtCommissioning: 0.4,
  commissionedOn: '2026-11-20',
};

export const HALCYON_INBOARD: DemoEngine = {
  key: 'halcyon-inboard',
  position: 'inboard',
  installation: 'inboard',
  maker: 'Brennholt',
  model: 'B3-21 Marine',
  serialNumber: 'B321-D-77841',
  ratedPowerKw: 15.4,
  fuel: 'diesel',
  cycle: 'four-stroke',
  ratedRpmMin: 3400,
  ratedRpmMax: 3600,
  gearRatio: 2.0,
  propBlades: 2,
  propDiameterIn: 15,
  propPitchIn: 10,
  tachSource: 'belt-alternator',
  poles: 12,
  pulleyRatio: 2.5,
  hourMeterAtCommissioning: 2.0,
  commissionedOn: '2026-11-27',
};

export const SKUA_OUTBOARD: DemoEngine = {
  key: 'skua-single',
  position: 'single',
  installation: 'outboard',
  maker: 'Norrvik',
  model: 'NV-40 4S',
  serialNumber: 'NV40-26-00233',
  ratedPowerKw: 29.4,
  fuel: 'petrol',
  cycle: 'four-stroke',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2.0,
  propBlades: 3,
  propDiameterIn: 10.25,
  propPitchIn: 13,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
  hourMeterAtCommissioning: 0.3,
  commissionedOn: '2026-11-23',
};

export const KITTIWAKE_OUTBOARD: DemoEngine = {
  key: 'kittiwake-single',
  position: 'single',
  installation: 'outboard',
  maker: 'Saltmere',
  model: 'S-25 2T',
  serialNumber: 'SM25-26-10392',
  ratedPowerKw: 18.4,
  fuel: 'petrol',
  cycle: 'two-stroke',
  ratedRpmMin: 4800,
  ratedRpmMax: 5500,
  gearRatio: 2.08,
  propBlades: 3,
  propDiameterIn: 9.9,
  propPitchIn: 11,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
  hourMeterAtCommissioning: 0.2,
  commissionedOn: '2026-11-30',
};
