import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { AbstractControl, FormControl, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { problemFieldErrors } from '../core/problem-message';

/** Shortest reason the server accepts, counted after trimming. */
export const minimumReasonLength = 10;

/** Validator: a reason of at least `minimumReasonLength` characters once spaces at the ends are dropped. */
export function reasonLength(control: AbstractControl): ValidationErrors | null {
  const value = typeof control.value === 'string' ? control.value.trim() : '';
  if (value === '') return { required: true };
  return value.length < minimumReasonLength ? { tooShort: { length: value.length } } : null;
}

/** An empty reason control with the checks the server makes. */
export function reasonControl(): FormControl<string> {
  return new FormControl('', { nonNullable: true, validators: [reasonLength, Validators.maxLength(2000)] });
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
      <mat-hint align="end">{{ control().value.trim().length }} / at least {{ minimum }}</mat-hint>
      @if (control().hasError('server')) {
        <mat-error>{{ control().getError('server') }}</mat-error>
      } @else if (control().hasError('required')) {
        <mat-error>{{ missing() }}</mat-error>
      } @else if (control().hasError('tooShort')) {
        <mat-error>Write at least {{ minimum }} characters</mat-error>
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

  protected readonly minimum = minimumReasonLength;
}
