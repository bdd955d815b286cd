import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { problemMessage } from '../../core/problem-message';
import { AuditEntriesTable, type AuditTextColumn } from '../../shared/audit-entries-table';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { AuditApi, AuditQuery } from './audit-api';

/** The audit trail of who changed what, paged on the server, with the change itself on demand. */
@Component({
  selector: 'tw-audit-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatPaginatorModule, MatProgressBarModule, MatFormFieldModule, MatSelectModule, AuditEntriesTable, EmptyState, ErrorBanner],
  templateUrl: './audit-page.html',
  styles: `
    .filter {
      width: 220px;
    }
  `,
})
export class AuditPage {
  private readonly api = inject(AuditApi);

  protected readonly textColumns: readonly AuditTextColumn[] = [
    { name: 'action', header: 'Action', text: (entry) => entry.action },
    { name: 'entity', header: 'Record', text: (entry) => entry.entity },
  ];
  /** The kinds of record the trail can be filtered by, with their names in the menu ('' for everything). */
  protected readonly entities: readonly { value: string; label: string }[] = [
    { value: '', label: 'Everything' },
    { value: 'test', label: 'Tests: runs judged, submissions, approvals and sheets' },
    { value: 'booking', label: 'Bookings' },
    { value: 'maintenance_block', label: 'Maintenance blocks' },
    { value: 'plan', label: 'Plans' },
    { value: 'run', label: 'Runs' },
    { value: 'article', label: 'Test articles' },
    { value: 'balance', label: 'Balances and calibrations' },
    { value: 'import_profile', label: 'Import profiles' },
    { value: 'user', label: 'Users and signing rights' },
    { value: 'invitation', label: 'Invitations' },
    { value: 'organisation', label: 'Organisations' },
    { value: 'tunnel', label: 'Tunnels' },
    { value: 'service', label: 'Services' },
  ];
  protected readonly query = signal<AuditQuery>({ entity: '', page: 1, pageSize: 25 });
  protected readonly entries = rxResource({ params: () => this.query(), stream: ({ params }) => this.api.list(params) });
  protected readonly rows = computed(() => (this.entries.hasValue() ? this.entries.value().items : []));
  protected readonly total = computed(() => (this.entries.hasValue() ? this.entries.value().total : 0));
  protected readonly loadError = computed(() => {
    const error = this.entries.error();
    return error ? problemMessage(error.cause ?? error, 'The audit log could not be loaded.') : null;
  });

  protected filterBy(entity: string): void {
    this.query.update((current) => ({ ...current, entity, page: 1 }));
  }

  protected turnPage(event: PageEvent): void {
    this.query.update((current) => ({ ...current, page: event.pageIndex + 1, pageSize: event.pageSize }));
  }
}
