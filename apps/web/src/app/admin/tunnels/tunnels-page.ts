import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import type { Tunnel } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { problemMessage } from '../../core/problem-message';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { tunnelKindLabels } from '../../shared/tunnel-kind-labels';
import { ArchivableListActions } from '../shared/archivable-list';
import { RowActions } from '../shared/row-actions';
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
    EmptyState,
    RowActions,
    ErrorBanner,
  ],
  templateUrl: './tunnels-page.html',
  styleUrl: '../shared/catalogue-list.scss',
})
export class TunnelsPage {
  private readonly api = inject(CatalogueApi);

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
  protected readonly actions = new ArchivableListActions<Tunnel>({
    reload: () => this.tunnels.reload(),
    setArchived: (id, archived) => this.api.setTunnelArchived(id, archived),
    archiveConsequence: 'It leaves the catalogue and cannot be booked. Past tests keep it.',
  });

  protected kindLabel(tunnel: Tunnel): string {
    return tunnelKindLabels[tunnel.kind];
  }

  protected edit(tunnel: Tunnel | null): void {
    this.actions.openEditor(TunnelDialog, { data: tunnel, width: '720px', maxHeight: '90vh' });
  }
}
