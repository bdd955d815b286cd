import { AbstractControl } from '@angular/forms';

/**
 * The message to show under a numeric field, named after the field's label, e.g.
 * "Width must be greater than zero". Empty when the control is valid.
 */
export function numberErrorText(control: AbstractControl, label: string): string {
  const errors = control.errors;
  if (!errors) {
    return '';
  }
  if (errors['server']) {
    return String(errors['server']);
  }
  if (errors['required']) {
    return `Enter the ${label.toLowerCase()}`;
  }
  if (errors['positive']) {
    return `${label} must be greater than zero`;
  }
  if (errors['min']) {
    const { min } = errors['min'] as { min: number };
    return min === 0 ? `${label} cannot be negative` : `${label} must be at least ${min}`;
  }
  if (errors['max']) {
    const { max } = errors['max'] as { max: number };
    return `${label} must be at most ${max}`;
  }
  return `Check the ${label.toLowerCase()}`;
}
