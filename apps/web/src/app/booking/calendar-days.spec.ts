import { DateTime } from 'luxon';
import { freeStretches, monthDays, nextWholeHour, overlapsDay, stretchTimes, timesOnDay, weekDays } from './calendar-days';

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

  const at = (iso: string) => Date.parse(iso);
  const iso = (stretches: { start: number; end: number }[]) => stretches.map((s) => [new Date(s.start).toISOString(), new Date(s.end).toISOString()]);

  it('finds the free parts of a day around overlapping and back-to-back busy periods', () => {
    const tuesday = weekDays(anchor, zone)[1]!;
    const busy = [
      { start: '2026-10-20T12:00:00Z', end: '2026-10-20T14:00:00Z' },
      { start: '2026-10-20T08:00:00Z', end: '2026-10-20T10:00:00Z' },
      { start: '2026-10-20T09:00:00Z', end: '2026-10-20T11:00:00Z' },
      // Back to back with the one before: no gap between them.
      { start: '2026-10-20T14:00:00Z', end: '2026-10-20T15:00:00Z' },
      // Runs on into Wednesday.
      { start: '2026-10-20T21:00:00Z', end: '2026-10-21T03:00:00Z' },
    ];
    // Lab midnight is 23:00 UTC while British Summer Time (UTC+1) lasts.
    expect(iso(freeStretches(busy, tuesday, 0))).toEqual([
      ['2026-10-19T23:00:00.000Z', '2026-10-20T08:00:00.000Z'],
      ['2026-10-20T11:00:00.000Z', '2026-10-20T12:00:00.000Z'],
      ['2026-10-20T15:00:00.000Z', '2026-10-20T21:00:00.000Z'],
    ]);
    expect(freeStretches([{ start: '2026-10-19T20:00:00Z', end: '2026-10-21T01:00:00Z' }], tuesday, 0)).toEqual([]);
  });

  it('leaves out what is already past, and a day that is over', () => {
    const tuesday = weekDays(anchor, zone)[1]!;
    const busy = [{ start: '2026-10-20T12:00:00Z', end: '2026-10-20T14:00:00Z' }];
    expect(iso(freeStretches(busy, tuesday, at('2026-10-20T13:00:00Z')))).toEqual([['2026-10-20T14:00:00.000Z', '2026-10-20T23:00:00.000Z']]);
    expect(iso(freeStretches(busy, tuesday, at('2026-10-20T09:00:00Z')))).toEqual([
      ['2026-10-20T09:00:00.000Z', '2026-10-20T12:00:00.000Z'],
      ['2026-10-20T14:00:00.000Z', '2026-10-20T23:00:00.000Z'],
    ]);
    expect(freeStretches(busy, tuesday, at('2026-10-21T00:00:00Z'))).toEqual([]);
  });

  it('keeps the whole 25 hours of the day the clocks go back free when nothing is booked', () => {
    // UK clocks go back from 02:00 BST to 01:00 GMT on the last Sunday of October (IANA tz database, Europe/London:
    // EU rule, last Sunday of October at 01:00 UTC), so Sunday 25 October 2026 runs 23:00 UTC Saturday to 00:00 UTC Monday.
    const sunday = weekDays(anchor, zone)[6]!;
    const [whole] = freeStretches([], sunday, 0);
    expect(iso([whole!])).toEqual([['2026-10-24T23:00:00.000Z', '2026-10-26T00:00:00.000Z']]);
    expect(stretchTimes(whole!, sunday, zone)).toBe('all day');
    // 01:00 UTC is 01:00 GMT after the change; the day's last stretch ends at midnight, written 24:00.
    expect(stretchTimes({ start: at('2026-10-25T01:00:00Z'), end: sunday.end }, sunday, zone)).toBe('01:00–24:00');
    expect(stretchTimes({ start: sunday.start, end: at('2026-10-25T00:30:00Z') }, sunday, zone)).toBe('00:00–01:30');
  });

  it('rounds the present up to the lab clock’s next whole hour, and leaves a whole hour as it is', () => {
    expect(new Date(nextWholeHour(at('2026-10-20T09:20:31Z'), zone)).toISOString()).toBe('2026-10-20T10:00:00.000Z');
    expect(new Date(nextWholeHour(at('2026-10-20T09:00:00Z'), zone)).toISOString()).toBe('2026-10-20T09:00:00.000Z');
    // India keeps UTC+05:30 all year (IANA tz database, Asia/Kolkata), so its whole hours fall at half past in UTC.
    expect(new Date(nextWholeHour(at('2026-10-20T09:20:00Z'), 'Asia/Kolkata')).toISOString()).toBe('2026-10-20T09:30:00.000Z');
  });
});
