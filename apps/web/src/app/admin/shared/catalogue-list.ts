import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import type { ArchivableList, ArchivableRecord } from './archivable-list';
import { ProjectedColumnsTable } from './projected-columns-table';
import { RowActions } from './row-actions';

/**
 * A lab manager's catalogue page (tunnels, services): the heading with "Show archived" and the new-record button,
 * the load error, and a table whose first column is the name and whose last holds the row actions. The columns in
 * between are projected as `matColumnDef`s and listed in `columns`; opening the editor is left to the page.
 */
@Component({
  selector: 'tw-catalogue-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatButtonModule, MatIconModule, MatProgressBarModule, MatSlideToggleModule, EmptyState, ErrorBanner, RowActions],
  template: `
    <section class="tw-page">
      <header class="tw-page-header">
        <h1>{{ title() }}</h1>
        <mat-slide-toggle [checked]="list().showArchived()" (change)="list().showArchived.set($event.checked)">
          Show archived
        </mat-slide-toggle>
        <button mat-flat-button type="button" (click)="edit.emit(null)">
          <mat-icon class="material-icons">add</mat-icon>
          {{ newLabel() }}
        </button>
      </header>

      @if (list().loadError(); as message) {
        <tw-error-banner [message]="message" (retry)="list().records.reload()" />
      }
      <div class="tw-table-wrap">
        @if (list().records.isLoading()) {
          <mat-progress-bar mode="indeterminate" [attr.aria-label]="'Loading ' + title().toLowerCase()" />
        }
        <table mat-table [dataSource]="list().rows()" [attr.aria-label]="title()">
          <ng-container matColumnDef="name">
            <th mat-header-cell *matHeaderCellDef>Name</th>
            <td mat-cell *matCellDef="let record" [class.archived]="record.archived">
              {{ record.name }}{{ record.archived ? ' (archived)' : '' }}
            </td>
          </ng-container>
          <ng-container matColumnDef="actions">
            <th mat-header-cell *matHeaderCellDef><span class="tw-visually-hidden">Actions</span></th>
            <td mat-cell *matCellDef="let record" class="actions">
              <tw-row-actions [name]="record.name" [archived]="record.archived" [busy]="list().busyId() === record.id" (edit)="edit.emit(record)" (archive)="list().setArchived(record, $event)" />
            </td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="allColumns()"></tr>
          <tr mat-row *matRowDef="let row; columns: allColumns()"></tr>
        </table>
        @if (list().records.hasValue() && list().rows().length === 0) {
          <tw-empty-state [icon]="emptyIcon()" [title]="emptyTitle()" [hint]="emptyHint()">
            <button mat-stroked-button type="button" (click)="edit.emit(null)">{{ newLabel() }}</button>
          </tw-empty-state>
        }
      </div>
    </section>
  `,
  styleUrl: './catalogue-list.scss',
})
export class CatalogueList<T extends ArchivableRecord> extends ProjectedColumnsTable {
  /** The records and their actions. */
  readonly list = input.required<ArchivableList<T>>();
  /** The page heading, also the table's name, e.g. "Tunnels". */
  readonly title = input.required<string>();
  /** The new-record button's label, e.g. "New tunnel". */
  readonly newLabel = input.required<string>();
  /** Names of the projected columns, in the order they stand between the name and the actions. */
  readonly columns = input.required<readonly string[]>();
  readonly emptyIcon = input.required<string>();
  readonly emptyTitle = input.required<string>();
  readonly emptyHint = input.required<string>();
  /** Asks the page to open the editor: for the record, or `null` for a new one. */
  readonly edit = output<T | null>();

  protected readonly allColumns = computed(() => ['name', ...this.columns(), 'actions']);
}
