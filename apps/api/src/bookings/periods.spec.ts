import { describe, expect, it } from 'vitest';
import { describePeriod, parsePeriod, rangeLiteral, toPeriod } from './periods';

describe('parsePeriod', () => {
  it('reads a tstzrange as PostgreSQL prints it, with hour-only and fractional offsets', () => {
    expect(parsePeriod('["2026-10-24 08:00:00+00","2026-10-25 09:00:00+00")')).toEqual({ start: new Date('2026-10-24T08:00:00Z'), end: new Date('2026-10-25T09:00:00Z') });
    expect(parsePeriod('["2027-01-05 09:30:00.5+05:30","2027-01-05 10:00:00+05:30")').start.toISOString()).toBe('2027-01-05T04:00:00.500Z');
  });

  it('round-trips what rangeLiteral writes', () => {
    const period = { start: new Date('2027-03-01T10:00:00Z'), end: new Date('2027-03-01T12:00:00Z') };
    expect(parsePeriod(rangeLiteral(period))).toEqual(period);
  });

  it('throws on anything that is not a bounded range', () => {
    expect(() => parsePeriod('empty')).toThrow(/parsePeriod cannot read/);
    expect(() => parsePeriod('[nonsense,2027-01-01)')).toThrow(/parsePeriod cannot read/);
  });
});

describe('toPeriod and describePeriod', () => {
  it('counts real hours across the autumn clock change and shows wall time in the zone', () => {
    const period = { start: new Date('2027-10-30T08:00:00Z'), end: new Date('2027-10-31T09:00:00Z') };
    expect(toPeriod(period).hours).toBe(25);
    expect(describePeriod(period, 'Europe/London')).toBe('Sat 30 Oct 2027 09:00 – Sun 31 Oct 2027 09:00 (Europe/London)');
  });
});
