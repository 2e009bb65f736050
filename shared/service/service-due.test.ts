import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { firstServiceDue, serviceDue, serviceStatus } from './service-due';
import {
  CalendarDateSchema,
  FIRST_SERVICE_DEFAULT,
  REGULAR_SERVICE_DEFAULT,
  ServiceIntervalSchema,
} from './service.schema';

// Commissioning values below are illustrative inputs; the intervals are
// common practice; BoatUS "Long Life – Outboard Maintenance".
const commissioning = { hourMeter: 1.5, date: '2025-05-10' };

describe('first service due', () => {
  it('defaults to 20 h or 1 month after commissioning', () => {
    expect(FIRST_SERVICE_DEFAULT).toEqual({ hours: 20, months: 1 });
    expect(REGULAR_SERVICE_DEFAULT).toEqual({ hours: 100, months: 12 });
    expect(firstServiceDue(commissioning)).toEqual({ dueAtHours: 21.5, dueOn: '2025-06-10' });
  });

  it('counts only the limits the interval has', () => {
    expect(serviceDue(commissioning, { hours: 20 })).toEqual({ dueAtHours: 21.5, dueOn: null });
    expect(serviceDue(commissioning, { months: 12 })).toEqual({
      dueAtHours: null,
      dueOn: '2026-05-10',
    });
  });

  it('clamps to the last day of a shorter month (date-fns addMonths)', () => {
    expect(serviceDue({ hourMeter: 0, date: '2024-01-31' }, { months: 1 }).dueOn).toBe(
      '2024-02-29',
    );
    expect(serviceDue({ hourMeter: 0, date: '2025-01-31' }, { months: 1 }).dueOn).toBe(
      '2025-02-28',
    );
  });

  it('stays on the same calendar day whatever the zone (pure string in and out)', () => {
    fc.assert(
      fc.property(
        fc.date({ min: new Date('2000-01-01'), max: new Date('2090-12-31'), noInvalidDate: true }),
        (d) => {
          const date = d.toISOString().slice(0, 10);
          const due = serviceDue({ hourMeter: 0, date }, { months: 12 }).dueOn!;
          expect(due.slice(5, 7)).toBe(date.slice(5, 7));
          expect(Number(due.slice(0, 4))).toBe(Number(date.slice(0, 4)) + 1);
        },
      ),
    );
  });
});

describe('service status, whichever limit comes first', () => {
  const due = firstServiceDue(commissioning);

  it('not due early on', () => {
    expect(serviceStatus(due, { hourMeter: 5, date: '2025-05-20' })).toMatchObject({
      state: 'not-due',
      trigger: 'hours',
      hoursLeft: 16.5,
      daysLeft: 21,
    });
  });

  it('hours trigger first on a busy month', () => {
    expect(serviceStatus(due, { hourMeter: 22, date: '2025-05-25' })).toMatchObject({
      state: 'overdue',
      trigger: 'hours',
    });
  });

  it('the date triggers first on a quiet month', () => {
    expect(serviceStatus(due, { hourMeter: 6, date: '2025-06-11' })).toMatchObject({
      state: 'overdue',
      trigger: 'date',
      daysLeft: -1,
    });
  });

  it('due on the day itself counts as overdue: the limit is reached', () => {
    expect(serviceStatus(due, { hourMeter: 6, date: '2025-06-10' }).state).toBe('overdue');
    expect(serviceStatus(due, { hourMeter: 21.5, date: '2025-05-11' }).state).toBe('overdue');
  });

  it('due soon within the reminder window (our choice: 5 h or 7 days)', () => {
    expect(serviceStatus(due, { hourMeter: 17, date: '2025-05-12' })).toMatchObject({
      state: 'due-soon',
      trigger: 'hours',
    });
    expect(serviceStatus(due, { hourMeter: 3, date: '2025-06-05' })).toMatchObject({
      state: 'due-soon',
      trigger: 'date',
    });
  });

  it('takes a window from the caller', () => {
    expect(
      serviceStatus(due, { hourMeter: 10, date: '2025-05-12' }, { hours: 12, days: 0 }).state,
    ).toBe('due-soon');
  });

  it('works with an hours-only interval', () => {
    const hoursOnly = serviceDue(commissioning, { hours: 20 });
    expect(serviceStatus(hoursOnly, { hourMeter: 30, date: '2030-01-01' })).toMatchObject({
      state: 'overdue',
      trigger: 'hours',
      daysLeft: null,
    });
  });
});

describe('schemas', () => {
  it('an interval needs hours or months', () => {
    const result = ServiceIntervalSchema.safeParse({});
    expect(result.error?.issues[0].message).toBe(
      'Give the service interval in engine hours, in months, or both.',
    );
  });

  it('rejects zero hours and fractional months, naming the field', () => {
    expect(ServiceIntervalSchema.safeParse({ hours: 0 }).error?.issues[0].path).toEqual(['hours']);
    expect(ServiceIntervalSchema.safeParse({ months: 1.5 }).error?.issues[0]).toMatchObject({
      path: ['months'],
      message: 'The service interval in months (months) must be a whole number.',
    });
  });

  it('dates are YYYY-MM-DD', () => {
    expect(CalendarDateSchema.safeParse('10/05/2025').error?.issues[0].message).toBe(
      'Enter the date as YYYY-MM-DD.',
    );
    expect(CalendarDateSchema.parse('2025-05-10')).toBe('2025-05-10');
  });
});
