import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';

/** What the confirm dialog asks. */
export interface ConfirmDialogData {
  readonly title: string;
  readonly message: string;
  /** Label of the confirming button, e.g. "Deactivate". */
  readonly confirmLabel: string;
  /** Whether the act is destructive (the button is drawn in the error colour). */
  readonly destructive?: boolean;
}

/** Asks before an act that is hard to undo; closes with `true` when confirmed. */
@Component({
  selector: 'tw-confirm-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>{{ data.title }}</h2>
    <mat-dialog-content>
      <p>{{ data.message }}</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false">Cancel</button>
      <button
        mat-flat-button
        type="button"
        cdkFocusInitial
        [class.tw-destructive]="data.destructive"
        [mat-dialog-close]="true"
      >
        {{ data.confirmLabel }}
      </button>
    </mat-dialog-actions>
  `,
})
export class ConfirmDialog {
  protected readonly data = inject<ConfirmDialogData>(MAT_DIALOG_DATA);
}
