import { DatePipe } from '@angular/common';
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { MailSummary } from '@tunnelwright/contracts';
import { problemMessage, problemStatus } from '../core/problem-message';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { MailText } from './mail-text';

/** Demo mode only: what the local mail catcher received, newest first, with its links clickable. */
@Component({
  selector: 'tw-dev-mailbox-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatExpansionModule, MatButtonModule, MatIconModule, MatProgressBarModule, EmptyState, ErrorBanner, MailText],
  templateUrl: './dev-mailbox-page.html',
  styleUrl: './dev-mailbox-page.scss',
})
export class DevMailboxPage {
  private readonly http = inject(HttpClient);

  protected readonly mails = rxResource({ stream: () => this.http.get<MailSummary[]>('/api/dev/mailbox') });
  protected readonly rows = computed(() => (this.mails.hasValue() ? this.mails.value() : []));
  protected readonly loadError = computed(() => {
    const error = this.mails.error();
    if (!error) {
      return null;
    }
    const cause = error.cause ?? error;
    return problemStatus(cause) === 404
      ? 'The dev mailbox is only available while the server runs in demo mode.'
      : problemMessage(cause, 'The mailbox could not be loaded.');
  });
  /** Whether the newest message starts opened (most visits come straight from sending an invitation). */
  protected readonly openFirst = signal(true);
}
