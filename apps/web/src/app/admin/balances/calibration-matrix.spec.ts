import { cellPlace, gridProblems, gridValues, matrixFieldPlace, matrixGrid, matrixText, parseMatrixRows } from './calibration-matrix';

/** An invented 6 × 6 matrix written the way a calibration report's table is often copied: tabs, spaces, commas. */
const pasted = [
  '0.00215\t0.00001\t-0.00002\t0\t0\t0',
  '0.00001  0.00221  0.00000  0  0  0',
  '0, 0, 0.00198, 0, 0, 0',
  '0;0;0;0.0112;0;1e-5',
  '',
  '0 0 0 0 0.0107 0',
  '+0 -0 0 0 0 .0121',
].join('\n');

describe('parseMatrixRows', () => {
  it('reads six rows of six numbers with tabs, spaces, commas or semicolons and skips blank lines', () => {
    const parsed = parseMatrixRows(pasted, 6, 6);
    expect(parsed.problems).toEqual([]);
    expect(parsed.values?.[0]).toEqual([0.00215, 0.00001, -0.00002, 0, 0, 0]);
    expect(parsed.values?.[3]).toEqual([0, 0, 0, 0.0112, 0, 1e-5]);
    expect(parsed.values?.[5]).toEqual([0, -0, 0, 0, 0, 0.0121]);
  });

  it('names the row and column (with its component) of a cell that is not a number', () => {
    const text = pasted.replace('0.00198', '0.001,98x').replace('0.0107', '1.2.3');
    const parsed = parseMatrixRows(text, 6, 6);
    expect(parsed.values).toBeNull();
    expect(parsed.problems).toEqual(['Row 3 has 7 numbers; it needs 6', 'Row 3, column 4 (Mx): “98x” is not a number', 'Row 5, column 5 (My): “1.2.3” is not a number']);
  });

  it('says how many rows there are and which row is short', () => {
    const parsed = parseMatrixRows('1 0 0 0 0 0\n0 1 0 0 0\n0 0 1 0 0 0', 6, 6);
    expect(parsed.problems).toEqual(['Found 3 rows; the matrix has 6', 'Row 2 has 5 numbers; it needs 6']);
  });

  it('asks for the rows when nothing was pasted', () => {
    expect(parseMatrixRows('  \n ', 6, 21).problems).toEqual(['Paste 6 rows of 21 numbers']);
  });

  it('names interaction columns by number only, since they are products of loads', () => {
    const row = Array.from({ length: 21 }, () => '0');
    row[20] = 'n/a';
    const text = Array.from({ length: 6 }, (_, i) => (i === 1 ? row.join(' ') : Array(21).fill('0').join(' '))).join('\n');
    expect(parseMatrixRows(text, 6, 21).problems).toEqual(['Row 2, column 21: “n/a” is not a number']);
  });
});

describe('the matrix grid', () => {
  it('lists every empty or cleared cell by row and column, and gives the values once all are filled', () => {
    const grid = matrixGrid(6, 6, [[1, 0, 0, 0, 0, 0]]);
    expect(grid.at(0).at(0).value).toBe(1);
    const problems = gridProblems(grid);
    expect(problems).toHaveLength(30);
    expect(problems[0]).toBe('Row 2, column 1 (Fx): enter a number');
    expect(problems[29]).toBe('Row 6, column 6 (Mz): enter a number');

    grid.controls.forEach((row, r) => row.controls.forEach((cell, c) => cell.setValue(r === c ? 2 : 0)));
    expect(grid.valid).toBe(true);
    expect(gridValues(grid)[4]).toEqual([0, 0, 0, 0, 2, 0]);
    grid.at(1).at(2).setErrors({ server: 'Expected number, received string' });
    expect(gridProblems(grid)).toEqual(['Row 2, column 3 (Fz): Expected number, received string']);
  });

  it('writes the grid as tab-separated rows that read back the same', () => {
    const values = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 0.002 : -0.00001 * (j + 1))));
    expect(parseMatrixRows(matrixText(values), 6, 6).values).toEqual(values);
  });
});

describe('matrixFieldPlace', () => {
  it('turns the API field path of a cell into its zero-based row and column', () => {
    expect(matrixFieldPlace('matrices.linear.2.3')).toEqual({ matrix: 'linear', row: 2, column: 3 });
    expect(matrixFieldPlace('matrices.interaction.5')).toEqual({ matrix: 'interaction', row: 5, column: null });
    expect(matrixFieldPlace('matrices.linear')).toEqual({ matrix: 'linear', row: null, column: null });
    expect(matrixFieldPlace('dueOn')).toBeNull();
    expect(cellPlace(2, 3, 6)).toBe('Row 3, column 4 (Mx)');
  });
});
