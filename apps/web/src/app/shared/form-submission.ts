import { ElementRef, inject, signal } from '@angular/core';
import type { AbstractControl } from '@angular/forms';
import { MatDialogRef } from '@angular/material/dialog';
import type { Observable } from 'rxjs';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { focusFirstInvalid } from './focus-first-invalid';

/** How a dialog's form is sent. */
export interface FormSubmissionOptions {
  /** Shown when sending fails and the API said nothing more precise, e.g. "The tunnel could not be saved." */
  failure: string;
  /** The form control an API field error belongs to; by default the field's own name. */
  controlPath?: (field: string) => string;
}

/**
 * Sending a dialog's form: refused while invalid with the focus on the first bad field, busy meanwhile, the dialog
 * closed with the answer, or the API's complaints put under their fields and its message in the dialog.
 * Create it in the dialog's field initialiser, where `inject` works.
 */
export class FormSubmission {
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly dialogRef = inject<MatDialogRef<unknown>>(MatDialogRef);
  /** Whether the form is being sent. */
  readonly sending = signal(false);
  /** Why the last send failed, or null. */
  readonly error = signal<string | null>(null);

  constructor(
    private readonly form: AbstractControl,
    private readonly options: FormSubmissionOptions,
  ) {}

  /** Whether the form may be sent; if not, every message shows and the first invalid field takes the focus. */
  checkValid(): boolean {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return false;
    }
    return true;
  }

  /** Sends the request and closes the dialog with what `closeWith` makes of the answer (the answer itself by default). */
  send<A>(request: Observable<A>, closeWith: (answer: A) => unknown = (answer) => answer): void {
    this.sending.set(true);
    this.error.set(null);
    request.subscribe({
      next: (answer) => {
        this.sending.set(false);
        this.dialogRef.close(closeWith(answer));
      },
      error: (error: unknown) => {
        this.sending.set(false);
        for (const field of problemFieldErrors(error)) {
          const control = this.form.get(this.options.controlPath?.(field.field) ?? field.field);
          control?.setErrors({ server: field.message });
          control?.markAsTouched();
        }
        this.error.set(problemMessage(error, this.options.failure));
      },
    });
  }
}
