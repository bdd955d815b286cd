import { describe, expect, it } from 'vitest';
import { DEGREE, degreesToRadians, radiansToDegrees } from './angles';

describe('angles', () => {
  it('uses 1° = 1.745329e-2 rad (NIST SP 811 App. B.8)', () => {
    expect(Math.abs(DEGREE / 1.745329e-2 - 1)).toBeLessThan(5e-7);
  });
  it('round-trips 47° (the 40 CFR 1037.528 example angle)', () => {
    expect(radiansToDegrees(degreesToRadians(47))).toBeCloseTo(47, 12);
  });
  it('maps 180° to π (definition)', () => {
    expect(degreesToRadians(180)).toBe(Math.PI);
  });
});
