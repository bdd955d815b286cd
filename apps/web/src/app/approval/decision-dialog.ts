import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { Submission } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { ReasonField, reasonControl, showReasonProblem } from '../shared/reason-field';
import { ApprovalApi } from './approval-api';

/** Which decision the dialog records. */
export interface DecisionDialogData {
  readonly submission: Submission;
  readonly decision: 'approve' | 'send-back';
}

/** Approves a submission (with an optional comment) or sends it back (with a reason); closes with the decided submission. */
@Component({
  selector: 'tw-decision-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, ErrorBanner, ReasonField],
  template: `
    <h2 mat-dialog-title>{{ approving ? 'Approve' : 'Send back' }} submission {{ data.submission.sequence }}?</h2>
    <mat-dialog-content>
      @if (approving) {
        <p>Approval freezes the chosen reduction versions and their points; after it, a result sheet can be issued.</p>
        <mat-form-field class="tw-full-width">
          <mat-label>Comment (optional)</mat-label>
          <textarea matInput [formControl]="comment" rows="3" maxlength="2000"></textarea>
        </mat-form-field>
      } @else {
        <p>The submitter is told the reason and can submit again after fixing it.</p>
        <tw-reason-field [control]="reason" missing="Say why it is sent back" />
      }
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" [class.tw-destructive]="!approving" [disabled]="sending()" (click)="confirm()">
        {{ approving ? 'Approve' : 'Send back' }}
      </button>
    </mat-dialog-actions>
  `,
})
export class DecisionDialog {
  private readonly api = inject(ApprovalApi);
  private readonly dialogRef = inject<MatDialogRef<DecisionDialog, Submission>>(MatDialogRef);
  protected readonly data = inject<DecisionDialogData>(MAT_DIALOG_DATA);
  protected readonly approving = this.data.decision === 'approve';

  protected readonly comment = new FormControl('', { nonNullable: true, validators: Validators.maxLength(2000) });
  protected readonly reason = reasonControl();
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected confirm(): void {
    const control = this.approving ? this.comment : this.reason;
    if (control.invalid) {
      control.markAsTouched();
      return;
    }
    const id = this.data.submission.id;
    const request = this.approving ? this.api.approve(id, this.comment.value.trim()) : this.api.sendBack(id, this.reason.value.trim());
    this.sending.set(true);
    this.sendError.set(null);
    request.subscribe({
      next: (submission) => this.dialogRef.close(submission),
      error: (error: unknown) => {
        this.sending.set(false);
        if (!this.approving) showReasonProblem(this.reason, error);
        this.sendError.set(problemMessage(error, this.approving ? 'The submission could not be approved.' : 'The submission could not be sent back.'));
      },
    });
  }
}
