import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { runKindSchema, type Run, type RunKind } from '@tunnelwright/contracts';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { IngestApi } from './ingest-api';
import { runKindLabels } from './run-labels';

/** Adds a run to a test: number (next free one if left empty), kind, configuration label and notes. */
@Component({
  selector: 'tw-new-run-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ErrorBanner],
  template: `
    <form [formGroup]="form" (ngSubmit)="submit()" aria-label="New run">
      <mat-form-field>
        <mat-label>Run number</mat-label>
        <input matInput type="number" min="1" step="1" formControlName="runNumber" />
        <mat-hint>Leave empty for the next free number</mat-hint>
        @if (form.controls.runNumber.hasError('min') || form.controls.runNumber.hasError('pattern')) {
          <mat-error>Use a whole number of 1 or more</mat-error>
        }
        @if (form.controls.runNumber.hasError('server')) {
          <mat-error>{{ form.controls.runNumber.getError('server') }}</mat-error>
        }
      </mat-form-field>
      <mat-form-field>
        <mat-label>Kind</mat-label>
        <mat-select formControlName="kind">
          @for (kind of kinds; track kind) {
            <mat-option [value]="kind">{{ kindLabels[kind] }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <mat-form-field>
        <mat-label>Configuration label</mat-label>
        <input matInput formControlName="configurationLabel" maxlength="80" [attr.list]="'configurations-' + testId()" />
        <datalist [id]="'configurations-' + testId()">
          @for (label of configurations(); track label) {
            <option [value]="label"></option>
          }
        </datalist>
      </mat-form-field>
      <mat-form-field class="notes">
        <mat-label>Notes</mat-label>
        <textarea matInput formControlName="notes" rows="2" maxlength="4000"></textarea>
      </mat-form-field>
      @if (error()) {
        <tw-error-banner [message]="error()" [retryable]="false" />
      }
      <button mat-flat-button type="submit" [disabled]="saving()">Create run</button>
    </form>
  `,
  styles: `
    form {
      display: flex;
      flex-wrap: wrap;
      gap: 0 16px;
      align-items: flex-start;
    }
    .notes {
      flex: 1 1 320px;
    }
    tw-error-banner {
      flex: 1 1 100%;
    }
  `,
})
export class NewRunForm {
  readonly testId = input.required<string>();
  /** Configuration labels the test names, offered as suggestions. */
  readonly configurations = input<readonly string[]>([]);
  /** Emitted with the run once the API created it. */
  readonly created = output<Run>();

  private readonly api = inject(IngestApi);
  protected readonly kinds = runKindSchema.options;
  protected readonly kindLabels = runKindLabels;
  protected readonly saving = signal(false);
  protected readonly error = signal('');
  protected readonly form = new FormGroup({
    runNumber: new FormControl<number | null>(null, [Validators.min(1), Validators.pattern(/^\d+$/)]),
    kind: new FormControl<RunKind>('data', { nonNullable: true }),
    configurationLabel: new FormControl('', { nonNullable: true }),
    notes: new FormControl('', { nonNullable: true }),
  });

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { runNumber, kind, configurationLabel, notes } = this.form.getRawValue();
    this.saving.set(true);
    this.error.set('');
    this.api.createRun(this.testId(), { runNumber: runNumber ?? undefined, kind, configurationLabel, notes }).subscribe({
      next: (run) => {
        this.saving.set(false);
        this.form.reset({ runNumber: null, kind: 'data', configurationLabel: '', notes: '' });
        this.created.emit(run);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const field = problemFieldErrors(error).find((e) => e.field === 'runNumber');
        if (field) {
          this.form.controls.runNumber.setErrors({ server: field.message });
          this.form.controls.runNumber.markAsTouched();
        } else {
          this.error.set(problemMessage(error, 'The run could not be created.'));
        }
      },
    });
  }
}
