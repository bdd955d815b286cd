import { formatPeriod, labInstant, localValueAfterHours, localValueOf } from './lab-time';

describe('lab time', () => {
  const period = { start: '2026-10-05T08:00:00Z', end: '2026-10-05T16:00:00Z' };

  it('shows a period in the lab zone only when the viewer shares it', () => {
    expect(formatPeriod(period, 'Europe/London', 'Europe/London')).toBe('Mon 5 Oct 2026, 09:00–17:00 (Europe/London)');
  });

  it('adds the viewer’s own time when their zone differs', () => {
    expect(formatPeriod(period, 'Europe/London', 'America/New_York')).toBe(
      'Mon 5 Oct 2026, 09:00–17:00 (Europe/London); your time Mon 5 Oct 2026, 04:00–12:00 (America/New_York)',
    );
  });

  it('reads a local value as wall time in the lab zone and back', () => {
    const instant = labInstant('2026-10-05T09:00', 'Europe/London');
    expect(instant).toBe('2026-10-05T09:00:00+01:00');
    expect(localValueOf(instant ?? '', 'Europe/London')).toBe('2026-10-05T09:00');
  });

  it('refuses an empty value', () => {
    expect(labInstant('', 'Europe/London')).toBeNull();
  });

  it('adds hours on the wall clock, rounded up to the minute, across midnight', () => {
    expect(localValueAfterHours('2026-10-05T09:00', 3.5)).toBe('2026-10-05T12:30');
    expect(localValueAfterHours('2026-10-05T22:00', 2.01)).toBe('2026-10-06T00:01');
  });

  it('adds nothing to an invalid start or a duration that is not positive', () => {
    expect(localValueAfterHours('', 2)).toBeNull();
    expect(localValueAfterHours('2026-10-05T09:00', 0)).toBeNull();
    expect(localValueAfterHours('2026-10-05T09:00', Number.NaN)).toBeNull();
  });
});
