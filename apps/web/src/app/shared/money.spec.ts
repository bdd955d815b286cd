import { formatMoney, fromMinorUnits, toMinorUnits } from './money';

describe('money', () => {
  it('converts typed amounts to integer minor units without float drift', () => {
    expect(toMinorUnits(1250, 'EUR')).toBe(125000);
    expect(toMinorUnits(19.99, 'GBP')).toBe(1999);
    expect(toMinorUnits(0.1 + 0.2, 'EUR')).toBe(30);
  });

  it('respects currencies without a minor unit', () => {
    expect(toMinorUnits(1500, 'JPY')).toBe(1500);
    expect(fromMinorUnits(1500, 'JPY')).toBe(1500);
  });

  it('formats minor units for people', () => {
    expect(formatMoney(265000, 'GBP')).toBe('£2,650.00');
  });
});
