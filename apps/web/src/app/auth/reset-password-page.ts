import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { problemFieldErrors, problemMessage, problemStatus } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { AccountApi } from './account-api';
import { AuthFrame } from './auth-frame';
import { NewPasswordForm } from './new-password-form';

/** Follows a password-reset link: choose a new password, then sign in with it. */
@Component({
  selector: 'tw-reset-password-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatProgressBarModule, AuthFrame, ErrorBanner, NewPasswordForm],
  template: `
    <tw-auth-frame heading="Choose a new password">
      @if (!token()) {
        <tw-error-banner
          message="This page needs the link from your password-reset e-mail. Open the link exactly as it was sent."
          [retryable]="false"
        />
        <a mat-button routerLink="/forgot-password">Ask for a new link</a>
      } @else if (done()) {
        <p role="status">Your password has been changed. Sign in with the new one.</p>
        <a mat-flat-button routerLink="/sign-in">Sign in</a>
      } @else {
        @if (busy()) {
          <mat-progress-bar mode="indeterminate" aria-label="Saving" />
        }
        @if (error(); as message) {
          <tw-error-banner [message]="message" [retryable]="false" />
        }
        <tw-new-password-form
          submitLabel="Change password"
          [busy]="busy()"
          [serverError]="passwordError()"
          (submitted)="reset($event)"
        />
      }
    </tw-auth-frame>
  `,
})
export class ResetPasswordPage {
  private readonly api = inject(AccountApi);

  /** The reset token from the link's query string. */
  readonly token = input<string>();

  protected readonly busy = signal(false);
  protected readonly done = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly passwordError = signal<string | null>(null);

  protected reset(password: string): void {
    const token = this.token();
    if (!token) {
      return;
    }
    this.busy.set(true);
    this.error.set(null);
    this.passwordError.set(null);
    this.api.resetPassword({ token, password }).subscribe({
      next: () => {
        this.busy.set(false);
        this.done.set(true);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        const field = problemFieldErrors(error).find((item) => item.field === 'password');
        if (field) {
          this.passwordError.set(field.message);
        } else if (problemStatus(error) === 410) {
          this.error.set('This link was already used or has expired. Ask for a new one from the sign-in page.');
        } else {
          this.error.set(problemMessage(error));
        }
      },
    });
  }
}
