import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';

/** Group validator: the `confirm` control must repeat the `password` control. */
export const matchingPasswords: ValidatorFn = (group: AbstractControl): ValidationErrors | null => {
  const password = group.get('password')?.value as string | undefined;
  const confirm = group.get('confirm')?.value as string | undefined;
  return confirm && password !== confirm ? { mismatch: true } : null;
};
