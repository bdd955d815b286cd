import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { PointExclusion, ReviewPoint } from '@tunnelwright/contracts';
import { reasonLength } from '../approval/decision-dialog';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { ReviewApi } from './review-api';

/** The point the dialog leaves out. */
export interface ExclusionDialogData {
  readonly reductionId: string;
  readonly runNumber: number;
  readonly point: ReviewPoint;
}

/** Asks for the written reason (at least 10 characters) and excludes the point; closes with the exclusion. */
@Component({
  selector: 'tw-exclusion-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Exclude point {{ data.point.pointNumber }} of run {{ data.runNumber }}?</h2>
    <mat-dialog-content>
      <p>The point stays listed, marked with your reason, and is left out of charts, comparisons and the result. You can restore it until the results are approved.</p>
      <mat-form-field class="reason">
        <mat-label>Reason</mat-label>
        <textarea matInput [formControl]="reason" rows="3" maxlength="2000" required cdkFocusInitial></textarea>
        <mat-hint align="end">{{ reason.value.trim().length }} / at least 10</mat-hint>
        @if (reason.hasError('server')) {
          <mat-error>{{ reason.getError('server') }}</mat-error>
        } @else if (reason.hasError('required')) {
          <mat-error>Say why the point is left out</mat-error>
        } @else if (reason.hasError('tooShort')) {
          <mat-error>Write at least 10 characters</mat-error>
        }
      </mat-form-field>
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" [disabled]="sending()" (click)="confirm()">Exclude point</button>
    </mat-dialog-actions>
  `,
  styles: `
    .reason {
      width: 100%;
    }
  `,
})
export class ExclusionDialog {
  private readonly api = inject(ReviewApi);
  private readonly dialogRef = inject<MatDialogRef<ExclusionDialog, PointExclusion>>(MatDialogRef);
  protected readonly data = inject<ExclusionDialogData>(MAT_DIALOG_DATA);

  protected readonly reason = new FormControl('', { nonNullable: true, validators: [reasonLength, Validators.maxLength(2000)] });
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected confirm(): void {
    if (this.reason.invalid) {
      this.reason.markAsTouched();
      return;
    }
    this.sending.set(true);
    this.sendError.set(null);
    this.api.exclude(this.data.reductionId, this.data.point.index, this.reason.value.trim()).subscribe({
      next: (exclusion) => this.dialogRef.close(exclusion),
      error: (error: unknown) => {
        this.sending.set(false);
        const field = problemFieldErrors(error).find((candidate) => candidate.field === 'reason');
        if (field) {
          this.reason.setErrors({ server: field.message });
          this.reason.markAsTouched();
        }
        this.sendError.set(problemMessage(error, 'The point could not be excluded.'));
      },
    });
  }
}
