import { DatePipe, JsonPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatTableModule } from '@angular/material/table';
import type { AuditEntry } from '@tunnelwright/contracts';

/** A column of words about each entry, standing between "Who" and the button that opens the entry. */
export interface AuditTextColumn {
  /** The column's name in the table, unique within it. */
  readonly name: string;
  readonly header: string;
  /** The words in the entry's cell. */
  readonly text: (entry: AuditEntry) => string;
  /** Whether the cell keeps the line breaks of its words. */
  readonly keepsLines?: boolean;
}

/**
 * What opening an entry shows: `change` the record before and after side by side, `record` the record as the act
 * left it.
 */
export type AuditOpening = 'change' | 'record';

/**
 * Audit entries as a table: when, who, the host's columns of words, and a button that opens the stored record of
 * entries that have one in a row beneath. Loading, paging and the empty list stay with the host.
 */
@Component({
  selector: 'tw-audit-entries-table',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, JsonPipe, MatButtonModule, MatTableModule],
  template: `
    <table mat-table [dataSource]="entries()" multiTemplateDataRows [attr.aria-label]="label()">
      <ng-container matColumnDef="createdAt">
        <th mat-header-cell *matHeaderCellDef>When</th>
        <td mat-cell *matCellDef="let entry" class="when">{{ entry.createdAt | date: 'medium' }}</td>
      </ng-container>
      <ng-container matColumnDef="actor">
        <th mat-header-cell *matHeaderCellDef>Who</th>
        <td mat-cell *matCellDef="let entry">{{ entry.actorName ?? 'System' }}</td>
      </ng-container>
      @for (column of textColumns(); track column.name) {
        <ng-container [matColumnDef]="column.name">
          <th mat-header-cell *matHeaderCellDef>{{ column.header }}</th>
          <td mat-cell *matCellDef="let entry" [class.keeps-lines]="column.keepsLines">{{ column.text(entry) }}</td>
        </ng-container>
      }
      <ng-container matColumnDef="open">
        <th mat-header-cell *matHeaderCellDef>
          <span class="tw-visually-hidden">{{ opens() === 'change' ? 'Details' : 'Record' }}</span>
        </th>
        <td mat-cell *matCellDef="let entry">
          @if (entry.before !== null || entry.after !== null) {
            <button mat-button type="button" [attr.aria-expanded]="expandedId() === entry.id" (click)="toggle(entry)">
              {{ expandedId() === entry.id ? 'Hide' : 'Show' }} {{ opens() }}
            </button>
          }
        </td>
      </ng-container>
      <ng-container matColumnDef="opened">
        <td mat-cell *matCellDef="let entry" [attr.colspan]="columns().length">
          @if (expandedId() === entry.id) {
            @if (opens() === 'change') {
              <div class="change">
                <div><strong>Before</strong><pre>{{ entry.before | json }}</pre></div>
                <div><strong>After</strong><pre>{{ entry.after | json }}</pre></div>
              </div>
            } @else {
              <pre class="record">{{ entry.after | json }}</pre>
            }
          }
        </td>
      </ng-container>
      <tr mat-header-row *matHeaderRowDef="columns()"></tr>
      <tr mat-row *matRowDef="let row; columns: columns()"></tr>
      <tr mat-row *matRowDef="let row; columns: ['opened']" class="opened-row"></tr>
    </table>
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
    .keeps-lines {
      white-space: pre-line;
    }
    .opened-row {
      height: 0;
    }
    pre {
      padding: 8px;
      max-height: 240px;
      overflow: auto;
      background: var(--mat-sys-surface-container);
      border-radius: var(--mat-sys-corner-small);
      font-size: 12px;
    }
    .change {
      display: grid;
      grid-template-columns: 1fr 1fr;
      gap: 12px;
      padding: 8px 0 16px;
      pre {
        margin: 4px 0 0;
      }
    }
    .record {
      margin: 4px 0 12px;
    }
  `,
})
export class AuditEntriesTable {
  /** The entries of the page on show, in the order given. */
  readonly entries = input.required<readonly AuditEntry[]>();
  /** The table's accessible name, e.g. "Audit log". */
  readonly label = input.required<string>();
  readonly textColumns = input.required<readonly AuditTextColumn[]>();
  readonly opens = input<AuditOpening>('change');

  protected readonly columns = computed(() => ['createdAt', 'actor', ...this.textColumns().map((column) => column.name), 'open']);
  protected readonly expandedId = signal<string | null>(null);

  protected toggle(entry: AuditEntry): void {
    this.expandedId.update((current) => (current === entry.id ? null : entry.id));
  }
}
