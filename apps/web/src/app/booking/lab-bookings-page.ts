import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { Booking, BookingState, QuoteInput } from '@tunnelwright/contracts';
import { Observable, map } from 'rxjs';
import { UsersApi } from '../admin/users/users-api';
import { CatalogueApi } from '../core/catalogue-api';
import { problemMessage } from '../core/problem-message';
import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { openReasonDialog } from '../shared/reason-dialog';
import { BookingApi } from './booking-api';
import { BookingSummary } from './booking-summary';
import { CancelBookingDialog } from './cancel-booking-dialog';
import { PeriodChangeDialog, type PeriodChangeDialogData } from './period-change-dialog';
import { StartBookingDialog } from './start-booking-dialog';
import { QuoteEditor } from './quote-editor';

const sections: readonly { title: string; states: readonly BookingState[] }[] = [
  { title: 'Requests to answer', states: ['requested'] },
  { title: 'Waiting for the customer', states: ['quoted', 'counter_proposed'] },
  { title: 'Confirmed', states: ['confirmed'] },
  { title: 'In test', states: ['in_test'] },
  { title: 'Completed', states: ['completed'] },
  { title: 'Closed', states: ['declined', 'rejected', 'cancelled', 'expired'] },
];

/** Lab managers answer requests (quote, decline, other period), assign technicians and follow tests. */
@Component({
  selector: 'tw-lab-bookings-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, MatFormFieldModule, MatSelectModule, EmptyState, ErrorBanner, BookingSummary, QuoteEditor],
  templateUrl: './lab-bookings-page.html',
  styles: `
    .technician {
      width: 240px;
    }
    tw-quote-editor {
      display: block;
      width: 100%;
    }
  `,
})
export class LabBookingsPage {
  private readonly api = inject(BookingApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly users = inject(UsersApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly bookings = rxResource({ stream: () => this.api.list() });
  protected readonly services = rxResource({ stream: () => this.catalogue.services(true) });
  /** Active technicians, the only users a booking may be assigned to; the API does the filtering. */
  protected readonly technicians = rxResource({
    stream: () => this.users.list({ q: '', role: 'technician', active: true, sort: 'name', order: 'asc', page: 1, pageSize: 100 }).pipe(map((page) => page.items)),
  });
  protected readonly loadError = computed(() => {
    const error = this.bookings.error();
    return error ? problemMessage(error.cause ?? error, 'The bookings could not be loaded.') : null;
  });
  protected readonly technicianError = computed(() => (this.technicians.error() ? 'The technicians could not be loaded.' : null));
  protected readonly grouped = computed(() => {
    const all = this.bookings.hasValue() ? this.bookings.value() : [];
    return sections.map((section) => ({ ...section, bookings: all.filter((b) => section.states.includes(b.state)) })).filter((section) => section.bookings.length > 0);
  });
  protected readonly isEmpty = computed(() => this.bookings.hasValue() && this.bookings.value().length === 0);
  protected readonly quotingId = signal<string | null>(null);
  protected readonly busyId = signal<string | null>(null);

  /** Currency and hourly rate to start a quote with: the service's, when it is priced by the hour. */
  protected pricing(booking: Booking): { currency: string; hourlyRateMinor: number } {
    const services = this.services.hasValue() ? this.services.value() : [];
    const service = services.find((s) => s.id === booking.serviceId);
    // Without a service, the catalogue's currency is the lab's best guess.
    return { currency: service?.currency ?? services[0]?.currency ?? 'EUR', hourlyRateMinor: service?.unit === 'hour' ? service.rate : 0 };
  }

  protected sendQuote(booking: Booking, quote: QuoteInput): void {
    this.run(booking, this.api.quote(booking.id, quote), 'Quote sent to the customer.', () => this.quotingId.set(null));
  }

  protected decline(booking: Booking): void {
    // The customer is told the reason and the slot is freed; the API takes any reason that is not blank.
    const declined = openReasonDialog(this.dialog, {
      title: `Decline the request from ${booking.organisationName}?`,
      message: `The customer is told the reason and the slot on ${booking.tunnelName} is freed.`,
      missingReason: 'Say why the request is declined',
      minimumLength: 1,
      cancelLabel: 'Keep the request',
      confirmLabel: 'Decline request',
      destructive: true,
      send: (reason) => this.api.decline(booking.id, reason),
      failure: 'The request could not be declined.',
    });
    this.openThenReload(declined, 'Request declined.');
  }

  protected counterPropose(booking: Booking): void {
    const data: PeriodChangeDialogData = { booking, change: 'counter-proposal' };
    this.openThenReload(this.dialog.open(PeriodChangeDialog, { data, width: '560px' }).afterClosed(), 'Other period offered.');
  }

  /** Moves a confirmed booking to another free period; the customer is sent the updated calendar entry. */
  protected reschedule(booking: Booking): void {
    const data: PeriodChangeDialogData = { booking, change: 'reschedule' };
    this.openThenReload(this.dialog.open(PeriodChangeDialog, { data, width: '560px' }).afterClosed(), 'Booking moved; the customer was sent the updated calendar entry.');
  }

  protected cancel(booking: Booking): void {
    this.openThenReload(this.dialog.open(CancelBookingDialog, { data: booking, width: '520px' }).afterClosed(), 'Booking cancelled.');
  }

  protected assign(booking: Booking, technicianId: string | null): void {
    this.run(booking, this.api.assignTechnician(booking.id, technicianId), technicianId ? 'Technician assigned.' : 'Technician unassigned.');
  }

  /** Marks a confirmed booking in test, linking the test record that holds its runs if the lab manager picks one. */
  protected start(booking: Booking): void {
    this.openThenReload(this.dialog.open(StartBookingDialog, { data: booking, width: '520px' }).afterClosed(), 'Marked in test.');
  }

  protected complete(booking: Booking): void {
    this.confirmThen({ title: 'Mark as completed?', message: 'The tunnel time is over; results go on to checking.', confirmLabel: 'Mark completed' }, booking, this.api.complete(booking.id), 'Marked completed.');
  }

  private confirmThen(data: ConfirmDialogData, booking: Booking, call: Observable<Booking>, done: string): void {
    this.dialog
      .open(ConfirmDialog, { data, width: '420px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (confirmed) {
          this.run(booking, call, done);
        }
      });
  }

  private openThenReload(closed: Observable<Booking | undefined>, done: string): void {
    closed.subscribe((changed) => {
      if (changed) {
        this.snackBar.open(done, undefined, { duration: 4000 });
        this.bookings.reload();
      }
    });
  }

  private run(booking: Booking, call: Observable<Booking>, done: string, after?: () => void): void {
    this.busyId.set(booking.id);
    call.subscribe({
      next: () => {
        this.busyId.set(null);
        after?.();
        this.snackBar.open(done, undefined, { duration: 4000 });
        this.bookings.reload();
      },
      error: (error: unknown) => {
        this.busyId.set(null);
        this.snackBar.open(problemMessage(error, 'The change could not be saved.'), 'Dismiss', { duration: 8000 });
      },
    });
  }
}
