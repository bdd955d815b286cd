import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { fullScaleDragArea } from './scale-drag-area';

const relative = (actual: number, expected: number): number => Math.abs(actual - expected) / Math.abs(expected);

describe('fullScaleDragArea', () => {
  it('multiplies by the square of the length ratio: a 1:4 model has 1/16 of the full-scale area', () => {
    // Definition (similar figures): areas go as length², 4² = 16.
    expect(relative(fullScaleDragArea(0.0375, 4), 0.6)).toBeLessThan(1e-12);
    // Definition: a 0.1375 m² model frontal area at 1:4 is 2.2 m² at full scale, a usual car frontal area (common practice).
    expect(relative(fullScaleDragArea(0.1375, 4), 2.2)).toBeLessThan(1e-12);
  });

  it('leaves a full-size article as it is and scales a zero uncertainty to zero', () => {
    expect(fullScaleDragArea(0.42, 1)).toBe(0.42); // definition: ratio 1
    expect(fullScaleDragArea(0, 2.5)).toBe(0); // definition: 0 × s² = 0
  });

  it('refuses a negative area and a scale that is not positive', () => {
    expect(() => fullScaleDragArea(-0.1, 4)).toThrow(AeroInputError);
    expect(() => fullScaleDragArea(0.1, 0)).toThrow(AeroInputError);
    expect(() => fullScaleDragArea(Number.NaN, 4)).toThrow(AeroInputError);
  });
});
