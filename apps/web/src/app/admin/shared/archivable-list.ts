import { signal } from '@angular/core';
import { inject } from '@angular/core';
import type { ComponentType } from '@angular/cdk/portal';
import { MatDialog, type MatDialogConfig } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { Observable } from 'rxjs';
import { problemMessage } from '../../core/problem-message';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/confirm-dialog';

/** What a catalogue list tells its actions: how to reload, how to archive, and what archiving means for the record. */
export interface ArchivableListOptions {
  reload: () => void;
  setArchived: (id: string, archived: boolean) => Observable<unknown>;
  /** What archiving does, shown in the confirmation, e.g. "It leaves the catalogue and cannot be booked." */
  archiveConsequence: string;
}

/**
 * The edit and archive/restore actions a lab manager's catalogue list offers (tunnels, services): the editor
 * dialog with a saved notice, and archiving or restoring after a confirmation, with the row busy meanwhile.
 * Create it in a component's field initialiser, where `inject` works.
 */
export class ArchivableListActions<T extends { id: string; name: string }> {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  /** The row whose archive change is being saved. */
  readonly busyId = signal<string | null>(null);

  constructor(private readonly options: ArchivableListOptions) {}

  /** Opens the record's editor; a saved record is announced and the list reloaded. */
  openEditor<D>(component: ComponentType<unknown>, config: MatDialogConfig<D>): void {
    this.dialog
      .open(component, config)
      .afterClosed()
      .subscribe((saved: T | undefined) => {
        if (saved) {
          this.snackBar.open(`${saved.name} saved.`, undefined, { duration: 4000 });
          this.options.reload();
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
            this.options.reload();
          },
          error: (error: unknown) => {
            this.busyId.set(null);
            this.snackBar.open(problemMessage(error, 'The change could not be saved.'), 'Dismiss', { duration: 8000 });
          },
        });
      });
  }
}
