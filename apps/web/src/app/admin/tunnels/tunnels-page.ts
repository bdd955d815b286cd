import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatTableModule } from '@angular/material/table';
import type { Tunnel } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { tunnelKindLabels } from '../../shared/tunnel-kind-labels';
import { ArchivableList } from '../shared/archivable-list';
import { CatalogueList } from '../shared/catalogue-list';
import { TunnelDialog } from './tunnel-dialog';

/** Lab managers' list of tunnels: create, edit, archive and restore. */
@Component({
  selector: 'tw-tunnels-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, MatTableModule, CatalogueList],
  templateUrl: './tunnels-page.html',
  styleUrl: '../shared/catalogue-list.scss',
})
export class TunnelsPage {
  private readonly api = inject(CatalogueApi);

  protected readonly columns = ['kind', 'section', 'area', 'speed'];
  protected readonly list = new ArchivableList<Tunnel>({
    load: (includeArchived) => this.api.tunnels(includeArchived),
    loadFailure: 'The tunnels could not be loaded.',
    setArchived: (id, archived) => this.api.setTunnelArchived(id, archived),
    archiveConsequence: 'It leaves the catalogue and cannot be booked. Past tests keep it.',
  });

  protected kindLabel(tunnel: Tunnel): string {
    return tunnelKindLabels[tunnel.kind];
  }

  protected edit(tunnel: Tunnel | null): void {
    this.list.openEditor(TunnelDialog, { data: tunnel, width: '720px', maxHeight: '90vh' });
  }
}
