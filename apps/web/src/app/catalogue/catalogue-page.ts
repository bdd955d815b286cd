import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatChipsModule } from '@angular/material/chips';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { InstalledBalance, Service, Tunnel } from '@tunnelwright/contracts';
import { BookingApi } from '../booking/booking-api';
import { TunnelOccupancyWeek } from '../booking/tunnel-occupancy-week';
import { CatalogueApi } from '../core/catalogue-api';
import { problemMessage } from '../core/problem-message';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { formatMoney } from '../shared/money';
import { serviceUnitLabels } from '../shared/service-unit-labels';
import { tunnelKindLabels } from '../shared/tunnel-kind-labels';

/**
 * Read-only list of the laboratory's tunnels and the services it offers, with rates. Each tunnel opens its week of
 * free and busy time; other customers' bookings show only as busy, never by name.
 */
@Component({
  selector: 'tw-catalogue-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, MatButtonModule, MatCardModule, MatChipsModule, MatIconModule, MatProgressBarModule, EmptyState, ErrorBanner, TunnelOccupancyWeek],
  templateUrl: './catalogue-page.html',
  styleUrl: './catalogue-page.scss',
})
export class CataloguePage {
  private readonly api = inject(CatalogueApi);

  private readonly bookings = inject(BookingApi);

  protected readonly tunnels = rxResource({ stream: () => this.api.tunnels() });
  /** The lab's booking settings, for its time zone. */
  private readonly settings = rxResource({ stream: () => this.bookings.settings() });
  protected readonly labZone = computed(() => (this.settings.hasValue() ? this.settings.value().timeZone : null));
  /** The tunnels whose free and busy week is open. */
  protected readonly openWeeks = signal<ReadonlySet<string>>(new Set());
  protected readonly services = rxResource({ stream: () => this.api.services() });

  protected readonly kindLabels = tunnelKindLabels;
  protected readonly activeTunnels = computed(() =>
    this.tunnels.hasValue() ? this.tunnels.value().filter((tunnel) => !tunnel.archived) : [],
  );
  protected readonly activeServices = computed(() =>
    this.services.hasValue() ? this.services.value().filter((service) => !service.archived) : [],
  );
  private readonly tunnelNames = computed(
    () => new Map(this.activeTunnels().map((tunnel) => [tunnel.id, tunnel.name] as const)),
  );
  protected readonly tunnelsError = computed(() => {
    const error = this.tunnels.error();
    return error ? problemMessage(error.cause ?? error, 'The tunnels could not be loaded.') : null;
  });
  protected readonly servicesError = computed(() => {
    const error = this.services.error();
    return error ? problemMessage(error.cause ?? error, 'The services could not be loaded.') : null;
  });

  protected toggleWeek(tunnelId: string): void {
    this.openWeeks.update((open) => {
      const next = new Set(open);
      if (!next.delete(tunnelId)) next.add(tunnelId);
      return next;
    });
  }

  /** A balance's capacities, forces in N then moments in N·m: "Fx 400, Fy 400, Fz 1,200 N; Mx 120, My 200, Mz 120 N·m". */
  protected capacitiesText(balance: InstalledBalance): string {
    const [fx, fy, fz, mx, my, mz] = balance.capacities.map((c) => c.toLocaleString('en-GB'));
    return `Fx ${fx}, Fy ${fy}, Fz ${fz} N; Mx ${mx}, My ${my}, Mz ${mz} N·m`;
  }

  protected rate(service: Service): string {
    return `${formatMoney(service.rate, service.currency)} ${serviceUnitLabels[service.unit]}`;
  }

  protected tunnelOf(service: Service): string {
    return service.tunnelId ? (this.tunnelNames().get(service.tunnelId) ?? 'A specific tunnel') : 'Any tunnel';
  }

  protected capabilities(tunnel: Tunnel): string[] {
    const flags: string[] = [];
    const { yawRange, groundSimulation, turbulenceIntensity } = tunnel.capabilities;
    if (yawRange !== undefined) {
      flags.push(`Turntable, ${yawRange}° yaw range`);
    }
    if (groundSimulation) {
      flags.push('Ground simulation');
    }
    if (turbulenceIntensity !== undefined) {
      flags.push(`Turbulence intensity ${Math.round(turbulenceIntensity * 1e6) / 1e4} %`);
    }
    return flags;
  }
}
