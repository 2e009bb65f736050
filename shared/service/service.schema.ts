import { z } from 'zod';

/** A calendar date in the workshop's time zone, YYYY-MM-DD: service is due on a day, not an instant. */
export const CalendarDateSchema = z.iso.date({ error: 'Enter the date as YYYY-MM-DD.' });
export type CalendarDate = z.infer<typeof CalendarDateSchema>;

export const ServiceIntervalSchema = z
  .object({
    hours: z
      .number({ error: 'The service interval in engine hours (hours) must be a number.' })
      .positive({ error: 'The service interval in engine hours (hours) must be more than zero.' })
      .optional(),
    months: z
      .number({ error: 'The service interval in months (months) must be a number.' })
      .int({ error: 'The service interval in months (months) must be a whole number.' })
      .positive({ error: 'The service interval in months (months) must be more than zero.' })
      .optional(),
  })
  .refine((interval) => interval.hours !== undefined || interval.months !== undefined, {
    error: 'Give the service interval in engine hours, in months, or both.',
  });
export type ServiceInterval = z.infer<typeof ServiceIntervalSchema>;

/**
 * First service about 20 h or 1 month after commissioning, whichever first; then every 100 h
 * or 12 months (common practice; BoatUS "Long Life – Outboard Maintenance").
 */
export const FIRST_SERVICE_DEFAULT: ServiceInterval = { hours: 20, months: 1 };
export const REGULAR_SERVICE_DEFAULT: ServiceInterval = { hours: 100, months: 12 };

export const ServiceStartSchema = z.object({
  hourMeter: z
    .number({ error: 'Enter the hour meter reading (hourMeter).' })
    .nonnegative({ error: 'The hour meter reading (hourMeter) cannot be negative.' }),
  date: CalendarDateSchema,
});
/** Where an interval is counted from: commissioning, or the last service. */
export type ServiceStart = z.infer<typeof ServiceStartSchema>;
