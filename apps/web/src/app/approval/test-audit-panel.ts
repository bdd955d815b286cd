import { DatePipe, JsonPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTableModule } from '@angular/material/table';
import type { AuditEntry } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { ApprovalApi } from './approval-api';
import { auditWording } from './audit-wording';
import { resourceCause } from './resource-error';

/** For lab managers: who submitted, decided, left points out and issued sheets on one test, newest first. */
@Component({
  selector: 'tw-test-audit-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, JsonPipe, MatButtonModule, MatPaginatorModule, MatProgressBarModule, MatTableModule, EmptyState, ErrorBanner],
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
          <table mat-table [dataSource]="rows()" multiTemplateDataRows aria-label="Audit trail of this test">
            <ng-container matColumnDef="createdAt">
              <th mat-header-cell *matHeaderCellDef>When</th>
              <td mat-cell *matCellDef="let entry" class="when">{{ entry.createdAt | date: 'medium' }}</td>
            </ng-container>
            <ng-container matColumnDef="actor">
              <th mat-header-cell *matHeaderCellDef>Who</th>
              <td mat-cell *matCellDef="let entry">{{ entry.actorName ?? 'System' }}</td>
            </ng-container>
            <ng-container matColumnDef="action">
              <th mat-header-cell *matHeaderCellDef>What</th>
              <td mat-cell *matCellDef="let entry">{{ wording(entry).action }}</td>
            </ng-container>
            <ng-container matColumnDef="detail">
              <th mat-header-cell *matHeaderCellDef>Reason or note</th>
              <td mat-cell *matCellDef="let entry" class="detail">{{ wording(entry).detail || '—' }}</td>
            </ng-container>
            <ng-container matColumnDef="record">
              <th mat-header-cell *matHeaderCellDef><span class="tw-visually-hidden">Record</span></th>
              <td mat-cell *matCellDef="let entry">
                @if (entry.before !== null || entry.after !== null) {
                  <button mat-button type="button" [attr.aria-expanded]="expandedId() === entry.id" (click)="toggle(entry)">
                    {{ expandedId() === entry.id ? 'Hide record' : 'Show record' }}
                  </button>
                }
              </td>
            </ng-container>
            <ng-container matColumnDef="change">
              <td mat-cell *matCellDef="let entry" [attr.colspan]="columns.length">
                @if (expandedId() === entry.id) {
                  <pre>{{ entry.after | json }}</pre>
                }
              </td>
            </ng-container>
            <tr mat-header-row *matHeaderRowDef="columns"></tr>
            <tr mat-row *matRowDef="let row; columns: columns"></tr>
            <tr mat-row *matRowDef="let row; columns: ['change']" class="detail-row"></tr>
          </table>
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
    table {
      width: 100%;
    }
    .when {
      white-space: nowrap;
    }
    .detail {
      white-space: pre-line;
    }
    .detail-row {
      height: 0;
    }
    pre {
      margin: 4px 0 12px;
      padding: 8px;
      max-height: 240px;
      overflow: auto;
      background: var(--mat-sys-surface-container);
      border-radius: var(--mat-sys-corner-small);
      font-size: 12px;
    }
  `,
})
export class TestAuditPanel {
  readonly testId = input.required<string>();

  private readonly api = inject(ApprovalApi);

  protected readonly columns = ['createdAt', 'actor', 'action', 'detail', 'record'];
  protected readonly page = signal(1);
  protected readonly pageSize = signal(10);
  protected readonly entries = rxResource({
    params: () => ({ testId: this.testId(), page: this.page(), pageSize: this.pageSize() }),
    stream: ({ params }) => this.api.testAudit(params.testId, params.page, params.pageSize),
  });
  protected readonly rows = computed(() => (this.entries.hasValue() ? this.entries.value().items : []));
  protected readonly total = computed(() => (this.entries.hasValue() ? this.entries.value().total : 0));
  protected readonly expandedId = signal<string | null>(null);
  protected readonly wording = auditWording;

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

  protected toggle(entry: AuditEntry): void {
    this.expandedId.update((current) => (current === entry.id ? null : entry.id));
  }
}
