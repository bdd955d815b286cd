import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { slotHoldingStates } from '@tunnelwright/contracts';
import { DateTime } from 'luxon';
import { CatalogueApi } from '../core/catalogue-api';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { BookingApi } from './booking-api';
import { bookingStateLabels } from './booking-state-labels';
import { monthDays, weekDays } from './calendar-days';
import { CalendarEntry, CalendarGrid } from './calendar-grid';
import { userTimeZone } from './lab-time';

/** Lab managers' calendar of every tunnel for a week or a month, in the lab's zone. */
@Component({
  selector: 'tw-lab-calendar-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatButtonToggleModule, MatIconModule, MatProgressBarModule, ErrorBanner, CalendarGrid],
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
        <tw-calendar-grid [days]="days()" [lanes]="lanes()" [entries]="entries()" [timeZone]="zone" />
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
    .zone {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class LabCalendarPage {
  private readonly api = inject(BookingApi);
  private readonly catalogue = inject(CatalogueApi);

  protected readonly viewerZone = userTimeZone();
  protected readonly view = signal<'week' | 'month'>('week');
  protected readonly anchor = signal<DateTime>(DateTime.now());
  protected readonly bookings = rxResource({ stream: () => this.api.list() });
  protected readonly tunnels = rxResource({ stream: () => this.catalogue.tunnels() });
  protected readonly settings = rxResource({ stream: () => this.api.settings() });
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
      .map((b) => ({ laneId: b.tunnelId, period: b.period, label: `${b.organisationName} · ${bookingStateLabels[b.state]}`, kind: 'booking' })),
  );

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
  }
}
