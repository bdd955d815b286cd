import { AbstractControl, ValidationErrors } from '@angular/forms';

/** Validator: the value, when given, must be a number greater than zero. */
export function positiveNumber(control: AbstractControl): ValidationErrors | null {
  const value = control.value as number | null | '';
  if (value === null || value === '') {
    return null;
  }
  return typeof value === 'number' && Number.isFinite(value) && value > 0 ? null : { positive: true };
}
