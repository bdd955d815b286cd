import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { Booking, BookingState } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';
import { problemMessage } from '../core/problem-message';
import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { formatMoney } from '../shared/money';
import { BookingApi } from './booking-api';
import { BookingSummary } from './booking-summary';
import { CancelBookingDialog } from './cancel-booking-dialog';

interface BookingGroup {
  readonly title: string;
  readonly states: readonly BookingState[];
}

/** Groups a customer's bookings the way they follow them: to answer, booked, tested, closed. */
const groups: readonly BookingGroup[] = [
  { title: 'Waiting for an answer', states: ['requested', 'quoted', 'counter_proposed'] },
  { title: 'Booked and in test', states: ['confirmed', 'in_test'] },
  { title: 'Tests completed', states: ['completed'] },
  { title: 'Closed', states: ['declined', 'rejected', 'cancelled', 'expired'] },
];

const cancellable: readonly BookingState[] = ['requested', 'quoted', 'counter_proposed', 'confirmed'];

/** A customer's bookings with their state: answer quotes and counter-proposals, cancel with the charge shown first. */
@Component({
  selector: 'tw-my-bookings-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, EmptyState, ErrorBanner, BookingSummary],
  templateUrl: './my-bookings-page.html',
})
export class MyBookingsPage {
  private readonly api = inject(BookingApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly bookings = rxResource({ stream: () => this.api.list() });
  protected readonly loadError = computed(() => {
    const error = this.bookings.error();
    return error ? problemMessage(error.cause ?? error, 'Your bookings could not be loaded.') : null;
  });
  protected readonly grouped = computed(() => {
    const all = this.bookings.hasValue() ? this.bookings.value() : [];
    return groups.map((group) => ({ ...group, bookings: all.filter((b) => group.states.includes(b.state)) })).filter((group) => group.bookings.length > 0);
  });
  protected readonly isEmpty = computed(() => this.bookings.hasValue() && this.bookings.value().length === 0);
  protected readonly busyId = signal<string | null>(null);

  protected canCancel(booking: Booking): boolean {
    return cancellable.includes(booking.state);
  }

  protected acceptQuote(booking: Booking): void {
    const total = booking.quote ? formatMoney(booking.quote.totalMinor, booking.quote.currency) : '';
    this.confirmThen(
      { title: 'Accept the quote?', message: `You agree to pay ${total} and the booking of ${booking.tunnelName} is confirmed.`, confirmLabel: 'Accept quote' },
      booking,
      this.api.acceptQuote(booking.id),
      'Quote accepted; the booking is confirmed. A calendar invitation is on its way.',
    );
  }

  protected rejectQuote(booking: Booking): void {
    this.confirmThen(
      { title: 'Reject the quote?', message: 'The request closes and its slot is freed.', confirmLabel: 'Reject quote', destructive: true },
      booking,
      this.api.rejectQuote(booking.id),
      'Quote rejected.',
    );
  }

  protected acceptCounterProposal(booking: Booking): void {
    this.confirmThen(
      { title: 'Take the period offered?', message: 'Your request moves to the period the lab offered and waits for a quote.', confirmLabel: 'Take this period' },
      booking,
      this.api.acceptCounterProposal(booking.id),
      'Period taken; the lab will send a quote.',
    );
  }

  protected cancel(booking: Booking): void {
    this.dialog
      .open(CancelBookingDialog, { data: booking, width: '520px' })
      .afterClosed()
      .subscribe((cancelled: Booking | undefined) => {
        if (cancelled) {
          this.snackBar.open('Booking cancelled.', undefined, { duration: 4000 });
          this.bookings.reload();
        }
      });
  }

  private confirmThen(data: ConfirmDialogData, booking: Booking, call: Observable<Booking>, done: string): void {
    this.dialog
      .open(ConfirmDialog, { data, width: '440px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) {
          return;
        }
        this.busyId.set(booking.id);
        call.subscribe({
          next: () => {
            this.busyId.set(null);
            this.snackBar.open(done, undefined, { duration: 5000 });
            this.bookings.reload();
          },
          error: (error: unknown) => {
            this.busyId.set(null);
            this.snackBar.open(problemMessage(error, 'The change could not be saved.'), 'Dismiss', { duration: 8000 });
            this.bookings.reload();
          },
        });
      });
  }
}
