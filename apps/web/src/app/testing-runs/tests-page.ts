import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatListModule } from '@angular/material/list';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { progressText } from '../approval/approval-labels';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { SafetyNotice } from '../core/safety-notice';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { IngestApi } from './ingest-api';
import { testStateLabels } from './run-labels';

/** Every test the caller may see (customers: their own organisation's), newest first. */
@Component({
  selector: 'tw-tests-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatIconModule, MatListModule, MatProgressBarModule, EmptyState, ErrorBanner, SafetyNotice],
  template: `
    <div class="tw-page-header">
      <h1>Tests</h1>
      @if (!isCustomer()) {
        <a mat-flat-button routerLink="/tests/new"><mat-icon>add</mat-icon> Open a test</a>
      }
    </div>
    @if (tests.isLoading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading tests" />
    }
    @if (tests.error(); as error) {
      <tw-error-banner [message]="message(error)" (retry)="tests.reload()" />
    } @else if (tests.hasValue()) {
      @if (tests.value().length === 0) {
        <tw-empty-state icon="science" title="No tests yet" hint="Tests appear here once the laboratory opens them." />
      } @else {
        <mat-nav-list aria-label="Tests">
          @for (test of tests.value(); track test.id) {
            <a mat-list-item [routerLink]="['/tests', test.id]">
              <span matListItemTitle>{{ test.title }}</span>
              <span matListItemLine>
                @if (isCustomer()) {
                  {{ progressText(test.progress, true) }}
                } @else {
                  {{ stateLabels[test.state] }} · {{ progressText(test.progress, false) }}
                }
                · {{ test.configurations.length }} configuration(s)
              </span>
            </a>
          }
        </mat-nav-list>
      }
    }
    <tw-safety-notice />
  `,
  styles: `
    :host {
      display: block;
      padding: 16px 24px;
    }
    tw-safety-notice {
      display: block;
      margin-top: 24px;
    }
  `,
})
export class TestsPage {
  private readonly api = inject(IngestApi);
  private readonly role = inject(AuthService).role;
  /** Customers read the stage of their test; staff the test's state and where its approval stands. */
  protected readonly isCustomer = computed(() => this.role() === 'customer');
  protected readonly progressText = progressText;
  protected readonly tests = rxResource({ stream: () => this.api.tests() });
  protected readonly stateLabels = testStateLabels;
  protected readonly message = (error: unknown) => problemMessage(error, 'The tests could not be loaded.');
}
