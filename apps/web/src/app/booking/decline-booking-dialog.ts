import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { Booking } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { BookingApi } from './booking-api';

/** A lab manager declines a request, saying why; the customer is told and the slot is freed. */
@Component({
  selector: 'tw-decline-booking-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Decline the request from {{ booking.organisationName }}?</h2>
    <mat-dialog-content>
      <p>The customer is told the reason and the slot on {{ booking.tunnelName }} is freed.</p>
      <mat-form-field class="reason">
        <mat-label>Reason</mat-label>
        <textarea matInput [formControl]="reason" rows="3" maxlength="2000" required></textarea>
        @if (reason.invalid) {
          <mat-error>Say why the request is declined</mat-error>
        }
      </mat-form-field>
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Keep the request</button>
      <button mat-flat-button type="button" class="destructive" [disabled]="sending()" (click)="confirm()">Decline request</button>
    </mat-dialog-actions>
  `,
  styles: `
    .reason {
      width: 100%;
    }
    .destructive {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
})
export class DeclineBookingDialog {
  private readonly api = inject(BookingApi);
  private readonly dialogRef = inject<MatDialogRef<DeclineBookingDialog, Booking>>(MatDialogRef);
  protected readonly booking = inject<Booking>(MAT_DIALOG_DATA);

  protected readonly reason = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(2000)] });
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected confirm(): void {
    if (this.reason.invalid) {
      this.reason.markAsTouched();
      return;
    }
    this.sending.set(true);
    this.api.decline(this.booking.id, this.reason.value.trim()).subscribe({
      next: (booking) => this.dialogRef.close(booking),
      error: (error: unknown) => {
        this.sending.set(false);
        this.sendError.set(problemMessage(error, 'The request could not be declined.'));
      },
    });
  }
}
