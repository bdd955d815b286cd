import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { problemMessage } from '../core/problem-message';
import { AuditEntriesTable, type AuditTextColumn } from '../shared/audit-entries-table';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { ApprovalApi } from './approval-api';
import { auditWording } from './audit-wording';
import { resourceCause } from './resource-error';

/** For lab managers: who submitted, decided, left points out and issued sheets on one test, newest first. */
@Component({
  selector: 'tw-test-audit-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatPaginatorModule, MatProgressBarModule, AuditEntriesTable, EmptyState, ErrorBanner],
  template: `
    <section aria-labelledby="test-audit-heading">
      <h2 id="test-audit-heading">Audit trail of this test</h2>
      @if (entries.error(); as error) {
        <tw-error-banner [message]="message(error)" (retry)="entries.reload()" />
      }
      @if (entries.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the audit trail" />
      }
      @if (entries.hasValue()) {
        @if (total() === 0) {
          <tw-empty-state icon="history" title="Nothing recorded yet" hint="Submissions, decisions, left-out points and issued sheets appear here." />
        } @else {
          <tw-audit-entries-table [entries]="rows()" label="Audit trail of this test" [textColumns]="textColumns" opens="record" />
          <mat-paginator
            [length]="total()"
            [pageIndex]="page() - 1"
            [pageSize]="pageSize()"
            [pageSizeOptions]="[10, 25, 100]"
            (page)="turnPage($event)"
            aria-label="Pages of the audit trail"
          />
        }
      }
    </section>
  `,
  styles: `
    :host {
      display: block;
    }
  `,
})
export class TestAuditPanel {
  readonly testId = input.required<string>();

  private readonly api = inject(ApprovalApi);

  protected readonly textColumns: readonly AuditTextColumn[] = [
    { name: 'action', header: 'What', text: (entry) => auditWording(entry).action },
    { name: 'detail', header: 'Reason or note', text: (entry) => auditWording(entry).detail || '—', keepsLines: true },
  ];
  protected readonly page = signal(1);
  protected readonly pageSize = signal(10);
  protected readonly entries = rxResource({
    params: () => ({ testId: this.testId(), page: this.page(), pageSize: this.pageSize() }),
    stream: ({ params }) => this.api.testAudit(params.testId, params.page, params.pageSize),
  });
  protected readonly rows = computed(() => (this.entries.hasValue() ? this.entries.value().items : []));
  protected readonly total = computed(() => (this.entries.hasValue() ? this.entries.value().total : 0));

  /** Reloads the trail, e.g. after a decision on the same page. */
  reload(): void {
    this.entries.reload();
  }

  protected message(error: unknown): string {
    return problemMessage(resourceCause(error), 'The audit trail could not be loaded.');
  }

  protected turnPage(event: PageEvent): void {
    this.page.set(event.pageIndex + 1);
    this.pageSize.set(event.pageSize);
  }
}
