import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { SigningRight } from '@tunnelwright/contracts';
import { ApprovalApi } from '../../approval/approval-api';
import { reasonLength } from '../../approval/decision-dialog';
import { problemFieldErrors, problemMessage } from '../../core/problem-message';
import { ErrorBanner } from '../../shared/error-banner';

/** Asks before a signing right is removed, and why; the history keeps it. Closes with the removed right. */
@Component({
  selector: 'tw-revoke-signing-right-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Remove the signing right of {{ right.user.name }}?</h2>
    <mat-dialog-content>
      <p>{{ right.user.name }} will no longer approve results or issue sheets. Sheets they signed stay valid, and the history keeps the right and the reason.</p>
      <mat-form-field class="tw-full-width">
        <mat-label>Reason</mat-label>
        <textarea matInput [formControl]="reason" rows="3" maxlength="2000" required></textarea>
        <mat-hint align="end">{{ reason.value.trim().length }} / at least 10</mat-hint>
        @if (reason.hasError('server')) {
          <mat-error>{{ reason.getError('server') }}</mat-error>
        } @else if (reason.hasError('required')) {
          <mat-error>Say why the right is removed</mat-error>
        } @else if (reason.hasError('tooShort')) {
          <mat-error>Write at least 10 characters</mat-error>
        }
      </mat-form-field>
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Keep the right</button>
      <button mat-flat-button type="button" class="destructive" [disabled]="sending()" (click)="confirm()">Remove signing right</button>
    </mat-dialog-actions>
  `,
  styles: `
    .destructive {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
})
export class RevokeSigningRightDialog {
  private readonly api = inject(ApprovalApi);
  private readonly dialogRef = inject<MatDialogRef<RevokeSigningRightDialog, SigningRight>>(MatDialogRef);
  protected readonly right = inject<SigningRight>(MAT_DIALOG_DATA);

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
    this.api.revokeSigningRight(this.right.id, this.reason.value.trim()).subscribe({
      next: (right) => this.dialogRef.close(right),
      error: (error: unknown) => {
        this.sending.set(false);
        const field = problemFieldErrors(error).find((candidate) => candidate.field === 'reason');
        if (field) {
          this.reason.setErrors({ server: field.message });
          this.reason.markAsTouched();
        }
        this.sendError.set(problemMessage(error, 'The signing right could not be removed.'));
      },
    });
  }
}
