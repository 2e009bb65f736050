import { describe, expect, it } from 'vitest';
import { FIRST_SERVICE_DEFAULT } from '../service/service.schema';
import { calendarDateIn, engineHoursNow, firstServiceView } from './first-service';

// Commissioning figures are illustrative inputs; the 20 h / 1 month interval is
// common practice; BoatUS "Long Life – Outboard Maintenance".
const commissioning = { hourMeter: 2, date: '2026-11-27' };

describe('first service on the board', () => {
  it('takes a logged hour meter over the estimate from running time', () => {
    expect(engineHoursNow(2, { hourMeter: 21.4 }, 99 * 3_600_000)).toEqual({
      hours: 21.4,
      source: 'logged',
    });
    expect(engineHoursNow(2, null, 5.5 * 3_600_000)).toEqual({ hours: 7.5, source: 'estimated' });
  });

  it('is overdue once the hours pass 20 h after commissioning, whatever the date', () => {
    const view = firstServiceView(
      commissioning,
      FIRST_SERVICE_DEFAULT,
      { hours: 22.3, source: 'logged' },
      '2026-11-30',
    );
    expect(view).toMatchObject({
      state: 'overdue',
      trigger: 'hours',
      dueAtHours: 22,
      dueOn: '2026-12-27',
      hoursNow: 22.3,
      hoursSource: 'logged',
    });
  });

  it('is due soon within the reminder window (our choice: 5 h or 7 days)', () => {
    const view = firstServiceView(
      commissioning,
      FIRST_SERVICE_DEFAULT,
      { hours: 4, source: 'estimated' },
      '2026-12-22',
    );
    expect(view).toMatchObject({ state: 'due-soon', trigger: 'date', daysLeft: 5 });
  });

  it("reads today in the workshop's zone", () => {
    const lateEvening = new Date('2026-12-01T23:30:00Z');
    expect(calendarDateIn('Europe/London', lateEvening)).toBe('2026-12-01');
    expect(calendarDateIn('Pacific/Auckland', lateEvening)).toBe('2026-12-02');
    expect(calendarDateIn('Not/AZone', lateEvening)).toBe('2026-12-01');
  });
});
