import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ApprovalApi } from '../approval/approval-api';
import { SheetList } from '../approval/sheet-list';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { SafetyNotice } from '../core/safety-notice';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { resourceCause } from '../approval/resource-error';

/** Every issued result sheet the caller may read (customers: their organisation's), newest first. */
@Component({
  selector: 'tw-documents-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatProgressBarModule, EmptyState, ErrorBanner, SafetyNotice, SheetList],
  template: `
    <section class="tw-page">
      <header class="tw-page-header">
        <h1>Documents</h1>
      </header>
      <p class="tw-muted">
        Certified result sheets, each with its points as CSV. Anyone holding a copy can check it against the issued file on its public check page.
      </p>
      @if (sheets.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading result sheets" />
      }
      @if (sheets.error(); as error) {
        <tw-error-banner [message]="message(error)" (retry)="sheets.reload()" />
      } @else if (sheets.hasValue()) {
        @if (sheets.value().length === 0) {
          <tw-empty-state icon="description" title="No result sheets yet" [hint]="emptyHint()" />
        } @else {
          <div class="tw-table-wrap">
            <tw-sheet-list [sheets]="sheets.value()" [showTest]="true" [showOrganisation]="isStaff()" />
          </div>
          @if (caution()) {
            <p class="caution" role="note">{{ caution() }}</p>
          }
        }
      }
      <tw-safety-notice />
    </section>
  `,
  styles: `
    .caution {
      font: var(--mat-sys-body-small);
      margin: 16px 0;
    }
    tw-safety-notice {
      display: block;
      margin-top: 24px;
    }
  `,
})
export class DocumentsPage {
  private readonly api = inject(ApprovalApi);
  private readonly role = inject(AuthService).role;

  protected readonly isStaff = computed(() => this.role() !== null && this.role() !== 'customer');
  protected readonly sheets = rxResource({ stream: () => this.api.sheets() });
  protected readonly caution = computed(() => (this.sheets.hasValue() ? (this.sheets.value()[0]?.caution ?? '') : ''));
  protected readonly emptyHint = computed(() =>
    this.isStaff() ? 'Sheets appear here once an approved submission is issued.' : 'Your certified result sheets appear here once the laboratory issues them; you are told by e-mail.',
  );

  protected message(error: unknown): string {
    return problemMessage(resourceCause(error), 'The result sheets could not be loaded.');
  }
}
