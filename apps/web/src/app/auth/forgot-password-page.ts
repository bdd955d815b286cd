import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { problemMessage, problemStatus } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { PageSubmission } from '../shared/page-submission';
import { AccountApi } from './account-api';
import { AuthFrame } from './auth-frame';

/** Asks for a password-reset e-mail. The answer is the same whether or not the address has an account. */
@Component({
  selector: 'tw-forgot-password-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
    MatProgressBarModule,
    AuthFrame,
    ErrorBanner,
  ],
  template: `
    <tw-auth-frame heading="Forgotten password">
      @if (sent()) {
        <p role="status">
          If an account uses that address, a link to choose a new password is on its way. The link works once and
          expires after a short while.
        </p>
        <a mat-button routerLink="/sign-in">Back to sign-in</a>
      } @else {
        @if (submission.busy()) {
          <mat-progress-bar mode="indeterminate" aria-label="Sending" />
        }
        @if (submission.error(); as message) {
          <tw-error-banner [message]="message" (retry)="submit()" />
        }
        <p class="tw-muted">Enter the e-mail you sign in with and we will send you a link to choose a new password.</p>
        <form [formGroup]="form" (ngSubmit)="submit()" novalidate>
          <mat-form-field class="tw-full-width">
            <mat-label>E-mail</mat-label>
            <input matInput formControlName="email" type="email" autocomplete="username" required />
            @if (form.controls.email.hasError('required')) {
              <mat-error>Enter your e-mail address</mat-error>
            } @else if (form.controls.email.hasError('email')) {
              <mat-error>Enter a valid e-mail address</mat-error>
            }
          </mat-form-field>
          <div class="actions">
            <a routerLink="/sign-in">Back to sign-in</a>
            <button mat-flat-button type="submit" [disabled]="submission.busy()">Send link</button>
          </div>
        </form>
      }
    </tw-auth-frame>
  `,
  styles: `
    .actions {
      display: flex;
      justify-content: space-between;
      align-items: center;
      margin-top: 12px;
    }
  `,
})
export class ForgotPasswordPage {
  private readonly api = inject(AccountApi);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
  });
  protected readonly sent = signal(false);
  protected readonly submission = new PageSubmission(this.form, (error) =>
    problemStatus(error) === 429 ? 'Too many requests from here. Try again in a few minutes.' : problemMessage(error),
  );

  protected submit(): void {
    this.submission.send(
      () => this.api.forgotPassword({ email: this.form.controls.email.value.trim() }),
      () => this.sent.set(true),
    );
  }
}
