/**
 * Inverse of a square matrix, Gauss–Jordan elimination with partial pivoting.
 *
 * Solves A·X = I column by column, swapping in the largest remaining pivot at each step.
 * Source: Golub & Van Loan, *Matrix Computations*, 4th ed., 2013, §3.4 (partial pivoting).
 *
 * @param rows - the matrix as rows (n×n, any unit); not modified
 * @returns the inverse, row-major in a Float64Array of n² values (reciprocal units)
 * @throws {RangeError} "`invertMatrix` requires …" when the matrix is not square, not finite, or singular
 * @example
 * invertMatrix([[2, 0], [0, 4]]); // Float64Array [0.5, 0, 0, 0.25]
 */
export function invertMatrix(rows: readonly (readonly number[])[]): Float64Array {
  const n = rows.length;
  if (n === 0 || rows.some((row) => row.length !== n)) throw new RangeError(`\`invertMatrix\` requires a square matrix; got ${n} rows of lengths ${rows.map((r) => r.length).join(', ')}`);
  const a = new Float64Array(n * n);
  const inv = new Float64Array(n * n);
  let scale = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const value = rows[i][j];
      if (!Number.isFinite(value)) throw new RangeError(`\`invertMatrix\` requires finite entries; got ${value} at row ${i + 1}, column ${j + 1}`);
      a[i * n + j] = value;
      scale = Math.max(scale, Math.abs(value));
    }
    inv[i * n + i] = 1;
  }
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r * n + col]) > Math.abs(a[pivotRow * n + col])) pivotRow = r;
    const pivot = a[pivotRow * n + col];
    // A pivot this small relative to the largest entry means the primary sensitivities do not determine F.
    if (!(Math.abs(pivot) > scale * 1e-13)) throw new RangeError(`\`invertMatrix\` requires a non-singular matrix; column ${col + 1} has no usable pivot`);
    if (pivotRow !== col) {
      for (let j = 0; j < n; j++) {
        [a[col * n + j], a[pivotRow * n + j]] = [a[pivotRow * n + j], a[col * n + j]];
        [inv[col * n + j], inv[pivotRow * n + j]] = [inv[pivotRow * n + j], inv[col * n + j]];
      }
    }
    for (let j = 0; j < n; j++) {
      a[col * n + j] /= pivot;
      inv[col * n + j] /= pivot;
    }
    for (let r = 0; r < n; r++) {
      if (r === col) continue;
      const factor = a[r * n + col];
      if (factor === 0) continue;
      for (let j = 0; j < n; j++) {
        a[r * n + j] -= factor * a[col * n + j];
        inv[r * n + j] -= factor * inv[col * n + j];
      }
    }
  }
  return inv;
}
