import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { Booking } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { formatMoney } from '../shared/money';
import { BookingApi } from './booking-api';
import { formatPeriod } from './lab-time';

/** Shows what cancelling costs now (the late-cancellation charge) and cancels only once confirmed with a reason. */
@Component({
  selector: 'tw-cancel-booking-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Cancel the booking of {{ booking.tunnelName }}?</h2>
    <mat-dialog-content>
      <p>{{ period }}</p>
      @if (preview.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Working out the cancellation charge" />
      }
      @if (previewError(); as message) {
        <tw-error-banner [message]="message" (retry)="preview.reload()" />
      }
      @if (preview.hasValue()) {
        <p class="fee" data-testid="cancellation-fee">Cancellation charge: {{ fee() }}</p>
        <p>{{ preview.value().explanation }}</p>
      }
      <mat-form-field class="reason">
        <mat-label>Reason</mat-label>
        <textarea matInput [formControl]="reason" rows="3" maxlength="2000" required></textarea>
        @if (reason.invalid) {
          <mat-error>Say why the booking is cancelled</mat-error>
        }
      </mat-form-field>
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Keep the booking</button>
      <button mat-flat-button type="button" class="tw-destructive" [disabled]="!preview.hasValue() || sending()" (click)="confirm()">
        Cancel booking
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .reason {
      width: 100%;
    }
    .fee {
      font: var(--mat-sys-title-medium);
    }
  `,
})
export class CancelBookingDialog {
  private readonly api = inject(BookingApi);
  private readonly dialogRef = inject<MatDialogRef<CancelBookingDialog, Booking>>(MatDialogRef);
  protected readonly booking = inject<Booking>(MAT_DIALOG_DATA);

  protected readonly period = formatPeriod(this.booking.period, this.booking.timeZone);
  protected readonly preview = rxResource({ stream: () => this.api.cancellationPreview(this.booking.id) });
  protected readonly previewError = computed(() => {
    const error = this.preview.error();
    return error ? problemMessage(error.cause ?? error, 'The cancellation charge could not be worked out.') : null;
  });
  protected readonly fee = computed(() => {
    if (!this.preview.hasValue()) {
      return '';
    }
    const { feeMinor, currency } = this.preview.value();
    return feeMinor === 0 || !currency ? 'none' : formatMoney(feeMinor, currency);
  });
  protected readonly reason = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(2000)] });
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected confirm(): void {
    if (this.reason.invalid || !this.preview.hasValue()) {
      this.reason.markAsTouched();
      return;
    }
    this.sending.set(true);
    this.sendError.set(null);
    this.api.cancel(this.booking.id, this.reason.value.trim(), this.preview.value().feeMinor).subscribe({
      next: (booking) => this.dialogRef.close(booking),
      error: (error: unknown) => {
        this.sending.set(false);
        this.sendError.set(problemMessage(error, 'The booking could not be cancelled.'));
        this.preview.reload();
      },
    });
  }
}
