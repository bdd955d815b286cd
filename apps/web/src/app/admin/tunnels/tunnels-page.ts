import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { Tunnel } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { problemMessage } from '../../core/problem-message';
import { ConfirmDialog, ConfirmDialogData } from '../../shared/confirm-dialog';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { tunnelKindLabels } from '../../shared/tunnel-kind-labels';
import { TunnelDialog } from './tunnel-dialog';

/** Lab managers' list of tunnels: create, edit, archive and restore. */
@Component({
  selector: 'tw-tunnels-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DecimalPipe,
    MatTableModule,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MatSlideToggleModule,
    MatTooltipModule,
    EmptyState,
    ErrorBanner,
  ],
  templateUrl: './tunnels-page.html',
  styles: `
    table {
      width: 100%;
    }
    .actions {
      text-align: right;
      white-space: nowrap;
    }
    .archived {
      color: var(--mat-sys-on-surface-variant);
    }
    .numeric {
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
    }
  `,
})
export class TunnelsPage {
  private readonly api = inject(CatalogueApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly columns = ['name', 'kind', 'section', 'area', 'speed', 'actions'];
  protected readonly showArchived = signal(false);
  protected readonly tunnels = rxResource({
    params: () => this.showArchived(),
    stream: ({ params: includeArchived }) => this.api.tunnels(includeArchived),
  });
  protected readonly rows = computed(() => (this.tunnels.hasValue() ? this.tunnels.value() : []));
  protected readonly loadError = computed(() => {
    const error = this.tunnels.error();
    return error ? problemMessage(error.cause ?? error, 'The tunnels could not be loaded.') : null;
  });
  protected readonly busyId = signal<string | null>(null);

  protected kindLabel(tunnel: Tunnel): string {
    return tunnelKindLabels[tunnel.kind];
  }

  protected edit(tunnel: Tunnel | null): void {
    this.dialog
      .open(TunnelDialog, { data: tunnel, width: '720px', maxHeight: '90vh' })
      .afterClosed()
      .subscribe((saved: Tunnel | undefined) => {
        if (saved) {
          this.snackBar.open(`${saved.name} saved.`, undefined, { duration: 4000 });
          this.tunnels.reload();
        }
      });
  }

  protected setArchived(tunnel: Tunnel, archived: boolean): void {
    const data: ConfirmDialogData = archived
      ? {
          title: `Archive ${tunnel.name}?`,
          message: 'It leaves the catalogue and cannot be booked. Past tests keep it. You can restore it later.',
          confirmLabel: 'Archive',
          destructive: true,
        }
      : { title: `Restore ${tunnel.name}?`, message: 'It returns to the catalogue.', confirmLabel: 'Restore' };
    this.dialog
      .open(ConfirmDialog, { data, width: '420px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) {
          return;
        }
        this.busyId.set(tunnel.id);
        this.api.setTunnelArchived(tunnel.id, archived).subscribe({
          next: () => {
            this.busyId.set(null);
            this.snackBar.open(`${tunnel.name} ${archived ? 'archived' : 'restored'}.`, undefined, { duration: 4000 });
            this.tunnels.reload();
          },
          error: (error: unknown) => {
            this.busyId.set(null);
            this.snackBar.open(problemMessage(error, 'The change could not be saved.'), 'Dismiss', { duration: 8000 });
          },
        });
      });
  }
}
