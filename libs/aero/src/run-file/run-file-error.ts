/** Stable codes of every problem the run-file reader reports; `docs/run-file-format.md` describes each. */
export type RunFileErrorCode =
  | 'EMPTY_FILE'
  | 'BINARY_FILE'
  | 'NO_HEADER'
  | 'DUPLICATE_COLUMN'
  | 'UNKNOWN_COLUMN'
  | 'UNKNOWN_UNIT'
  | 'MISSING_UNIT'
  | 'MISSING_CHANNEL'
  | 'CONFLICTING_CHANNELS'
  | 'INVALID_METADATA'
  | 'RAGGED_ROW'
  | 'NOT_A_NUMBER'
  | 'DECIMAL_COMMA'
  | 'OUT_OF_RANGE'
  | 'LINE_TOO_LONG'
  | 'NO_SAMPLES'
  | 'TRUNCATED'
  | 'PROFILE_MISMATCH';

/** One problem found in a run file, located by 1-based line and 1-based column (Unicode characters, BOM not counted). */
export interface RunFileIssue {
  code: RunFileErrorCode;
  /** Says what is wrong and where, starting with `file:line:column`. */
  message: string;
  fileName: string;
  line: number;
  column: number;
}

/** Thrown when a run file is invalid; carries every issue found before reading stopped. */
export class RunFileError extends Error {
  /** Issues in the order found (ascending line). */
  readonly issues: RunFileIssue[];

  constructor(issues: RunFileIssue[]) {
    const first = issues[0];
    const more = issues.length > 1 ? ` (and ${issues.length - 1} more issue${issues.length > 2 ? 's' : ''})` : '';
    super(first ? `${first.message}${more}` : 'invalid run file');
    this.name = 'RunFileError';
    this.issues = issues;
  }
}

/**
 * Builds an issue whose message starts with `file:line:column`.
 * @param code stable error code
 * @param fileName file name shown to the user
 * @param line 1-based line
 * @param column 1-based column (characters)
 * @param what description of the problem
 */
export function runFileIssue(code: RunFileErrorCode, fileName: string, line: number, column: number, what: string): RunFileIssue {
  return { code, message: `${fileName}:${line}:${column}: ${what} [${code}]`, fileName, line, column };
}
