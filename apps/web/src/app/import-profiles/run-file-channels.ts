/** One column Tunnelwright's run-file format knows, as offered when a profile renames a column. */
export interface RunFileChannel {
  /** The canonical column name written in the header row. */
  readonly id: string;
  /** What the column holds, in words. */
  readonly meaning: string;
}

/**
 * The canonical channels of a run file, in the order of the format's channel table
 * (`libs/aero/src/run-file/channel-table.ts`; the spec beside this file checks that both name the same channels).
 * The client keeps its own copy because it never imports the numeric library.
 */
export const RUN_FILE_CHANNELS: readonly RunFileChannel[] = [
  { id: 'time', meaning: 'time' },
  { id: 'point', meaning: 'set-condition number' },
  { id: 'yaw', meaning: 'yaw angle' },
  { id: 'pitch', meaning: 'pitch angle' },
  { id: 'q', meaning: 'dynamic pressure' },
  { id: 'dp_ref', meaning: 'reference pressure difference' },
  { id: 'p_baro', meaning: 'barometric pressure' },
  { id: 'T_air', meaning: 'air temperature' },
  { id: 'RH', meaning: 'relative humidity' },
  { id: 'V', meaning: 'air speed (for information)' },
  { id: 'Fx', meaning: 'balance force x' },
  { id: 'Fy', meaning: 'balance force y' },
  { id: 'Fz', meaning: 'balance force z' },
  { id: 'Mx', meaning: 'balance moment x' },
  { id: 'My', meaning: 'balance moment y' },
  { id: 'Mz', meaning: 'balance moment z' },
  { id: 'R1', meaning: 'bridge output 1' },
  { id: 'R2', meaning: 'bridge output 2' },
  { id: 'R3', meaning: 'bridge output 3' },
  { id: 'R4', meaning: 'bridge output 4' },
  { id: 'R5', meaning: 'bridge output 5' },
  { id: 'R6', meaning: 'bridge output 6' },
];

/** Prefix of an extra column: kept in the header, its cells are not read. */
export const EXTRA_COLUMN_PREFIX = 'x_';
