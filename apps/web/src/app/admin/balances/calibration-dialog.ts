import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { AbstractControl, FormControl, NonNullableFormBuilder, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { Balance, Calibration, CalibrationInput } from '@tunnelwright/contracts';
import { problemFieldErrors, problemMessage } from '../../core/problem-message';
import { ErrorBanner } from '../../shared/error-banner';
import { focusFirstInvalid } from '../../shared/focus-first-invalid';
import { BalancesApi } from './balances-api';
import { todayUtc } from './calibration-due';
import {
  cellPlace,
  cellProblem,
  fillGrid,
  gridProblems,
  gridValues,
  interactionShape,
  linearShape,
  loadComponents,
  matrixFieldPlace,
  matrixGrid,
  matrixText,
  parseMatrixRows,
} from './calibration-matrix';

/** Group validator: the due date is not before the calibration date (the API's rule). */
export function dueNotBeforeCalibration(group: AbstractControl): ValidationErrors | null {
  const calibratedOn = group.get('calibratedOn')?.value as string | undefined;
  const dueOn = group.get('dueOn')?.value as string | undefined;
  return calibratedOn && dueOn && dueOn < calibratedOn ? { dueBeforeCalibration: true } : null;
}

/** Validator: a date typed as `YYYY-MM-DD` (what a date field gives). */
function isoDate(control: AbstractControl): ValidationErrors | null {
  const value = control.value as string;
  return value === '' || /^\d{4}-\d{2}-\d{2}$/.test(value) ? null : { date: true };
}

/** Records a new calibration version of the balance passed in. Closes with the recorded version. */
@Component({
  selector: 'tw-calibration-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatCheckboxModule, MatProgressBarModule, ErrorBanner],
  templateUrl: './calibration-dialog.html',
  styleUrl: './calibration-dialog.scss',
})
export class CalibrationDialog {
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly api = inject(BalancesApi);
  private readonly dialogRef = inject<MatDialogRef<CalibrationDialog, Calibration>>(MatDialogRef);

  protected readonly balance = inject<Balance>(MAT_DIALOG_DATA);
  /** The number the new version gets. */
  protected readonly nextVersion = (this.balance.currentCalibration?.version ?? 0) + 1;
  protected readonly dates = inject(NonNullableFormBuilder).group(
    {
      calibratedOn: [todayUtc(), [Validators.required, isoDate]],
      dueOn: ['', [Validators.required, isoDate]],
    },
    { validators: dueNotBeforeCalibration },
  );
  protected readonly linear = matrixGrid(linearShape.rows, linearShape.columns);
  protected readonly components = loadComponents;
  protected readonly linearPaste = new FormControl('', { nonNullable: true });
  protected readonly withInteraction = new FormControl(false, { nonNullable: true });
  protected readonly interactionText = new FormControl('', { nonNullable: true });

  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  /** Problems of the pasted linear rows, each with its row and column. */
  protected readonly pasteProblems = signal<readonly string[]>([]);
  /** Problems of the grid found when saving, each with its row and column. */
  protected readonly linearProblems = signal<readonly string[]>([]);
  protected readonly interactionProblems = signal<readonly string[]>([]);

  protected readonly cellLabel = (row: number, column: number) => cellPlace(row, column, linearShape.columns);
  protected readonly cellProblem = (cell: AbstractControl, row: number, column: number) => cellProblem(cell, row, column, linearShape.columns);

  /** Fills the grid from the pasted rows, or lists where they are wrong. */
  protected fillFromPaste(): void {
    const parsed = parseMatrixRows(this.linearPaste.value, linearShape.rows, linearShape.columns);
    this.pasteProblems.set(parsed.problems);
    if (parsed.values) {
      fillGrid(this.linear, parsed.values);
      this.linearProblems.set([]);
    }
  }

  /** Starts the grid from the current version's matrix, for a recalibration that changes a few terms. */
  protected startFromCurrent(): void {
    const current = this.balance.currentCalibration;
    if (!current) return;
    fillGrid(this.linear, current.matrices.linear);
    if (current.matrices.interaction) {
      this.withInteraction.setValue(true);
      this.interactionText.setValue(matrixText(current.matrices.interaction));
    }
    this.linearProblems.set([]);
  }

  /** The linear matrix as tab-separated rows, to copy into a spreadsheet or edit as text. */
  protected copyGridToText(): void {
    this.linearPaste.setValue(matrixText(this.linear.getRawValue()));
  }

  protected save(): void {
    this.error.set(null);
    this.linear.markAllAsTouched();
    this.linearProblems.set(gridProblems(this.linear));
    let interaction: number[][] | undefined;
    if (this.withInteraction.value) {
      const parsed = parseMatrixRows(this.interactionText.value, interactionShape.rows, interactionShape.columns);
      this.interactionProblems.set(parsed.problems);
      interaction = parsed.values ?? undefined;
    } else {
      this.interactionProblems.set([]);
    }
    if (this.dates.invalid || this.linear.invalid || (this.withInteraction.value && !interaction)) {
      this.dates.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const { calibratedOn, dueOn } = this.dates.getRawValue();
    const input: CalibrationInput = { calibratedOn, dueOn, matrices: { linear: gridValues(this.linear), ...(interaction ? { interaction } : {}) } };
    this.busy.set(true);
    this.api.recordCalibration(this.balance.id, input).subscribe({
      next: (recorded) => {
        this.busy.set(false);
        this.dialogRef.close(recorded);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.showFieldErrors(error);
        this.error.set(problemMessage(error, 'The calibration could not be recorded.'));
      },
    });
  }

  /** Puts each of the API's field errors where it belongs: a date field, a grid cell, or the matrix's problem list. */
  private showFieldErrors(error: unknown): void {
    const linearRest: string[] = [];
    const interactionRest: string[] = [];
    for (const field of problemFieldErrors(error)) {
      const place = matrixFieldPlace(field.field);
      if (!place) {
        const control = this.dates.get(field.field);
        control?.setErrors({ server: field.message });
        control?.markAsTouched();
        continue;
      }
      const rest = place.matrix === 'linear' ? linearRest : interactionRest;
      const columns = place.matrix === 'linear' ? linearShape.columns : interactionShape.columns;
      if (place.row !== null && place.column !== null) {
        const cell = place.matrix === 'linear' ? this.linear.at(place.row)?.at(place.column) : undefined;
        cell?.setErrors({ server: field.message });
        rest.push(`${cellPlace(place.row, place.column, columns)}: ${field.message}`);
      } else {
        rest.push(place.row !== null ? `Row ${place.row + 1}: ${field.message}` : field.message);
      }
    }
    this.linearProblems.set(linearRest);
    this.interactionProblems.set(interactionRest);
  }
}
