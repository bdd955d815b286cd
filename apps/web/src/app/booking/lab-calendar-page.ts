import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatDialog } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { slotHoldingStates, type MaintenanceBlock } from '@tunnelwright/contracts';
import { DateTime } from 'luxon';
import { CatalogueApi } from '../core/catalogue-api';
import { problemMessage } from '../core/problem-message';
import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { BookingApi } from './booking-api';
import { bookingStateLabels } from './booking-state-labels';
import { monthDays, weekDays } from './calendar-days';
import { CalendarEntry, CalendarGrid, type FreeSlot } from './calendar-grid';
import { formatPeriod, userTimeZone } from './lab-time';
import { MaintenanceBlockDialog, MaintenanceBlockDialogData } from './maintenance-block-dialog';

/** Lab managers' calendar of every tunnel for a week or a month, in the lab's zone; a free stretch opens a maintenance block for it. */
@Component({
  selector: 'tw-lab-calendar-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatButtonToggleModule, MatIconModule, MatProgressBarModule, ErrorBanner, EmptyState, CalendarGrid],
  template: `
    <section class="tw-page">
      <header class="tw-page-header">
        <h1>Calendar</h1>
        <a mat-button routerLink="/lab-bookings">Bookings</a>
      </header>
      @if (loadError(); as message) {
        <tw-error-banner [message]="message" (retry)="reload()" />
      }
      @if (bookings.isLoading() || tunnels.isLoading() || settings.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the calendar" />
      }
      <div class="toolbar">
        <mat-button-toggle-group aria-label="Show" [value]="view()" (change)="view.set($event.value)">
          <mat-button-toggle value="week">Week</mat-button-toggle>
          <mat-button-toggle value="month">Month</mat-button-toggle>
        </mat-button-toggle-group>
        <button mat-icon-button type="button" aria-label="Earlier" (click)="move(-1)"><mat-icon class="material-icons">chevron_left</mat-icon></button>
        <button mat-button type="button" (click)="anchor.set(now())">Today</button>
        <button mat-icon-button type="button" aria-label="Later" (click)="move(1)"><mat-icon class="material-icons">chevron_right</mat-icon></button>
        <span class="title">{{ title() }}</span>
      </div>
      @if (zone(); as zone) {
        <p class="zone">
          Times in the lab's zone, {{ zone }}.
          @if (zone !== viewerZone) {
            Your own zone is {{ viewerZone }}.
          }
        </p>
        <p class="zone">Choose a free stretch to block it for maintenance.</p>
        <tw-calendar-grid [days]="days()" [lanes]="lanes()" [entries]="entries()" [timeZone]="zone" [chooseFree]="true" (freeChosen)="addMaintenance(zone, $event)" />
        <header class="maintenance-header">
          <h2>Maintenance blocks</h2>
          <button mat-stroked-button type="button" (click)="addMaintenance(zone)">Block a tunnel…</button>
        </header>
        @if (maintenanceError(); as message) {
          <tw-error-banner [message]="message" (retry)="maintenance.reload()" />
        }
        <ul class="blocks">
          @for (block of blocks(); track block.id) {
            <li>
              <span>{{ tunnelName(block.tunnelId) }}: {{ periodOf(block) }} — {{ block.reason }}</span>
              <button mat-button type="button" [attr.aria-label]="'Remove maintenance: ' + block.reason" (click)="removeMaintenance(block)">Remove</button>
            </li>
          }
        </ul>
        @if (maintenance.hasValue() && blocks().length === 0) {
          <tw-empty-state icon="build" title="No maintenance blocked" hint="Block a tunnel to keep it out of bookings." />
        }
      }
    </section>
  `,
  styles: `
    .toolbar {
      display: flex;
      align-items: center;
      gap: 8px;
      flex-wrap: wrap;
      margin-bottom: 8px;
    }
    .title {
      font: var(--mat-sys-title-medium);
    }
    .maintenance-header {
      display: flex;
      align-items: center;
      gap: 16px;
    }
    .blocks li {
      display: flex;
      align-items: center;
      gap: 8px;
    }
    .zone {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class LabCalendarPage {
  private readonly api = inject(BookingApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly viewerZone = userTimeZone();
  protected readonly view = signal<'week' | 'month'>('week');
  protected readonly anchor = signal<DateTime>(DateTime.now());
  protected readonly bookings = rxResource({ stream: () => this.api.list() });
  protected readonly tunnels = rxResource({ stream: () => this.catalogue.tunnels() });
  protected readonly settings = rxResource({ stream: () => this.api.settings() });
  protected readonly maintenance = rxResource({ stream: () => this.api.maintenanceBlocks() });
  protected readonly blocks = computed(() => (this.maintenance.hasValue() ? this.maintenance.value() : []));
  protected readonly maintenanceError = computed(() => (this.maintenance.error() ? 'The maintenance blocks could not be loaded.' : null));
  protected readonly zone = computed(() => (this.settings.hasValue() ? this.settings.value().timeZone : null));
  protected readonly loadError = computed(() => {
    const error = this.bookings.error() ?? this.tunnels.error() ?? this.settings.error();
    return error ? problemMessage(error.cause ?? error, 'The calendar could not be loaded.') : null;
  });
  protected readonly days = computed(() => {
    const zone = this.zone() ?? 'UTC';
    return this.view() === 'week' ? weekDays(this.anchor(), zone) : monthDays(this.anchor(), zone);
  });
  protected readonly title = computed(() => {
    const days = this.days();
    return days.length ? `${days[0]?.label} – ${days[days.length - 1]?.label}` : '';
  });
  protected readonly lanes = computed(() => (this.tunnels.hasValue() ? this.tunnels.value().map((t) => ({ id: t.id, name: t.name })) : []));
  protected readonly entries = computed<CalendarEntry[]>(() =>
    (this.bookings.hasValue() ? this.bookings.value() : [])
      .filter((b) => slotHoldingStates.includes(b.state) || b.state === 'completed')
      .map((b): CalendarEntry => ({ laneId: b.tunnelId, period: b.period, label: `${b.organisationName} · ${bookingStateLabels[b.state]}`, kind: 'booking' }))
      .concat(this.blocks().map((block): CalendarEntry => ({ laneId: block.tunnelId, period: block.period, label: `Maintenance: ${block.reason}`, kind: 'maintenance' }))),
  );

  protected tunnelName(id: string): string {
    return this.lanes().find((lane) => lane.id === id)?.name ?? 'Unknown tunnel';
  }

  protected periodOf(block: MaintenanceBlock): string {
    return formatPeriod(block.period, block.timeZone);
  }

  /** Opens the maintenance form, with the tunnel and period of a free stretch chosen on the calendar if there is one. */
  protected addMaintenance(timeZone: string, slot?: FreeSlot): void {
    const data: MaintenanceBlockDialogData = { tunnels: this.lanes(), timeZone, slot };
    this.dialog
      .open(MaintenanceBlockDialog, { data, width: '560px' })
      .afterClosed()
      .subscribe((block: MaintenanceBlock | undefined) => {
        if (block) {
          this.snackBar.open('Tunnel blocked for maintenance.', undefined, { duration: 4000 });
          this.maintenance.reload();
        }
      });
  }

  protected removeMaintenance(block: MaintenanceBlock): void {
    const data: ConfirmDialogData = { title: 'Remove this maintenance block?', message: `${this.tunnelName(block.tunnelId)} becomes bookable again for ${this.periodOf(block)}.`, confirmLabel: 'Remove', destructive: true };
    this.dialog
      .open(ConfirmDialog, { data, width: '440px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) {
          return;
        }
        this.api.deleteMaintenanceBlock(block.id).subscribe({
          next: () => {
            this.snackBar.open('Maintenance block removed.', undefined, { duration: 4000 });
            this.maintenance.reload();
          },
          error: (error: unknown) => this.snackBar.open(problemMessage(error, 'The maintenance block could not be removed.'), 'Dismiss', { duration: 8000 }),
        });
      });
  }

  protected now(): DateTime {
    return DateTime.now();
  }

  protected move(step: number): void {
    this.anchor.update((at) => (this.view() === 'week' ? at.plus({ weeks: step }) : at.plus({ months: step })));
  }

  protected reload(): void {
    this.bookings.reload();
    this.tunnels.reload();
    this.settings.reload();
    this.maintenance.reload();
  }
}
