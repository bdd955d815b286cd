import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogConfig, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { Observable } from 'rxjs';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from './error-banner';
import { ReasonField, minimumReasonLength, reasonControl, showReasonProblem } from './reason-field';

/** What the reason dialog asks, and how it sends the answer. */
export interface ReasonDialogData<T> {
  readonly title: string;
  readonly message: string;
  /** The error under an empty reason, e.g. "Say why the right is removed". */
  readonly missingReason: string;
  /** The shortest reason accepted, counted after trimming; 1 takes any words at all. Defaults to `minimumReasonLength`. */
  readonly minimumLength?: number;
  /** Label of the button that closes without acting, e.g. "Keep the right". */
  readonly cancelLabel: string;
  /** Label of the button that acts, e.g. "Remove signing right". */
  readonly confirmLabel: string;
  /** Whether the act is destructive (the button is drawn in the error colour). */
  readonly destructive?: boolean;
  /** Sends the trimmed reason; the dialog closes with what comes back. */
  readonly send: (reason: string) => Observable<T>;
  /** Shown when sending fails and the API said nothing more precise. */
  readonly failure: string;
}

/** Asks for the written reason an act needs, sends it, and closes with the result; a refusal stays in the dialog. */
@Component({
  selector: 'tw-reason-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatDialogModule, MatButtonModule, ErrorBanner, ReasonField],
  template: `
    <h2 mat-dialog-title>{{ data.title }}</h2>
    <mat-dialog-content>
      <p>{{ data.message }}</p>
      <tw-reason-field [control]="reason" [missing]="data.missingReason" [minimum]="minimumLength" />
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>{{ data.cancelLabel }}</button>
      <button mat-flat-button type="button" [class.tw-destructive]="data.destructive" [disabled]="sending()" (click)="confirm()">
        {{ data.confirmLabel }}
      </button>
    </mat-dialog-actions>
  `,
})
export class ReasonDialog<T> {
  private readonly dialogRef = inject<MatDialogRef<ReasonDialog<T>, T>>(MatDialogRef);
  protected readonly data = inject<ReasonDialogData<T>>(MAT_DIALOG_DATA);

  protected readonly minimumLength = this.data.minimumLength ?? minimumReasonLength;
  protected readonly reason = reasonControl(this.minimumLength);
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected confirm(): void {
    if (this.reason.invalid) {
      this.reason.markAsTouched();
      return;
    }
    this.sending.set(true);
    this.sendError.set(null);
    this.data.send(this.reason.value.trim()).subscribe({
      next: (result) => this.dialogRef.close(result),
      error: (error: unknown) => {
        this.sending.set(false);
        showReasonProblem(this.reason, error);
        this.sendError.set(problemMessage(error, this.data.failure));
      },
    });
  }
}

/** Opens the reason dialog; emits what the act returned, or `undefined` when the dialog was closed without it. */
export function openReasonDialog<T>(dialog: MatDialog, data: ReasonDialogData<T>, config: Omit<MatDialogConfig, 'data'> = {}): Observable<T | undefined> {
  return dialog.open<ReasonDialog<T>, ReasonDialogData<T>, T>(ReasonDialog, { width: '520px', autoFocus: 'first-tabbable', ...config, data }).afterClosed();
}
