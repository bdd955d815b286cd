import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import type { Service } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { problemMessage } from '../../core/problem-message';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { formatMoney } from '../../shared/money';
import { serviceUnitLabels } from '../../shared/service-unit-labels';
import { ArchivableListActions } from '../shared/archivable-list';
import { RowActions } from '../shared/row-actions';
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
    EmptyState,
    RowActions,
    ErrorBanner,
  ],
  templateUrl: './services-page.html',
  styleUrl: '../shared/catalogue-list.scss',
})
export class ServicesPage {
  private readonly api = inject(CatalogueApi);

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
  protected readonly actions = new ArchivableListActions<Service>({
    reload: () => this.services.reload(),
    setArchived: (id, archived) => this.api.setServiceArchived(id, archived),
    archiveConsequence: 'It leaves the catalogue and new quotes cannot use it.',
  });

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
    this.actions.openEditor(ServiceDialog, { data, width: '640px', maxHeight: '90vh' });
  }
}
