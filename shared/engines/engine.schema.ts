import { z } from 'zod';

export const ENGINE_POSITIONS = ['single', 'port', 'starboard', 'centre', 'inboard'] as const;
export const EnginePositionSchema = z.enum(ENGINE_POSITIONS, {
  error: 'Choose the engine position from the list.',
});
export type EnginePosition = z.infer<typeof EnginePositionSchema>;

export const INSTALLATIONS = ['outboard', 'inboard', 'sterndrive'] as const;
export const InstallationSchema = z.enum(INSTALLATIONS, {
  error: 'Choose outboard, inboard or sterndrive.',
});
export type Installation = z.infer<typeof InstallationSchema>;

export const FuelSchema = z.enum(['petrol', 'diesel'], { error: 'Choose petrol or diesel.' });
export const CycleSchema = z.enum(['two-stroke', 'four-stroke'], {
  error: 'Choose two-stroke or four-stroke.',
});

export const TACH_SOURCES = ['charging-coil', 'belt-alternator', 'ignition', 'none'] as const;
/** Where the tachometer signal comes from; decides how a measured frequency becomes RPM. */
export const TachSourceSchema = z.enum(TACH_SOURCES, {
  error: 'Choose the tachometer signal source from the list.',
});
export type TachSource = z.infer<typeof TachSourceSchema>;

/**
 * Widest rated full-throttle range accepted. Makers' full-throttle ranges span a few hundred to
 * about 1000 rpm (common practice); anything over 2000 rpm wide is a typing slip.
 */
export const MAX_RATED_RANGE_WIDTH_RPM = 2000;

const optionalPositive = (label: string, max: number, unit = '') =>
  z
    .number({ error: `${label} must be a number.` })
    .positive({ error: `${label} must be above 0.` })
    .max(max, { error: `${label} must be at most ${max}${unit}.` })
    .nullable()
    .default(null);

const ratedRpm = (label: string) =>
  z
    .number({ error: `${label} must be a number.` })
    .int({ error: `${label} must be a whole number.` })
    .min(500, { error: `${label} must be at least 500.` })
    .max(12000, { error: `${label} must be at most 12,000.` });

const EngineFieldsSchema = z.object({
  vesselId: z.uuid({ error: 'Choose the vessel.' }),
  position: EnginePositionSchema,
  installation: InstallationSchema,
  maker: z
    .string({ error: 'Enter the maker.' })
    .trim()
    .min(1, { error: 'Enter the maker.' })
    .max(60, { error: 'Maker can have at most 60 characters.' }),
  model: z
    .string({ error: 'Enter the model.' })
    .trim()
    .min(1, { error: 'Enter the model.' })
    .max(60, { error: 'Model can have at most 60 characters.' }),
  serialNumber: z
    .string({ error: 'Enter the serial number.' })
    .trim()
    .toUpperCase()
    .min(1, { error: 'Enter the serial number.' })
    .max(40, { error: 'Serial number can have at most 40 characters.' }),
  ratedPowerKw: optionalPositive('Rated power', 2000, ' kW'),
  fuel: FuelSchema,
  cycle: CycleSchema,
  ratedRpmMin: ratedRpm('Rated RPM (low end)'),
  ratedRpmMax: ratedRpm('Rated RPM (high end)'),
  gearRatio: optionalPositive('Gear ratio', 10),
  propBlades: z
    .number({ error: 'Propeller blades must be a number.' })
    .int({ error: 'Propeller blades must be a whole number.' })
    .min(2, { error: 'A propeller has at least 2 blades.' })
    .max(7, { error: 'Propeller blades must be at most 7.' })
    .nullable()
    .default(null),
  propDiameterIn: optionalPositive('Propeller diameter', 60, ' in'),
  propPitchIn: optionalPositive('Propeller pitch', 60, ' in'),
  tachSource: TachSourceSchema.default('none'),
  /** Magnet poles of the charging coil or alternator (not pole pairs). */
  poles: z
    .number({ error: 'Poles must be a number.' })
    .int({ error: 'Poles must be a whole number.' })
    .min(2, { error: 'Poles must be at least 2.' })
    .max(48, { error: 'Poles must be at most 48.' })
    .nullable()
    .default(null),
  pulleyRatio: optionalPositive('Pulley ratio', 10),
  hourMeterAtCommissioning: z
    .number({ error: 'Hour meter must be a number.' })
    .min(0, { error: 'Hour meter cannot be negative.' })
    .max(100000, { error: 'Hour meter must be at most 100,000 h.' })
    .nullable()
    .default(null),
  commissionedOn: z.iso
    .date({ error: 'Commissioning date must be a date like 2026-05-14.' })
    .nullable()
    .default(null),
});

/** The fields the cross-field rules read; the rules run whenever these are fine, so a form shows every problem at once. */
const CrossFieldsSchema = EngineFieldsSchema.pick({
  ratedRpmMin: true,
  ratedRpmMax: true,
  poles: true,
  tachSource: true,
  pulleyRatio: true,
});

export const EngineInputSchema = EngineFieldsSchema.superRefine(
  (e, ctx) => {
    if (e.ratedRpmMin >= e.ratedRpmMax) {
      ctx.addIssue({
        code: 'custom',
        path: ['ratedRpmMax'],
        message: 'Rated RPM high end must be above the low end.',
      });
    } else if (e.ratedRpmMax - e.ratedRpmMin > MAX_RATED_RANGE_WIDTH_RPM) {
      ctx.addIssue({
        code: 'custom',
        path: ['ratedRpmMax'],
        message: `Rated RPM range is ${e.ratedRpmMax - e.ratedRpmMin} rpm wide; makers' full-throttle ranges are at most ${MAX_RATED_RANGE_WIDTH_RPM.toLocaleString('en-GB')} rpm wide. Check both ends.`,
      });
    }
    if (e.poles !== null && e.poles % 2 !== 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['poles'],
        message: 'Poles come in pairs: enter an even number.',
      });
    }
    if (e.tachSource === 'belt-alternator' && e.pulleyRatio === null) {
      ctx.addIssue({
        code: 'custom',
        path: ['pulleyRatio'],
        message: 'A belt-driven alternator needs its pulley ratio.',
      });
    }
    if (
      (e.tachSource === 'charging-coil' || e.tachSource === 'belt-alternator') &&
      e.poles === null
    ) {
      ctx.addIssue({
        code: 'custom',
        path: ['poles'],
        message: 'Enter the number of poles of the coil or alternator.',
      });
    }
  },
  { when: (payload) => CrossFieldsSchema.safeParse(payload.value).success },
);
export type EngineInput = z.infer<typeof EngineInputSchema>;
/** What a form holds before the defaults are filled in. */
export type EngineFormInput = z.input<typeof EngineInputSchema>;

/** Every field of the engine form, in the order the form shows them. */
export const ENGINE_FIELDS = Object.keys(EngineFieldsSchema.shape) as Array<keyof EngineInput>;

/** The older name of POSITION_WORDS (engine-words.ts), kept for the server modules that use it. */
export { POSITION_WORDS as positionLabel } from './engine-words';
