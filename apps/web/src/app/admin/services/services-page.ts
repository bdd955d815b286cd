import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatTableModule } from '@angular/material/table';
import type { Service } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { formatMoney } from '../../shared/money';
import { serviceUnitLabels } from '../../shared/service-unit-labels';
import { ArchivableList } from '../shared/archivable-list';
import { CatalogueList } from '../shared/catalogue-list';
import { ServiceDialog, ServiceDialogData } from './service-dialog';

/** Lab managers' list of services and rates: create, edit, archive and restore. */
@Component({
  selector: 'tw-services-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, CatalogueList],
  templateUrl: './services-page.html',
  styleUrl: '../shared/catalogue-list.scss',
})
export class ServicesPage {
  private readonly api = inject(CatalogueApi);

  protected readonly columns = ['tunnel', 'rate'];
  protected readonly list = new ArchivableList<Service>({
    load: (includeArchived) => this.api.services(includeArchived),
    loadFailure: 'The services could not be loaded.',
    setArchived: (id, archived) => this.api.setServiceArchived(id, archived),
    archiveConsequence: 'It leaves the catalogue and new quotes cannot use it.',
  });
  // Archived tunnels too, so a service tied to one still shows the tunnel's name.
  protected readonly tunnels = rxResource({ stream: () => this.api.tunnels(true) });
  private readonly tunnelNames = computed(
    () => new Map((this.tunnels.hasValue() ? this.tunnels.value() : []).map((tunnel) => [tunnel.id, tunnel.name])),
  );

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
      defaultCurrency: this.list.rows()[0]?.currency,
    };
    this.list.openEditor(ServiceDialog, { data, width: '640px', maxHeight: '90vh' });
  }
}
