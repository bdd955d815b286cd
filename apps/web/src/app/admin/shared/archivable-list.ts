import { computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import type { ComponentType } from '@angular/cdk/portal';
import { MatDialog, type MatDialogConfig } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { Observable } from 'rxjs';
import { problemMessage } from '../../core/problem-message';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/confirm-dialog';

/** A record a catalogue list shows: named, and archived rather than deleted. */
export interface ArchivableRecord {
  readonly id: string;
  readonly name: string;
  readonly archived: boolean;
}

/** What a catalogue list needs to know: how to load and archive its records, and what loading and archiving mean. */
export interface ArchivableListOptions<T extends ArchivableRecord> {
  /** Loads the records, the archived ones too when asked. */
  load: (includeArchived: boolean) => Observable<T[]>;
  /** Shown when loading fails and the API said nothing more precise, e.g. "The tunnels could not be loaded." */
  loadFailure: string;
  setArchived: (id: string, archived: boolean) => Observable<unknown>;
  /** What archiving does, shown in the confirmation, e.g. "It leaves the catalogue and cannot be booked." */
  archiveConsequence: string;
}

/**
 * The state and actions of a lab manager's catalogue list (tunnels, services): the records, with or without the
 * archived ones, the load error, the editor dialog with a saved notice, and archiving or restoring after a
 * confirmation, with the row busy meanwhile. Create it in a component's field initialiser, where `inject` works.
 */
export class ArchivableList<T extends ArchivableRecord> {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  /** Whether archived records are listed too. */
  readonly showArchived = signal(false);
  readonly records = rxResource({
    params: () => this.showArchived(),
    stream: ({ params: includeArchived }) => this.options.load(includeArchived),
  });
  /** The loaded records; none while loading or after a failure. */
  readonly rows = computed(() => (this.records.hasValue() ? this.records.value() : []));
  /** Why the records could not be loaded, or null. */
  readonly loadError = computed(() => {
    const error = this.records.error();
    return error ? problemMessage(error.cause ?? error, this.options.loadFailure) : null;
  });
  /** The row whose archive change is being saved. */
  readonly busyId = signal<string | null>(null);

  constructor(private readonly options: ArchivableListOptions<T>) {}

  /** Opens the record's editor; a saved record is announced and the list reloaded. */
  openEditor<D>(component: ComponentType<unknown>, config: MatDialogConfig<D>): void {
    this.dialog
      .open(component, config)
      .afterClosed()
      .subscribe((saved: T | undefined) => {
        if (saved) {
          this.snackBar.open(`${saved.name} saved.`, undefined, { duration: 4000 });
          this.records.reload();
        }
      });
  }

  /** Asks, then archives or restores the record. */
  setArchived(item: T, archived: boolean): void {
    const data: ConfirmDialogData = archived
      ? { title: `Archive ${item.name}?`, message: `${this.options.archiveConsequence} You can restore it later.`, confirmLabel: 'Archive', destructive: true }
      : { title: `Restore ${item.name}?`, message: 'It returns to the catalogue.', confirmLabel: 'Restore' };
    this.dialog
      .open(ConfirmDialog, { data, width: '420px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) return;
        this.busyId.set(item.id);
        this.options.setArchived(item.id, archived).subscribe({
          next: () => {
            this.busyId.set(null);
            this.snackBar.open(`${item.name} ${archived ? 'archived' : 'restored'}.`, undefined, { duration: 4000 });
            this.records.reload();
          },
          error: (error: unknown) => {
            this.busyId.set(null);
            this.snackBar.open(problemMessage(error, 'The change could not be saved.'), 'Dismiss', { duration: 8000 });
          },
        });
      });
  }
}
