import { z } from 'zod';

export const ENGINE_POSITIONS = ['single', 'port', 'starboard', 'centre', 'inboard'] as const;
export const EnginePositionSchema = z.enum(ENGINE_POSITIONS, { error: 'Choose the engine position from the list.' });
export type EnginePosition = z.infer<typeof EnginePositionSchema>;

export const INSTALLATIONS = ['outboard', 'inboard', 'sterndrive'] as const;
export const InstallationSchema = z.enum(INSTALLATIONS, { error: 'Choose outboard, inboard or sterndrive.' });

export const FuelSchema = z.enum(['petrol', 'diesel'], { error: 'Choose petrol or diesel.' });
export const CycleSchema = z.enum(['two-stroke', 'four-stroke'], { error: 'Choose two-stroke or four-stroke.' });

/** Where the tachometer signal comes from; decides how a measured frequency becomes RPM. */
export const TachSourceSchema = z.enum(['charging-coil', 'belt-alternator', 'ignition', 'none'], {
  error: 'Choose the tachometer signal source from the list.',
});

const optionalPositive = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number.` })
    .positive({ error: `${label} must be above 0.` })
    .max(max, { error: `${label} must be at most ${max}.` })
    .nullable()
    .default(null);

const EngineFieldsSchema = z.object({
  vesselId: z.uuid({ error: 'Choose the vessel.' }),
  position: EnginePositionSchema,
  installation: InstallationSchema,
  maker: z.string({ error: 'Enter the maker.' }).trim().min(1, { error: 'Enter the maker.' }).max(60),
  model: z.string({ error: 'Enter the model.' }).trim().min(1, { error: 'Enter the model.' }).max(60),
  serialNumber: z.string({ error: 'Enter the serial number.' }).trim().toUpperCase().min(1, { error: 'Enter the serial number.' }).max(40),
  ratedPowerKw: optionalPositive('Rated power', 2000),
  fuel: FuelSchema,
  cycle: CycleSchema,
  ratedRpmMin: z.number({ error: 'Rated RPM (low end) must be a number.' }).int({ error: 'Rated RPM must be a whole number.' }).min(500, { error: 'Rated RPM (low end) must be at least 500.' }).max(12000),
  ratedRpmMax: z.number({ error: 'Rated RPM (high end) must be a number.' }).int({ error: 'Rated RPM must be a whole number.' }).min(500).max(12000, { error: 'Rated RPM (high end) must be at most 12,000.' }),
  gearRatio: optionalPositive('Gear ratio', 10),
  propBlades: z.number().int().min(2, { error: 'A propeller has at least 2 blades.' }).max(7).nullable().default(null),
  propDiameterIn: optionalPositive('Propeller diameter', 60),
  propPitchIn: optionalPositive('Propeller pitch', 60),
  tachSource: TachSourceSchema.default('none'),
  /** Magnet poles of the charging coil or alternator (not pole pairs). */
  poles: z.number({ error: 'Poles must be a number.' }).int({ error: 'Poles must be a whole number.' }).min(2, { error: 'Poles must be at least 2.' }).max(48).nullable().default(null),
  pulleyRatio: optionalPositive('Pulley ratio', 10),
  hourMeterAtCommissioning: z.number({ error: 'Hour meter must be a number.' }).min(0, { error: 'Hour meter cannot be negative.' }).max(100000).nullable().default(null),
  commissionedOn: z.iso.date({ error: 'Commissioning date must be a date like 2026-05-14.' }).nullable().default(null),
});

export const EngineInputSchema = EngineFieldsSchema.superRefine((e, ctx) => {
  if (e.ratedRpmMin >= e.ratedRpmMax) {
    ctx.addIssue({ code: 'custom', path: ['ratedRpmMax'], message: 'Rated RPM high end must be above the low end.' });
  }
  if (e.poles !== null && e.poles % 2 !== 0) {
    ctx.addIssue({ code: 'custom', path: ['poles'], message: 'Poles come in pairs: enter an even number.' });
  }
  if (e.tachSource === 'belt-alternator' && e.pulleyRatio === null) {
    ctx.addIssue({ code: 'custom', path: ['pulleyRatio'], message: 'A belt-driven alternator needs its pulley ratio.' });
  }
  if ((e.tachSource === 'charging-coil' || e.tachSource === 'belt-alternator') && e.poles === null) {
    ctx.addIssue({ code: 'custom', path: ['poles'], message: 'Enter the number of poles of the coil or alternator.' });
  }
});
export type EngineInput = z.infer<typeof EngineInputSchema>;
