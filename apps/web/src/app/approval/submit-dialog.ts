import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { Submission } from '@tunnelwright/contracts';
import { forkJoin, map, of, switchMap } from 'rxjs';
import { problemMessage } from '../core/problem-message';
import { runKindLabels } from '../testing-runs/run-labels';
import { IngestApi } from '../testing-runs/ingest-api';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { ApprovalApi } from './approval-api';
import { defaultPicks, pickedReductionIds, picksProblem, runChoices, type RunChoice } from './approval-rules';
import { resourceCause } from './resource-error';

/** Asks for approval of a test's results: one done reduction version per run (newest by default) and a note. */
@Component({
  selector: 'tw-submit-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, MatSelectModule, EmptyState, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Submit for approval</h2>
    <mat-dialog-content>
      @if (choices.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the runs' reductions" />
      }
      @if (choices.error(); as error) {
        <tw-error-banner [message]="message(error)" (retry)="choices.reload()" />
      } @else if (choices.hasValue()) {
        @if (choices.value().length === 0) {
          <tw-empty-state icon="hourglass_empty" title="Nothing to submit yet" hint="A run can be submitted once one of its reductions is done." />
        } @else {
          <p>Choose the reduction version of each run that the analyst should check. Approval freezes the chosen versions.</p>
          @for (choice of choices.value(); track choice.run.id) {
            <mat-form-field class="tw-full-width">
              <mat-label>{{ runLabel(choice) }}</mat-label>
              <mat-select [value]="picks()[choice.run.id]" (selectionChange)="pick(choice.run.id, $event.value)">
                @for (version of choice.versions; track version.id; let newest = $first) {
                  <mat-option [value]="version.id">
                    v{{ version.version }} · {{ version.pointCount }} points · {{ version.createdAt | date: 'medium' }}{{ newest ? ' (newest)' : '' }}
                  </mat-option>
                }
                <mat-option value="">Leave this run out</mat-option>
              </mat-select>
            </mat-form-field>
          }
          <mat-form-field class="tw-full-width">
            <mat-label>Note for the analyst</mat-label>
            <textarea matInput [formControl]="note" rows="3" maxlength="2000"></textarea>
            <mat-hint align="end">{{ note.value.length }} / 2000</mat-hint>
          </mat-form-field>
          @if (picksProblem(); as problem) {
            <p class="error" role="alert">{{ problem }}</p>
          }
        }
      }
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" [disabled]="sending() || !choices.hasValue() || choices.value().length === 0 || picksProblem() !== null" (click)="submit()">
        Submit for approval
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .error {
      color: var(--mat-sys-error);
    }
  `,
})
export class SubmitDialog {
  private readonly api = inject(ApprovalApi);
  private readonly ingest = inject(IngestApi);
  private readonly dialogRef = inject<MatDialogRef<SubmitDialog, Submission>>(MatDialogRef);
  private readonly testId = inject<string>(MAT_DIALOG_DATA);

  protected readonly choices = rxResource({
    stream: () =>
      this.ingest.runs(this.testId).pipe(
        switchMap((runs) => (runs.length === 0 ? of([]) : forkJoin(runs.map((run) => this.ingest.reductions(run.id).pipe(map((reductions) => ({ run, reductions }))))))),
        map((runs) => {
          const choices = runChoices(runs);
          this.picks.set(defaultPicks(choices));
          return choices;
        }),
      ),
  });
  protected readonly picks = signal<Record<string, string>>({});
  protected readonly picksProblem = computed(() => (this.choices.hasValue() && this.choices.value().length > 0 ? picksProblem(this.choices.value(), this.picks()) : null));
  protected readonly note = new FormControl('', { nonNullable: true, validators: Validators.maxLength(2000) });
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected runLabel(choice: RunChoice): string {
    const label = choice.run.configurationLabel ? ` · ${choice.run.configurationLabel}` : '';
    return `Run ${choice.run.runNumber} (${runKindLabels[choice.run.kind]}${label})`;
  }

  protected pick(runId: string, reductionId: string): void {
    this.picks.update((current) => ({ ...current, [runId]: reductionId }));
  }

  protected message(error: unknown): string {
    return problemMessage(resourceCause(error), 'The runs and their reductions could not be loaded.');
  }

  protected submit(): void {
    const reductionIds = pickedReductionIds(this.picks());
    if (this.picksProblem() !== null || this.note.invalid) return;
    this.sending.set(true);
    this.sendError.set(null);
    this.api.submit(this.testId, reductionIds, this.note.value.trim()).subscribe({
      next: (submission) => this.dialogRef.close(submission),
      error: (error: unknown) => {
        this.sending.set(false);
        this.sendError.set(problemMessage(resourceCause(error), 'The submission could not be sent.'));
      },
    });
  }
}
