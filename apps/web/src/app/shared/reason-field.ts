import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { AbstractControl, FormControl, ReactiveFormsModule, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { problemFieldErrors } from '../core/problem-message';

/** Shortest reason the server accepts for most acts, counted after trimming; a declined request takes any words. */
export const minimumReasonLength = 10;

/** Validator factory: a reason of at least `minimum` characters once spaces at the ends are dropped. */
export function reasonOfAtLeast(minimum: number): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const value = typeof control.value === 'string' ? control.value.trim() : '';
    if (value === '') return { required: true };
    return value.length < minimum ? { tooShort: { length: value.length } } : null;
  };
}

/** Validator: a reason of at least `minimumReasonLength` characters once spaces at the ends are dropped. */
export const reasonLength: ValidatorFn = reasonOfAtLeast(minimumReasonLength);

/**
 * An empty reason control with the checks the server makes: at least `minimum` characters after trimming (1 for an
 * act whose reason may be a word or two) and at most 2000.
 */
export function reasonControl(minimum = minimumReasonLength): FormControl<string> {
  return new FormControl('', { nonNullable: true, validators: [reasonOfAtLeast(minimum), Validators.maxLength(2000)] });
}

/** Puts the API's complaint about the `reason` field of a refused request, if it made one, under the field. */
export function showReasonProblem(control: FormControl<string>, error: unknown): void {
  const field = problemFieldErrors(error).find((candidate) => candidate.field === 'reason');
  if (field) {
    control.setErrors({ server: field.message });
    control.markAsTouched();
  }
}

/**
 * The written reason an act asks for: a Reason box with a count towards the minimum, and what is wrong with it. It
 * takes the focus first when its dialog opens, since the reason is what the dialog is there to ask.
 */
@Component({
  selector: 'tw-reason-field',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field class="tw-full-width">
      <mat-label>Reason</mat-label>
      <textarea matInput [formControl]="control()" rows="3" maxlength="2000" required cdkFocusInitial></textarea>
      @if (minimum() > 1) {
        <mat-hint align="end">{{ control().value.trim().length }} / at least {{ minimum() }}</mat-hint>
      }
      @if (control().hasError('server')) {
        <mat-error>{{ control().getError('server') }}</mat-error>
      } @else if (control().hasError('required')) {
        <mat-error>{{ missing() }}</mat-error>
      } @else if (control().hasError('tooShort')) {
        <mat-error>Write at least {{ minimum() }} characters</mat-error>
      }
    </mat-form-field>
  `,
  styles: `
    :host {
      display: block;
    }
  `,
})
export class ReasonField {
  /** The reason, usually from `reasonControl()`. */
  readonly control = input.required<FormControl<string>>();
  /** The error under an empty reason, e.g. "Say why the right is removed". */
  readonly missing = input.required<string>();
  /** The shortest reason the control accepts, as given to `reasonControl`; the count towards it shows only above 1. */
  readonly minimum = input(minimumReasonLength);
}
