import type { BuiltInProgramKey } from '../../shared/programs/built-in-programs.js';
import type { RunState } from '../../shared/runs/run.schema.js';
import type { Outing } from './simulate-outings.js';

/*
 * The demo's break-in runs, one in each state a person trying the app should see. All times,
 * speeds and notes are invented for the demo. Times are UTC (the workshop's zone, Europe/London,
 * is on UTC in late November). Gannet and Blue Tern are left without runs, free to be assigned.
 */

const at = (iso: string) => Date.parse(`${iso}Z`);

export interface DemoRun {
  engineKey: string;
  /** The other engine of a twin installation, logged together with the first. */
  twinEngineKey?: string;
  programKey: BuiltInProgramKey;
  state: RunState;
  assignedBy: 'manager' | 'technician';
  assignedAt: number;
  /** Invented idle speed of the engine, for the dock run. */
  idleRpm: number;
  /** Where the run's pseudo-random numbers start, so every new demo database holds the same run. */
  randomStart: number;
  outings: Outing[];
  /** The skipper's phone clock was this far ahead of the real time. */
  skipperClockAheadMs?: number;
  /** Alerts the skipper's device raised (minutes into the given outing). */
  alerts?: Array<{ outing: number; minutes: number; code: string; message: string }>;
  notes?: string;
  submittedAt?: number;
  signedOff?: { at: number; comments: string };
}

export const DEMO_RUNS: DemoRun[] = [
  {
    // Signed off, with its certificate: a clean twenty-hour diesel break-in.
    engineKey: 'halcyon-inboard',
    programKey: 'small-inboard-diesel',
    state: 'signed-off',
    assignedBy: 'technician',
    assignedAt: at('2026-11-27T08:45:00'),
    idleRpm: 850,
    randomStart: 23,
    outings: [
      { start: at('2026-11-27T09:15:00'), minutes: 12, by: 'workshop' },
      {
        start: at('2026-11-27T11:00:00'),
        minutes: 240,
        by: 'skipper',
        readHourMeter: true,
        note: 'Motored out past the headland and back; engine warm and dry.',
      },
      { start: at('2026-11-28T09:30:00'), minutes: 300, by: 'skipper', readHourMeter: true },
      { start: at('2026-11-29T10:00:00'), minutes: 330, by: 'skipper', readHourMeter: true },
      {
        start: at('2026-11-30T08:00:00'),
        minutes: 360,
        by: 'skipper',
        readHourMeter: true,
        note: 'Light air, motored the whole way round the island.',
      },
    ],
    notes: 'Hour meter read off the panel at the end of each day. Oil checked every morning.',
    submittedAt: at('2026-11-30T15:10:00'),
    signedOff: {
      at: at('2026-12-01T08:40:00'),
      comments:
        'Log complete and within the program. Belt tension, oil and coolant checked at the yard; first service booked.',
    },
  },
  {
    // Submitted for review, with exactly one broken rule: a full-throttle burst held too long.
    engineKey: 'skua-single',
    programKey: 'four-stroke-outboard',
    state: 'submitted',
    assignedBy: 'technician',
    assignedAt: at('2026-11-23T08:30:00'),
    idleRpm: 800,
    randomStart: 11,
    outings: [
      { start: at('2026-11-23T09:05:00'), minutes: 12, by: 'workshop' },
      { start: at('2026-11-23T14:30:00'), minutes: 120, by: 'skipper', readHourMeter: true },
      {
        start: at('2026-11-25T09:40:00'),
        minutes: 150,
        by: 'skipper',
        burstsAt: [40, 95],
        readHourMeter: true,
        note: 'Flat calm in the bay; ran up and down the moorings channel.',
      },
      {
        start: at('2026-11-26T13:10:00'),
        minutes: 130,
        by: 'skipper',
        burstsAt: [30],
        heldFullThrottle: { at: 100, minutes: 95 / 60 },
        note: 'Held it open a little long to get clear of the ferry wash.',
      },
      {
        start: at('2026-11-28T10:00:00'),
        minutes: 150,
        by: 'skipper',
        burstsAt: [50, 120],
        readHourMeter: true,
      },
      {
        start: at('2026-11-29T08:50:00'),
        minutes: 75,
        by: 'skipper',
        burstsAt: [20],
        readHourMeter: true,
      },
    ],
    alerts: [
      {
        outing: 3,
        minutes: 101,
        code: 'full-throttle-too-long',
        message: 'Full throttle for more than 1 minute: ease back now.',
      },
    ],
    notes: 'Oil checked before every outing. Tell-tale strong throughout.',
    submittedAt: at('2026-11-29T10:30:00'),
  },
  {
    // Under way: twin outboards run together, the skipper's phone clock a day ahead.
    engineKey: 'cormorant-port',
    twinEngineKey: 'cormorant-starboard',
    programKey: 'four-stroke-outboard',
    state: 'under-way',
    assignedBy: 'manager',
    assignedAt: at('2026-11-25T09:50:00'),
    idleRpm: 780,
    randomStart: 37,
    outings: [
      { start: at('2026-11-25T10:30:00'), minutes: 12, by: 'workshop' },
      { start: at('2026-11-26T13:00:00'), minutes: 125, by: 'skipper', readHourMeter: true },
      {
        start: at('2026-11-28T10:15:00'),
        minutes: 95,
        by: 'skipper',
        burstsAt: [50],
        note: 'Both engines synchronised by ear; port tach reads a touch high.',
      },
    ],
    skipperClockAheadMs: 27 * 60 * 60_000,
  },
  {
    // Planned: assigned, not run yet (no skipper linked to this boat so far).
    engineKey: 'kittiwake-single',
    programKey: 'two-stroke-outboard',
    state: 'planned',
    assignedBy: 'technician',
    assignedAt: at('2026-11-30T15:00:00'),
    idleRpm: 900,
    randomStart: 41,
    outings: [],
  },
];
