import { DateTime } from 'luxon';
import { monthDays, overlapsDay, timesOnDay, weekDays } from './calendar-days';

describe('calendar days', () => {
  const zone = 'Europe/London';
  const anchor = DateTime.fromISO('2026-10-21T12:00:00Z');

  it('starts the week on Monday in the lab zone and keeps the 25-hour day of the clock change', () => {
    const days = weekDays(anchor, zone);
    expect(days.map((d) => d.date)).toEqual(['2026-10-19', '2026-10-20', '2026-10-21', '2026-10-22', '2026-10-23', '2026-10-24', '2026-10-25']);
    expect((days[6]!.end - days[6]!.start) / 3_600_000).toBe(25);
  });

  it('lists every day of the month', () => {
    expect(monthDays(anchor, zone)).toHaveLength(31);
  });

  it('treats periods as half-open and shows the times within the day', () => {
    const [monday, tuesday] = weekDays(anchor, zone);
    const period = { start: '2026-10-19T08:00:00Z', end: '2026-10-19T23:00:00Z' };
    expect(overlapsDay(period, monday!)).toBe(true);
    expect(overlapsDay(period, tuesday!)).toBe(false);
    expect(timesOnDay(period, monday!, zone)).toBe('09:00–…');
    expect(overlapsDay({ start: '2026-10-19T08:00:00Z', end: '2026-10-20T09:00:00Z' }, tuesday!)).toBe(true);
  });
});
