import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { ErrorBanner } from '../shared/error-banner';
import { FormSubmission } from '../shared/form-submission';
import { BookingApi } from './booking-api';
import { CalendarLane, type FreeSlot } from './calendar-grid';
import { localValueOf } from './lab-time';
import { PeriodFields, periodControls, readPeriod } from './period-fields';

/** What the maintenance dialog needs: the tunnels and the lab's zone. */
export interface MaintenanceBlockDialogData {
  readonly tunnels: readonly CalendarLane[];
  readonly timeZone: string;
  /** A free stretch chosen on the calendar, to start the form with. */
  readonly slot?: FreeSlot;
}

/** A lab manager blocks a tunnel for maintenance; the API refuses a period that clashes with a booking. */
@Component({
  selector: 'tw-maintenance-block-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ErrorBanner, PeriodFields],
  template: `
    <h2 mat-dialog-title>Block a tunnel for maintenance</h2>
    <mat-dialog-content>
      <p>Times are in the lab's zone, {{ data.timeZone }}.</p>
      <form [formGroup]="form" class="fields">
        <mat-form-field class="wide">
          <mat-label>Tunnel</mat-label>
          <mat-select formControlName="tunnelId" required>
            @for (tunnel of data.tunnels; track tunnel.id) {
              <mat-option [value]="tunnel.id">{{ tunnel.name }}</mat-option>
            }
          </mat-select>
          @if (form.controls.tunnelId.invalid) {
            <mat-error>Choose a tunnel</mat-error>
          }
        </mat-form-field>
        <tw-period-fields [controls]="form.controls" />
        <mat-form-field class="wide">
          <mat-label>What is the maintenance?</mat-label>
          <textarea matInput formControlName="reason" rows="2" maxlength="2000" required></textarea>
          @if (form.controls.reason.invalid) {
            <mat-error>Say what the maintenance is</mat-error>
          }
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
      <button mat-flat-button type="button" [disabled]="submission.sending()" (click)="save()">Block the tunnel</button>
    </mat-dialog-actions>
  `,
  styleUrl: './period-dialog.scss',
})
export class MaintenanceBlockDialog {
  private readonly api = inject(BookingApi);
  protected readonly data = inject<MaintenanceBlockDialogData>(MAT_DIALOG_DATA);

  private readonly slot = this.data.slot;
  protected readonly form = new FormGroup({
    tunnelId: new FormControl<string | null>(this.slot?.laneId ?? null, Validators.required),
    ...periodControls(this.slot ? localValueOf(this.slot.start, this.data.timeZone) : '', this.slot ? localValueOf(this.slot.end, this.data.timeZone) : ''),
    reason: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(2000)] }),
  });
  protected readonly orderError = signal(false);
  protected readonly submission = new FormSubmission(this.form, { failure: 'The tunnel could not be blocked.' });

  protected save(): void {
    const { tunnelId, reason } = this.form.getRawValue();
    const { period, outOfOrder } = readPeriod(this.form.controls, this.data.timeZone);
    this.orderError.set(outOfOrder);
    if (!this.submission.checkValid() || !tunnelId || !period || outOfOrder) return;
    this.submission.send(this.api.createMaintenanceBlock({ tunnelId, ...period, reason: reason.trim() }));
  }
}
