import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { Booking } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { FormSubmission } from '../shared/form-submission';
import { IngestApi } from '../testing-runs/ingest-api';
import { BookingApi } from './booking-api';
import { formatPeriod } from './lab-time';

/**
 * Marks a confirmed booking as in test and links the test record that will hold its runs: one of the customer's
 * tests in the booked tunnel not yet tied to another booking. Linking can wait; the booking then starts unlinked.
 */
@Component({
  selector: 'tw-start-booking-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatDialogModule, MatButtonModule, MatFormFieldModule, MatProgressBarModule, MatSelectModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Mark as in test?</h2>
    <mat-dialog-content>
      <p>The test of {{ booking.organisationName }} on {{ booking.tunnelName }} has started: {{ period }}.</p>
      @if (tests.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the customer's tests" />
      }
      @if (loadError(); as message) {
        <tw-error-banner [message]="message" (retry)="tests.reload()" />
      } @else if (tests.hasValue()) {
        @if (candidates().length > 0) {
          <mat-form-field class="wide">
            <mat-label>Test record for its runs</mat-label>
            <mat-select [formControl]="testId">
              <mat-option [value]="null">Link a test later</mat-option>
              @for (test of candidates(); track test.id) {
                <mat-option [value]="test.id">{{ test.title }}</mat-option>
              }
            </mat-select>
            <mat-hint>The customer's tests in this tunnel that no other booking holds</mat-hint>
          </mat-form-field>
        } @else {
          <p class="none" role="note">
            {{ booking.organisationName }} has no test in {{ booking.tunnelName }} to link yet.
            <a routerLink="/tests/new" [queryParams]="{ organisation: booking.organisationId, tunnel: booking.tunnelId }" mat-dialog-close>Open a test</a> first to link it now, or start without one.
          </p>
        }
      }
      @if (submission.error(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" [disabled]="submission.sending() || tests.isLoading()" (click)="confirm()">Mark in test</button>
    </mat-dialog-actions>
  `,
  styles: `
    .wide {
      width: 100%;
    }
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class StartBookingDialog {
  private readonly api = inject(BookingApi);
  private readonly ingest = inject(IngestApi);
  protected readonly booking = inject<Booking>(MAT_DIALOG_DATA);

  protected readonly period = formatPeriod(this.booking.period, this.booking.timeZone);
  protected readonly testId = new FormControl<string | null>(null);
  protected readonly tests = rxResource({ stream: () => this.ingest.tests() });
  /** The customer's tests in the booked tunnel that are free to link: no booking yet, or this one. */
  protected readonly candidates = computed(() =>
    (this.tests.hasValue() ? this.tests.value() : []).filter(
      (test) => test.organisationId === this.booking.organisationId && test.tunnelId === this.booking.tunnelId && (test.bookingId === null || test.bookingId === this.booking.id) && test.state !== 'cancelled',
    ),
  );
  protected readonly loadError = computed(() => {
    const error = this.tests.error();
    return error ? problemMessage(error.cause ?? error, 'The customer’s tests could not be loaded.') : null;
  });
  protected readonly submission = new FormSubmission(this.testId, { failure: 'The booking could not be marked in test.' });

  protected confirm(): void {
    this.submission.send(this.api.start(this.booking.id, this.testId.value));
  }
}
