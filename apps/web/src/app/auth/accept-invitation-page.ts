import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { roleLabels } from '@tunnelwright/contracts';
import { AuthService } from '../core/auth-service';
import { problemFieldErrors, problemMessage, problemStatus } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { AccountApi } from './account-api';
import { AuthFrame } from './auth-frame';
import { NewPasswordForm } from './new-password-form';

const expiredLink = 'This link was already used or has expired. Ask your lab manager for a new one.';

/** Opens an invitation link: shows who is invited, lets them choose a password, then signs them in. */
@Component({
  selector: 'tw-accept-invitation-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatProgressBarModule, AuthFrame, ErrorBanner, NewPasswordForm],
  templateUrl: './accept-invitation-page.html',
  styles: `
    .who {
      margin: 0 0 16px;
      line-height: 1.5;
    }
  `,
})
export class AcceptInvitationPage {
  private readonly api = inject(AccountApi);
  private readonly auth = inject(AuthService);
  private readonly router = inject(Router);

  /** The invitation token from the link's query string. */
  readonly token = input<string>();

  protected readonly preview = rxResource({
    params: () => this.token() || undefined,
    stream: ({ params: token }) => this.api.previewInvitation(token),
  });
  protected readonly roleLabel = computed(() => {
    const invitation = this.preview.hasValue() ? this.preview.value() : undefined;
    return invitation ? roleLabels[invitation.role] : '';
  });
  protected readonly userInputs = computed(() => {
    const invitation = this.preview.hasValue() ? this.preview.value() : undefined;
    return invitation ? [invitation.name, invitation.email] : [];
  });
  /** Why the link cannot be used, or null while it looks fine. */
  protected readonly linkProblem = computed(() => {
    if (!this.token()) {
      return 'This page needs the link from your invitation e-mail. Open the link exactly as it was sent.';
    }
    const error = this.preview.error();
    if (!error) {
      return null;
    }
    const status = problemStatus(error.cause ?? error);
    if (status === 410) {
      return expiredLink;
    }
    if (status === 404) {
      return 'This invitation link is not valid. Check that it was copied in full, or ask your lab manager for a new one.';
    }
    return problemMessage(error.cause ?? error);
  });
  protected readonly retryable = computed(() => {
    const error = this.preview.error();
    return !!error && ![404, 410].includes(problemStatus(error.cause ?? error));
  });

  protected readonly busy = signal(false);
  protected readonly submitError = signal<string | null>(null);
  protected readonly passwordError = signal<string | null>(null);

  protected accept(password: string): void {
    const token = this.token();
    if (!token) {
      return;
    }
    this.busy.set(true);
    this.submitError.set(null);
    this.passwordError.set(null);
    this.api.acceptInvitation({ token, password }).subscribe({
      next: (session) => {
        this.auth.acceptSession(session);
        this.busy.set(false);
        void this.router.navigateByUrl('/');
      },
      error: (error: unknown) => {
        this.busy.set(false);
        const field = problemFieldErrors(error).find((item) => item.field === 'password');
        if (field) {
          this.passwordError.set(field.message);
        } else {
          this.submitError.set(problemStatus(error) === 410 ? expiredLink : problemMessage(error));
        }
      },
    });
  }
}
