import { AbstractControl, FormArray, FormControl, ValidationErrors, Validators } from '@angular/forms';

/**
 * The six load components in the order the API and the reduction engine use: forces Fx, Fy, Fz in N and moments
 * Mx, My, Mz in N·m. Row i of the linear matrix C1 gives bridge i in mV/V per unit load of each component
 * (R = C1·F; AIAA R-091-2003, Recommended Practice for the Calibration and Use of Internal Strain-Gage Balances).
 */
export const loadComponents = ['Fx', 'Fy', 'Fz', 'Mx', 'My', 'Mz'] as const;

/** Rows and columns of the linear matrix C1 and the interaction matrix C2 (6 bridges × 21 second-order terms). */
export const linearShape = { rows: 6, columns: 6 } as const;
export const interactionShape = { rows: 6, columns: 21 } as const;

/** One plain number as typed or pasted: sign, digits with an optional point, optional exponent. */
const numberPattern = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** What reading pasted rows gave: the matrix when every row and cell is right, and otherwise each problem and where. */
export interface MatrixParse {
  readonly values: number[][] | null;
  readonly problems: readonly string[];
}

/** "Row 2, column 4 (Mx)" for the linear matrix; the interaction matrix's columns have no component name. */
export function cellPlace(row: number, column: number, columns: number): string {
  const name = columns === linearShape.columns ? ` (${loadComponents[column]})` : '';
  return `Row ${row + 1}, column ${column + 1}${name}`;
}

/**
 * Reads a matrix pasted as text, one row a line, numbers separated by spaces, tabs, commas or semicolons (a point is
 * the decimal mark). Blank lines are skipped. Every problem names its row and, for a bad number, its column.
 */
export function parseMatrixRows(text: string, rows: number, columns: number): MatrixParse {
  const lines = text
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter((line) => line !== '');
  const problems: string[] = [];
  if (lines.length === 0) {
    return { values: null, problems: [`Paste ${rows} rows of ${columns} numbers`] };
  }
  if (lines.length !== rows) {
    problems.push(`Found ${lines.length} row${lines.length === 1 ? '' : 's'}; the matrix has ${rows}`);
  }
  const values = lines.map((line, row) => {
    const cells = line.split(/[\s,;]+/).filter((cell) => cell !== '');
    if (cells.length !== columns) {
      problems.push(`Row ${row + 1} has ${cells.length} number${cells.length === 1 ? '' : 's'}; it needs ${columns}`);
    }
    return cells.map((cell, column) => {
      const value = numberPattern.test(cell) ? Number(cell) : Number.NaN;
      if (!Number.isFinite(value)) {
        problems.push(`${cellPlace(row, column, columns)}: “${cell}” is not a number`);
      }
      return value;
    });
  });
  return problems.length === 0 ? { values, problems } : { values: null, problems };
}

/** The matrix as text rows, tab-separated, for copying out or editing as text. */
export function matrixText(values: readonly (readonly (number | null)[])[]): string {
  return values.map((row) => row.map((value) => (value === null ? '' : String(value))).join('\t')).join('\n');
}

/** Validator: the cell holds a finite number. */
function finiteNumber(control: AbstractControl): ValidationErrors | null {
  const value = control.value as number | null;
  return value === null || Number.isFinite(value) ? null : { number: true };
}

export type MatrixGrid = FormArray<FormArray<FormControl<number | null>>>;

/** A grid of number fields, each required; filled from `initial` when given. */
export function matrixGrid(rows: number, columns: number, initial?: readonly (readonly number[])[]): MatrixGrid {
  return new FormArray(
    Array.from(
      { length: rows },
      (_, row) =>
        new FormArray(
          Array.from({ length: columns }, (_, column) => new FormControl<number | null>(initial?.[row]?.[column] ?? null, { validators: [Validators.required, finiteNumber] })),
        ),
    ),
  );
}

/** Puts parsed values into the grid, marking every cell touched so what is still wrong shows. */
export function fillGrid(grid: MatrixGrid, values: readonly (readonly number[])[]): void {
  grid.controls.forEach((row, r) => row.controls.forEach((cell, c) => cell.setValue(values[r]?.[c] ?? null)));
  grid.markAllAsTouched();
}

/** What is wrong with one cell, e.g. "Row 2, column 4 (Mx): enter a number"; empty when the cell is fine. */
export function cellProblem(cell: AbstractControl, row: number, column: number, columns: number): string {
  if (!cell.errors) return '';
  const place = cellPlace(row, column, columns);
  if (cell.errors['server']) return `${place}: ${String(cell.errors['server'])}`;
  return `${place}: enter a number`;
}

/** Every problem of the grid, row by row, for the list under it. */
export function gridProblems(grid: MatrixGrid): string[] {
  const columns = grid.at(0)?.length ?? 0;
  return grid.controls.flatMap((row, r) => row.controls.map((cell, c) => cellProblem(cell, r, c, columns)).filter((problem) => problem !== ''));
}

/** The grid's values; call only once the grid is valid. */
export function gridValues(grid: MatrixGrid): number[][] {
  return grid.controls.map((row) => row.controls.map((cell) => cell.value ?? 0));
}

/**
 * Where a server field error of a calibration points in the matrices: `matrices.linear.2.3` is row 3, column 4 of
 * the linear matrix. Null for any other field.
 */
export function matrixFieldPlace(field: string): { matrix: 'linear' | 'interaction'; row: number | null; column: number | null } | null {
  const match = /^matrices\.(linear|interaction)(?:\.(\d+))?(?:\.(\d+))?$/.exec(field);
  if (!match) return null;
  return { matrix: match[1] as 'linear' | 'interaction', row: match[2] === undefined ? null : Number(match[2]), column: match[3] === undefined ? null : Number(match[3]) };
}
