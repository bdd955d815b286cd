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
import type { Service } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { problemMessage } from '../../core/problem-message';
import { ConfirmDialog, ConfirmDialogData } from '../../shared/confirm-dialog';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { formatMoney } from '../../shared/money';
import { serviceUnitLabels } from '../../shared/service-unit-labels';
import { ServiceDialog, ServiceDialogData } from './service-dialog';

/** Lab managers' list of services and rates: create, edit, archive and restore. */
@Component({
  selector: 'tw-services-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    MatTableModule,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MatSlideToggleModule,
    MatTooltipModule,
    EmptyState,
    ErrorBanner,
  ],
  templateUrl: './services-page.html',
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
export class ServicesPage {
  private readonly api = inject(CatalogueApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly columns = ['name', 'tunnel', 'rate', 'actions'];
  protected readonly showArchived = signal(false);
  protected readonly services = rxResource({
    params: () => this.showArchived(),
    stream: ({ params: includeArchived }) => this.api.services(includeArchived),
  });
  // Archived tunnels too, so a service tied to one still shows the tunnel's name.
  protected readonly tunnels = rxResource({ stream: () => this.api.tunnels(true) });
  protected readonly rows = computed(() => (this.services.hasValue() ? this.services.value() : []));
  private readonly tunnelNames = computed(
    () => new Map((this.tunnels.hasValue() ? this.tunnels.value() : []).map((tunnel) => [tunnel.id, tunnel.name])),
  );
  protected readonly loadError = computed(() => {
    const error = this.services.error();
    return error ? problemMessage(error.cause ?? error, 'The services could not be loaded.') : null;
  });
  protected readonly busyId = signal<string | null>(null);

  protected rate(service: Service): string {
    return `${formatMoney(service.rate, service.currency)} ${serviceUnitLabels[service.unit]}`;
  }

  protected tunnelOf(service: Service): string {
    return service.tunnelId ? (this.tunnelNames().get(service.tunnelId) ?? 'Unknown tunnel') : 'Any tunnel';
  }

  protected edit(service: Service | null): void {
    const data: ServiceDialogData = {
      service,
      tunnels: this.tunnels.hasValue() ? this.tunnels.value().filter((tunnel) => !tunnel.archived) : [],
      defaultCurrency: this.rows()[0]?.currency,
    };
    this.dialog
      .open(ServiceDialog, { data, width: '640px', maxHeight: '90vh' })
      .afterClosed()
      .subscribe((saved: Service | undefined) => {
        if (saved) {
          this.snackBar.open(`${saved.name} saved.`, undefined, { duration: 4000 });
          this.services.reload();
        }
      });
  }

  protected setArchived(service: Service, archived: boolean): void {
    const data: ConfirmDialogData = archived
      ? {
          title: `Archive ${service.name}?`,
          message: 'It leaves the catalogue and new quotes cannot use it. You can restore it later.',
          confirmLabel: 'Archive',
          destructive: true,
        }
      : { title: `Restore ${service.name}?`, message: 'It returns to the catalogue.', confirmLabel: 'Restore' };
    this.dialog
      .open(ConfirmDialog, { data, width: '420px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) {
          return;
        }
        this.busyId.set(service.id);
        this.api.setServiceArchived(service.id, archived).subscribe({
          next: () => {
            this.busyId.set(null);
            this.snackBar.open(`${service.name} ${archived ? 'archived' : 'restored'}.`, undefined, { duration: 4000 });
            this.services.reload();
          },
          error: (error: unknown) => {
            this.busyId.set(null);
            this.snackBar.open(problemMessage(error, 'The change could not be saved.'), 'Dismiss', { duration: 8000 });
          },
        });
      });
  }
}
