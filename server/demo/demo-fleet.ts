import {
  cormorantOutboard,
  GANNET_OUTBOARD,
  HALCYON_INBOARD,
  KITTIWAKE_OUTBOARD,
  SKUA_OUTBOARD,
  twinOutboard,
  type DemoEngine,
} from './demo-engines.js';

/** The demo workshop's six boats and who skippers them (names and hull numbers invented). */
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
    engines: [GANNET_OUTBOARD],
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
    engines: [HALCYON_INBOARD],
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
    engines: [SKUA_OUTBOARD],
  },
  {
    key: 'kittiwake',
    name: 'Kittiwake',
    hin: 'TDW40288D626',
    type: 'runabout',
    lengthM: 4.6,
    homePort: 'Kestrel Harbour',
    skipper: null,
    engines: [KITTIWAKE_OUTBOARD],
  },
];
