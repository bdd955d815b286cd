import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ErrorBanner } from './error-banner';
import type { FormSubmission } from './form-submission';

/**
 * The frame of a dialog that sends one form: the title, a progress bar while working, the reason a
 * send failed, the projected form, and Cancel beside the submit button, all following the dialog's `FormSubmission`.
 * The form itself, with the `id` given as `formId`, is the dialog's; a `tw-error-banner` it projects stands above the
 * send failure.
 */
@Component({
  selector: 'tw-form-dialog-layout',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatDialogModule, MatButtonModule, MatProgressBarModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>{{ title() }}</h2>
    <mat-dialog-content>
      @if (submission().sending() || loading()) {
        <mat-progress-bar mode="indeterminate" [attr.aria-label]="progressLabel()" />
      }
      <ng-content select="tw-error-banner" />
      @if (submission().error(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
      <ng-content />
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="submit" [attr.form]="formId()" [disabled]="submission().sending()">{{ submitLabel() }}</button>
    </mat-dialog-actions>
  `,
  // The dialog lays out its title, content and actions as one column; this element must not stand in between.
  styles: `
    :host {
      display: contents;
    }
  `,
})
export class FormDialogLayout {
  readonly title = input.required<string>();
  /** The `id` of the projected form, which the submit button sends. */
  readonly formId = input.required<string>();
  readonly submitLabel = input.required<string>();
  /** How the form is sent: while it is, the progress bar shows and the submit button is off; then why it failed. */
  readonly submission = input.required<FormSubmission>();
  /** Whether something the form needs is loading: the progress bar shows, the submit button stays on. */
  readonly loading = input(false);
  /** What the progress bar says to screen readers. */
  readonly progressLabel = input('Saving');
}
