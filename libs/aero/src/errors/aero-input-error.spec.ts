import { describe, expect, it } from 'vitest';
import { AeroInputError } from './aero-input-error';
import { requireFinite, requireFraction, requireNonNegative, requirePositive } from './require-number';

describe('AeroInputError', () => {
  it('is an Error with a code and a name', () => {
    const error = new AeroInputError('ZERO_WIND', 'no wind');
    expect(error).toBeInstanceOf(Error);
    expect(error.code).toBe('ZERO_WIND');
    expect(error.name).toBe('AeroInputError');
    expect(error.message).toBe('no wind');
  });
});

describe('input checks', () => {
  it('passes good values through unchanged', () => {
    expect(requireFinite('f', 'x', -3, 'm')).toBe(-3);
    expect(requirePositive('f', 'x', 2, 'm')).toBe(2);
    expect(requireNonNegative('f', 'x', 0, 'm')).toBe(0);
    expect(requireFraction('f', 'x', 1)).toBe(1);
  });

  it('rejects NaN', () => {
    expect(() => requireFinite('f', 'speed', Number.NaN, 'm/s')).toThrow(/`f` requires a finite speed; got NaN m\/s/);
  });

  it('rejects infinity', () => {
    expect(() => requirePositive('f', 'speed', Number.POSITIVE_INFINITY, 'm/s')).toThrow(expect.objectContaining({ code: 'NOT_FINITE' }));
  });

  it('rejects zero where a positive value is needed', () => {
    expect(() => requirePositive('f', 'density', 0, 'kg/m³')).toThrow(expect.objectContaining({ code: 'OUT_OF_RANGE' }));
    expect(() => requirePositive('f', 'density', 0, 'kg/m³')).toThrow('`f` requires a positive density; got 0 kg/m³');
  });

  it('rejects negatives and fractions above one', () => {
    expect(() => requireNonNegative('f', 'u', -1, '')).toThrow(AeroInputError);
    expect(() => requireFraction('f', 'relative humidity', 50)).toThrow(/between 0 and 1/);
  });
});
