import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { Booking } from '@tunnelwright/contracts';
import { DateTime } from 'luxon';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { BookingApi } from './booking-api';
import { BookingSummary } from './booking-summary';

const active: readonly Booking['state'][] = ['confirmed', 'in_test'];

/** A technician's own bookings for today and the rest of this week, in the lab's zone. */
@Component({
  selector: 'tw-technician-bookings-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatProgressBarModule, EmptyState, ErrorBanner, BookingSummary],
  template: `
    <section class="tw-page">
      <header class="tw-page-header"><h1>My tunnel time</h1></header>
      @if (loadError(); as message) {
        <tw-error-banner [message]="message" (retry)="bookings.reload()" />
      }
      @if (bookings.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading bookings" />
      }
      @if (bookings.hasValue()) {
        <h2>Today</h2>
        @for (booking of today(); track booking.id) {
          <tw-booking-summary [booking]="booking" [showOrganisation]="true" />
        } @empty {
          <tw-empty-state icon="today" title="Nothing today" hint="No booking assigned to you runs today." />
        }
        <h2>Later this week</h2>
        @for (booking of laterThisWeek(); track booking.id) {
          <tw-booking-summary [booking]="booking" [showOrganisation]="true" />
        } @empty {
          <tw-empty-state icon="date_range" title="Nothing else this week" hint="Bookings assigned to you show here." />
        }
      }
    </section>
  `,
})
export class TechnicianBookingsPage {
  private readonly api = inject(BookingApi);
  private readonly auth = inject(AuthService);

  protected readonly bookings = rxResource({ stream: () => this.api.list() });
  protected readonly loadError = computed(() => {
    const error = this.bookings.error();
    return error ? problemMessage(error.cause ?? error, 'Your bookings could not be loaded.') : null;
  });
  private readonly mine = computed(() => {
    const me = this.auth.user()?.id;
    return (this.bookings.hasValue() ? this.bookings.value() : []).filter((b) => b.technician?.id === me && active.includes(b.state));
  });
  private readonly zone = computed(() => this.mine()[0]?.timeZone ?? 'UTC');
  private readonly bounds = computed(() => {
    const now = DateTime.now().setZone(this.zone());
    return { todayStart: now.startOf('day').toMillis(), todayEnd: now.endOf('day').toMillis(), weekEnd: now.endOf('week').toMillis() };
  });
  protected readonly today = computed(() => {
    const { todayStart, todayEnd } = this.bounds();
    return this.mine().filter((b) => Date.parse(b.period.start) <= todayEnd && Date.parse(b.period.end) > todayStart);
  });
  protected readonly laterThisWeek = computed(() => {
    const { todayEnd, weekEnd } = this.bounds();
    return this.mine().filter((b) => Date.parse(b.period.start) > todayEnd && Date.parse(b.period.start) <= weekEnd);
  });
}
