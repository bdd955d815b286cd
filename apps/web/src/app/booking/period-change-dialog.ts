import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { Booking, PeriodInput } from '@tunnelwright/contracts';
import type { Observable } from 'rxjs';
import { ErrorBanner } from '../shared/error-banner';
import { FormSubmission } from '../shared/form-submission';
import { BookingApi } from './booking-api';
import { formatPeriod, localValueOf } from './lab-time';
import { PeriodFields, periodControls, readPeriod } from './period-fields';

/** What the new period does: offered instead of the one asked for, or the confirmed booking moved to it. */
export type PeriodChange = 'counter-proposal' | 'reschedule';

export interface PeriodChangeDialogData {
  booking: Booking;
  change: PeriodChange;
}

const wording: Readonly<Record<PeriodChange, { title: string; current: string; action: string; failure: string; effect: string }>> = {
  'counter-proposal': {
    title: 'Offer another period',
    current: 'Asked for',
    action: 'Offer this period',
    failure: 'The other period could not be offered.',
    effect: 'The customer accepts or declines it; the slot they asked for is freed.',
  },
  reschedule: {
    title: 'Move the booking',
    current: 'Booked for',
    action: 'Move booking',
    failure: 'The booking could not be moved.',
    effect: 'The customer is e-mailed an updated calendar entry that replaces the old one.',
  },
};

/**
 * A lab manager gives a booking another period: offered instead of the one a request asked for, or a confirmed
 * booking moved. Times are the lab's wall time; the new period must be free, which the server checks.
 */
@Component({
  selector: 'tw-period-change-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, ErrorBanner, PeriodFields],
  template: `
    <h2 mat-dialog-title>{{ words.title }}</h2>
    <mat-dialog-content>
      <p>{{ words.current }}: {{ current }}</p>
      <p>Times below are in the lab's zone, {{ booking.timeZone }}. {{ words.effect }}</p>
      <form [formGroup]="form" class="fields">
        <tw-period-fields [controls]="form.controls" />
        <mat-form-field class="wide">
          <mat-label>Note to the customer</mat-label>
          <textarea matInput formControlName="note" rows="2" maxlength="2000"></textarea>
        </mat-form-field>
      </form>
      @if (orderError()) {
        <p class="error" role="alert">The end must be after the start.</p>
      }
      @if (submission.error(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Close</button>
      <button mat-flat-button type="button" [disabled]="submission.sending()" (click)="send()">{{ words.action }}</button>
    </mat-dialog-actions>
  `,
  styleUrl: './period-dialog.scss',
})
export class PeriodChangeDialog {
  private readonly api = inject(BookingApi);
  private readonly data = inject<PeriodChangeDialogData>(MAT_DIALOG_DATA);
  protected readonly booking = this.data.booking;
  protected readonly words = wording[this.data.change];

  protected readonly current = formatPeriod(this.booking.period, this.booking.timeZone);
  protected readonly form = new FormGroup({
    ...periodControls(localValueOf(this.booking.period.start, this.booking.timeZone), localValueOf(this.booking.period.end, this.booking.timeZone)),
    note: new FormControl('', { nonNullable: true, validators: Validators.maxLength(2000) }),
  });
  protected readonly orderError = signal(false);
  protected readonly submission = new FormSubmission(this.form, { failure: this.words.failure });

  protected send(): void {
    const { period, outOfOrder } = readPeriod(this.form.controls, this.booking.timeZone);
    this.orderError.set(outOfOrder);
    if (!this.submission.checkValid() || !period || outOfOrder) return;
    this.submission.send(this.call(period, this.form.controls.note.value.trim()));
  }

  private call(period: PeriodInput, note: string): Observable<Booking> {
    return this.data.change === 'reschedule' ? this.api.reschedule(this.booking.id, period, note) : this.api.counterPropose(this.booking.id, period, note);
  }
}
