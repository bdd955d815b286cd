import { describe, expect, it } from 'vitest';
import { circleArea } from './circle-area';
import { rectangleArea } from './rectangle-area';

describe('circleArea', () => {
  it('is π d² / 4', () => {
    expect(Math.abs(circleArea(2) - Math.PI) / Math.PI).toBeLessThan(1e-15); // definition: π × 4 / 4
  });
  it('is zero for a zero diameter', () => {
    expect(circleArea(0)).toBe(0);
  });
  it.each([Number.NaN, Number.POSITIVE_INFINITY, -0.1])('rejects %f', (d) => {
    expect(() => circleArea(d)).toThrow(/`circleArea` requires/);
  });
});

describe('rectangleArea', () => {
  it('is the product of the sides', () => {
    expect(Math.abs(rectangleArea(2, 0.05) - 0.1) / 0.1).toBeLessThan(1e-15); // definition
  });
  it('is zero when a side is zero', () => {
    expect(rectangleArea(0, 3)).toBe(0);
  });
  it.each([
    [Number.NaN, 1],
    [1, Number.NEGATIVE_INFINITY],
    [-1, 1],
  ])('rejects %f × %f', (a, b) => {
    expect(() => rectangleArea(a, b)).toThrow(/`rectangleArea` requires/);
  });
});
