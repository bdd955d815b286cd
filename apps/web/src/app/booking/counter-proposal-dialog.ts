import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { Booking } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { BookingApi } from './booking-api';
import { formatPeriod, localValueOf } from './lab-time';
import { PeriodFields, periodControls, readPeriod } from './period-fields';

/** A lab manager offers another period instead of the one asked for; times are the lab's wall time. */
@Component({
  selector: 'tw-counter-proposal-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, ErrorBanner, PeriodFields],
  template: `
    <h2 mat-dialog-title>Offer another period</h2>
    <mat-dialog-content>
      <p>Asked for: {{ asked }}</p>
      <p>Times below are in the lab's zone, {{ booking.timeZone }}.</p>
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
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Close</button>
      <button mat-flat-button type="button" [disabled]="sending()" (click)="send()">Offer this period</button>
    </mat-dialog-actions>
  `,
  styleUrl: './period-dialog.scss',
})
export class CounterProposalDialog {
  private readonly api = inject(BookingApi);
  private readonly dialogRef = inject<MatDialogRef<CounterProposalDialog, Booking>>(MatDialogRef);
  protected readonly booking = inject<Booking>(MAT_DIALOG_DATA);

  protected readonly asked = formatPeriod(this.booking.period, this.booking.timeZone);
  protected readonly form = new FormGroup({
    ...periodControls(localValueOf(this.booking.period.start, this.booking.timeZone), localValueOf(this.booking.period.end, this.booking.timeZone)),
    note: new FormControl('', { nonNullable: true, validators: Validators.maxLength(2000) }),
  });
  protected readonly orderError = signal(false);
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected send(): void {
    const { period, outOfOrder } = readPeriod(this.form.controls, this.booking.timeZone);
    this.orderError.set(outOfOrder);
    if (this.form.invalid || !period || outOfOrder) {
      this.form.markAllAsTouched();
      return;
    }
    this.sending.set(true);
    this.api.counterPropose(this.booking.id, period, this.form.controls.note.value.trim()).subscribe({
      next: (booking) => this.dialogRef.close(booking),
      error: (error: unknown) => {
        this.sending.set(false);
        this.sendError.set(problemMessage(error, 'The other period could not be offered.'));
      },
    });
  }
}
