import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { DateTime } from 'luxon';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { BookingApi } from './booking-api';
import { bookingStateLabels } from './booking-state-labels';
import { weekDays } from './calendar-days';
import { CalendarEntry, CalendarGrid, type FreeSlot } from './calendar-grid';

/**
 * One tunnel's week of free and busy time, for a customer choosing a period or reading the catalogue; others'
 * bookings show only as busy. While `choosing`, a free stretch still to come can be chosen to fill in the period.
 */
@Component({
  selector: 'tw-tunnel-occupancy-week',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, ErrorBanner, CalendarGrid],
  template: `
    <div class="toolbar">
      <button mat-icon-button type="button" aria-label="Previous week" (click)="move(-1)"><mat-icon class="material-icons">chevron_left</mat-icon></button>
      <button mat-button type="button" (click)="anchor.set(today())">This week</button>
      <button mat-icon-button type="button" aria-label="Next week" (click)="move(1)"><mat-icon class="material-icons">chevron_right</mat-icon></button>
      <span>{{ title() }}</span>
    </div>
    @if (occupancy.isLoading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading the tunnel's week" />
    }
    @if (loadError(); as message) {
      <tw-error-banner [message]="message" (retry)="occupancy.reload()" />
    }
    @if (choosing()) {
      <p class="hint">Choose a free stretch to make it the period below.</p>
    }
    <tw-calendar-grid [days]="days()" [lanes]="lanes()" [entries]="entries()" [timeZone]="timeZone()" [chooseFree]="choosing()" (freeChosen)="freeChosen.emit($event)" />
  `,
  styles: `
    .toolbar {
      display: flex;
      align-items: center;
      gap: 8px;
      margin-bottom: 4px;
    }
    .hint {
      color: var(--mat-sys-on-surface-variant);
      margin: 0 0 4px;
    }
  `,
})
export class TunnelOccupancyWeek {
  private readonly api = inject(BookingApi);

  readonly tunnelId = input.required<string>();
  readonly tunnelName = input.required<string>();
  /** The lab's IANA zone. */
  readonly timeZone = input.required<string>();
  /** Whether a free stretch can be chosen (the request form); off where the week is only shown (the catalogue). */
  readonly choosing = input(true);
  /** Emitted with the free stretch the customer chose for the period. */
  readonly freeChosen = output<FreeSlot>();

  protected readonly anchor = signal<DateTime>(DateTime.now());
  protected readonly days = computed(() => weekDays(this.anchor(), this.timeZone()));
  protected readonly title = computed(() => `${this.days()[0]?.label} – ${this.days()[6]?.label}`);
  protected readonly lanes = computed(() => [{ id: this.tunnelId(), name: this.tunnelName() }]);
  protected readonly occupancy = rxResource({
    params: () => ({ tunnelId: this.tunnelId(), days: this.days() }),
    stream: ({ params }) =>
      this.api.occupancy(params.tunnelId, new Date(params.days[0]?.start ?? 0).toISOString(), new Date(params.days[6]?.end ?? 0).toISOString()),
  });
  protected readonly loadError = computed(() => {
    const error = this.occupancy.error();
    return error ? problemMessage(error.cause ?? error, 'The tunnel’s free and busy times could not be loaded.') : null;
  });
  protected readonly entries = computed<CalendarEntry[]>(() =>
    (this.occupancy.hasValue() ? this.occupancy.value().slots : [])
      .filter((slot) => slot.status === 'busy')
      .map((slot) => ({
        laneId: this.tunnelId(),
        period: slot.period,
        kind: slot.kind === 'maintenance' ? 'maintenance' : 'booking',
        label: slot.kind === 'maintenance' ? 'Maintenance' : slot.bookingId && slot.state ? `Yours · ${bookingStateLabels[slot.state]}` : 'Busy',
      })),
  );

  protected today(): DateTime {
    return DateTime.now();
  }

  protected move(step: number): void {
    this.anchor.update((at) => at.plus({ weeks: step }));
  }
}
