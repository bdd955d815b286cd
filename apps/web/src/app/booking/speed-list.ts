import type { AbstractControl, ValidationErrors } from '@angular/forms';

/** Reads "20, 30, 40" as speeds in m/s; null when any entry is not a number above zero. */
export function parseSpeeds(text: string): number[] | null {
  const parts = text
    .split(/[,;\s]+/)
    .map((part) => part.trim())
    .filter((part) => part !== '');
  const speeds = parts.map(Number);
  return speeds.every((speed) => Number.isFinite(speed) && speed > 0) ? speeds : null;
}

/** Form validator for a list of speeds. */
export function speedListValidator(control: AbstractControl<string>): ValidationErrors | null {
  const speeds = parseSpeeds(control.value ?? '');
  if (speeds === null) {
    return { speeds: 'List speeds in m/s above zero, separated by commas' };
  }
  return speeds.length > 50 ? { speeds: 'List at most 50 speeds' } : null;
}
