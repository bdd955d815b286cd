import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { PageSubmission } from '../shared/page-submission';
import { AuthFrame } from './auth-frame';
import { retryAfterText } from './retry-after-text';

/** E-mail and password sign-in. */
@Component({
  selector: 'tw-sign-in-page',
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
  templateUrl: './sign-in-page.html',
  styles: `
    form {
      display: flex;
      flex-direction: column;
      gap: 12px;
      padding-top: 4px;
    }
    .actions {
      display: flex;
      align-items: center;
      justify-content: space-between;
      gap: 12px;
    }
  `,
})
export class SignInPage {
  private readonly auth = inject(AuthService);
  private readonly router = inject(Router);

  /** Where to go after signing in (set by the guards as a query parameter). */
  readonly returnUrl = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    password: ['', [Validators.required, Validators.maxLength(256)]],
  });
  protected readonly submission = new PageSubmission(this.form, (error) => this.describe(error));

  protected submit(): void {
    this.submission.send(
      () => {
        const { email, password } = this.form.getRawValue();
        return this.auth.signIn({ email: email.trim(), password });
      },
      () => {
        const target = this.returnUrl();
        // Only follow local paths, so a crafted link cannot send the user elsewhere.
        void this.router.navigateByUrl(target && target.startsWith('/') && !target.startsWith('//') ? target : '/');
      },
    );
  }

  private describe(error: unknown): string {
    if (error instanceof HttpErrorResponse && error.status === 429) {
      const wait = retryAfterText(error.headers.get('Retry-After'));
      return `${problemMessage(error, 'Too many sign-in attempts.')} ${wait}`;
    }
    if (error instanceof HttpErrorResponse && error.status === 401) {
      return problemMessage(error, 'That e-mail and password do not match an active account.');
    }
    return problemMessage(error);
  }
}
