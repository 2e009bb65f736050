/**
 * Our own invented demo scenario: a small workshop on a fictional harbour, two skippers and
 * six boats. Every name, serial number and figure here is made up for the demo.
 */
export const DEMO_PASSWORD = 'ringseat-demo';

export const DEMO_WORKSHOP = {
  name: 'Tidewright Marine Works',
  address: 'Slipway 4, Kestrel Harbour',
  email: 'desk@tidewright.example',
  timezone: 'Europe/London',
  units: { speed: 'kn', volume: 'L', power: 'kW', temperature: 'C' },
} as const;

export const DEMO_USERS = [
  { key: 'manager', email: 'maren@tidewright.example', name: 'Maren Holt', role: 'manager' },
  { key: 'technician', email: 'ivo@tidewright.example', name: 'Ivo Brandt', role: 'technician' },
  { key: 'skipperA', email: 'sunniva@skipper.example', name: 'Sunniva Okafor', role: 'skipper' },
  { key: 'skipperB', email: 'tomas@skipper.example', name: 'Tomas Reyes', role: 'skipper' },
] as const;

type DemoEngine = {
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

const twinOutboard = (position: 'port' | 'starboard', serial: string): DemoEngine => ({
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

const cormorantOutboard = (position: 'port' | 'starboard', serial: string): DemoEngine => ({
  ...twinOutboard(position, serial),
  key: `cormorant-${position}`,
  model: 'NV-115 4S',
  ratedPowerKw: 85,
  propPitchIn: 17,
  hourMeterAtCommissioning: 0.8,
  commissionedOn: '2026-11-25',
});

export const DEMO_VESSELS: Array<{
  key: string;
  name: string;
  hin: string;
  type: 'workboat' | 'sport-fishing' | 'sailing-yacht' | 'rib' | 'runabout';
  lengthM: number;
  homePort: string;
  /** Null: nobody is linked yet (the workshop invites the skipper later). */
  skipper: 'skipperA' | 'skipperB' | null;
  engines: DemoEngine[];
}> = [
  {
    key: 'gannet',
    name: 'Gannet',
    hin: 'TDW40217K526',
    type: 'workboat',
    lengthM: 5.8,
    homePort: 'Kestrel Harbour',
    skipper: 'skipperA',
    engines: [
      {
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
      },
    ],
  },
  {
    key: 'blue-tern',
    name: 'Blue Tern',
    hin: 'SKF77310L526',
    type: 'sport-fishing',
    lengthM: 8.2,
    homePort: 'Kestrel Harbour',
    skipper: 'skipperA',
    engines: [twinOutboard('port', 'NV150-26-01127'), twinOutboard('starboard', 'NV150-26-01131')],
  },
  {
    key: 'halcyon-drift',
    name: 'Halcyon Drift',
    hin: 'HLD20983C626',
    type: 'sailing-yacht',
    lengthM: 10.4,
    homePort: 'Marrow Point Marina',
    skipper: 'skipperB',
    engines: [
      {
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
      },
    ],
  },
  {
    key: 'cormorant',
    name: 'Cormorant',
    hin: 'KSW31884M526',
    type: 'rib',
    lengthM: 7.4,
    homePort: 'Kestrel Harbour',
    skipper: 'skipperA',
    engines: [
      cormorantOutboard('port', 'NV115-26-00871'),
      cormorantOutboard('starboard', 'NV115-26-00874'),
    ],
  },
  {
    key: 'skua',
    name: 'Skua',
    hin: 'TDW40251H526',
    type: 'workboat',
    lengthM: 6.1,
    homePort: 'Kestrel Harbour',
    skipper: 'skipperA',
    engines: [
      {
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
      },
    ],
  },
  {
    key: 'kittiwake',
    name: 'Kittiwake',
    hin: 'TDW40288D626',
    type: 'runabout',
    lengthM: 4.6,
    homePort: 'Kestrel Harbour',
    skipper: null,
    engines: [
      {
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
      },
    ],
  },
];
