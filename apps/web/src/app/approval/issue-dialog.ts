import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { ResultSheet, Submission } from '@tunnelwright/contracts';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { ApprovalApi } from './approval-api';
import { reasonLength } from '../shared/reason-field';

/** What the issue dialog needs: the approved submission and, for a revision, the valid sheet it replaces. */
export interface IssueDialogData {
  readonly submission: Submission;
  /** The test's valid sheet, which the new one supersedes; null for a first issue. */
  readonly replaces: Pick<ResultSheet, 'reportNumber'> | null;
}

/**
 * The confirm step before a result sheet is issued: says what happens, asks why when it revises a valid
 * sheet, and shows progress while the server renders the PDF. Closes with the issued sheet.
 */
@Component({
  selector: 'tw-issue-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Issue the result sheet?</h2>
    <mat-dialog-content>
      <p>
        The sheet is rendered from submission {{ data.submission.sequence }}, published to the customer and e-mailed to their users.
        Once issued it cannot be changed; a correction is a new revision.
      </p>
      @if (needsReason()) {
        <p>
          <strong>This is a revision.</strong>
          {{ data.replaces ? data.replaces.reportNumber : 'The valid sheet' }} will be marked superseded by the new sheet.
        </p>
        <mat-form-field class="tw-full-width">
          <mat-label>Reason for the revision</mat-label>
          <textarea matInput [formControl]="revisionReason" rows="3" maxlength="1000" required></textarea>
          <mat-hint align="end">{{ revisionReason.value.trim().length }} / at least 10</mat-hint>
          @if (revisionReason.hasError('server')) {
            <mat-error>{{ revisionReason.getError('server') }}</mat-error>
          } @else if (revisionReason.hasError('required')) {
            <mat-error>Say why the sheet is revised</mat-error>
          } @else if (revisionReason.hasError('tooShort')) {
            <mat-error>Write at least 10 characters</mat-error>
          }
        </mat-form-field>
      }
      @if (issuing()) {
        <p class="progress" role="status">Rendering the result sheet…</p>
        <mat-progress-bar mode="indeterminate" aria-label="Rendering the result sheet" />
      }
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close [disabled]="issuing()">Cancel</button>
      <button mat-flat-button type="button" [disabled]="issuing()" (click)="confirm()">Issue result sheet</button>
    </mat-dialog-actions>
  `,
  styles: `
    .progress {
      margin: 8px 0 4px;
    }
  `,
})
export class IssueDialog {
  private readonly api = inject(ApprovalApi);
  private readonly dialogRef = inject<MatDialogRef<IssueDialog, ResultSheet>>(MatDialogRef);
  protected readonly data = inject<IssueDialogData>(MAT_DIALOG_DATA);

  /** Whether a reason is asked for; also set when the server says the test has a valid sheet after all. */
  protected readonly needsReason = signal(this.data.replaces !== null);
  protected readonly revisionReason = new FormControl('', {
    nonNullable: true,
    validators: this.data.replaces ? [reasonLength, Validators.maxLength(1000)] : [Validators.maxLength(1000)],
  });
  protected readonly issuing = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected confirm(): void {
    if (this.revisionReason.invalid) {
      this.revisionReason.markAsTouched();
      return;
    }
    this.issuing.set(true);
    this.sendError.set(null);
    // Closing by backdrop or Escape mid-render would leave the outcome unseen.
    this.dialogRef.disableClose = true;
    this.api.issue(this.data.submission.id, this.revisionReason.value.trim()).subscribe({
      next: (sheet) => this.dialogRef.close(sheet),
      error: (error: unknown) => {
        this.issuing.set(false);
        this.dialogRef.disableClose = false;
        const field = problemFieldErrors(error).find((candidate) => candidate.field === 'revisionReason');
        if (field) {
          this.needsReason.set(true);
          this.revisionReason.setValidators([reasonLength, Validators.maxLength(1000)]);
          this.revisionReason.setErrors({ server: field.message });
          this.revisionReason.markAsTouched();
        }
        this.sendError.set(problemMessage(error, 'The result sheet could not be issued.'));
      },
    });
  }
}
