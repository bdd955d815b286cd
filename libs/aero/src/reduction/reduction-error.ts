/**
 * Reasons a reduction stops:
 * - `ZERO_WIND`: a sample has no wind (q ≤ 0), so speed and coefficients do not exist.
 * - `NOT_CONVERGED`: the iterative balance calibration did not converge.
 * - `MISSING_CALIBRATION`: the file gives bridge outputs but the configuration has no calibration.
 * - `MISSING_Q_FACTOR`: the file gives Δp_ref but neither it nor the configuration gives a q factor.
 * - `NOT_COVERED`: an attitude lies outside the weight-tare table.
 * - `BAD_VALUE`: a physics function refused a value derived from the file or the configuration.
 */
export type ReductionErrorCode = 'ZERO_WIND' | 'NOT_CONVERGED' | 'MISSING_CALIBRATION' | 'MISSING_Q_FACTOR' | 'NOT_COVERED' | 'BAD_VALUE';

/** Why and where a reduction stopped; `line` and `column` are 1-based positions in the run file. */
export class ReductionError extends Error {
  readonly code: ReductionErrorCode;
  readonly fileName: string;
  readonly line: number;
  readonly column: number;

  /**
   * @param code - why the reduction stopped
   * @param message - what was wrong, without the location
   * @param fileName - run file name
   * @param line - 1-based line of the sample (or of the header row for file-level problems)
   * @param column - 1-based column
   */
  constructor(code: ReductionErrorCode, message: string, fileName: string, line: number, column: number) {
    super(`${fileName}:${line}:${column}: ${message}`);
    this.name = 'ReductionError';
    this.code = code;
    this.fileName = fileName;
    this.line = line;
    this.column = column;
  }
}
