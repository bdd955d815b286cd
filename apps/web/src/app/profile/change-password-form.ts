import { ChangeDetectionStrategy, Component, inject, signal, viewChild } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { NewPasswordForm } from '../auth/new-password-form';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { ProfileApi } from './profile-api';

/** Current password, then a new one chosen with the strength meter. */
@Component({
  selector: 'tw-change-password-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, ErrorBanner, NewPasswordForm],
  template: `
    @if (busy()) {
      <mat-progress-bar mode="indeterminate" aria-label="Changing password" />
    }
    @if (error(); as message) {
      <tw-error-banner [message]="message" [retryable]="false" />
    }
    <mat-form-field class="tw-full-width">
      <mat-label>Current password</mat-label>
      <input matInput [formControl]="current" type="password" autocomplete="current-password" required />
      @if (current.hasError('required')) {
        <mat-error>Enter your current password</mat-error>
      } @else if (current.hasError('server')) {
        <mat-error>{{ current.getError('server') }}</mat-error>
      }
    </mat-form-field>
    <tw-new-password-form
      submitLabel="Change password"
      [busy]="busy()"
      [serverError]="newPasswordError()"
      (submitted)="change($event)"
    />
  `,
  styles: `
    mat-form-field {
      margin-bottom: 12px;
    }
  `,
})
export class ChangePasswordForm {
  private readonly api = inject(ProfileApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly newPassword = viewChild.required(NewPasswordForm);

  protected readonly current = inject(NonNullableFormBuilder).control('', Validators.required);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly newPasswordError = signal<string | null>(null);

  protected change(newPassword: string): void {
    if (this.current.invalid) {
      this.current.markAsTouched();
      return;
    }
    this.busy.set(true);
    this.error.set(null);
    this.newPasswordError.set(null);
    this.api.changePassword({ currentPassword: this.current.value, newPassword }).subscribe({
      next: () => {
        this.busy.set(false);
        this.current.reset();
        this.newPassword().reset();
        this.snackBar.open('Your password has been changed.', undefined, { duration: 4000 });
      },
      error: (error: unknown) => {
        this.busy.set(false);
        const fields = problemFieldErrors(error);
        const currentError = fields.find((item) => item.field === 'currentPassword');
        const newError = fields.find((item) => item.field === 'newPassword');
        if (currentError) {
          this.current.setErrors({ server: currentError.message });
          this.current.markAsTouched();
        }
        if (newError) {
          this.newPasswordError.set(newError.message);
        }
        if (!currentError && !newError) {
          this.error.set(problemMessage(error));
        }
      },
    });
  }
}
