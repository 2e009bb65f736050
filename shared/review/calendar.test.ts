import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { serviceDue, serviceStatus } from '../service/service-due';
import { addMonthsToDay, daysBetween } from './calendar';
import { firstServiceView } from './first-service';

const day = fc
  .date({ min: new Date('2000-01-01'), max: new Date('2090-12-31'), noInvalidDate: true })
  .map((d) => d.toISOString().slice(0, 10));

describe('calendar arithmetic of the runs board', () => {
  it('clamps to the end of a shorter month, as the service rules do', () => {
    expect(addMonthsToDay('2024-01-31', 1)).toBe('2024-02-29');
    expect(addMonthsToDay('2025-01-31', 1)).toBe('2025-02-28');
    expect(addMonthsToDay('2026-11-27', 1)).toBe('2026-12-27');
    expect(addMonthsToDay('2026-12-15', 13)).toBe('2028-01-15');
    expect(daysBetween('2026-12-01', '2026-12-27')).toBe(26);
    expect(daysBetween('2026-03-30', '2026-03-28')).toBe(-2);
  });

  it('gives exactly what shared/service gives, for any dates, intervals and hours', () => {
    fc.assert(
      fc.property(
        day,
        day,
        fc
          .record({
            hours: fc.option(fc.integer({ min: 1, max: 200 }), { nil: undefined }),
            months: fc.option(fc.integer({ min: 1, max: 36 }), { nil: undefined }),
          })
          .filter((i) => i.hours !== undefined || i.months !== undefined),
        fc.double({ min: 0, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        (commissionedOn, today, rawInterval, hoursNow, meterAtStart) => {
          const interval = Object.fromEntries(
            Object.entries(rawInterval).filter(([, v]) => v !== undefined),
          );
          const reference = serviceStatus(
            serviceDue({ hourMeter: meterAtStart, date: commissionedOn }, interval),
            { hourMeter: hoursNow, date: today },
          );
          const fast = firstServiceView(
            { hourMeter: meterAtStart, date: commissionedOn },
            interval,
            { hours: hoursNow, source: 'logged' },
            today,
          );
          expect({ ...fast, hoursNow: undefined, hoursSource: undefined }).toEqual({
            ...reference,
            hoursNow: undefined,
            hoursSource: undefined,
          });
        },
      ),
      { numRuns: 2000 },
    );
  });
});
