/**
 * Canonical channel identifiers of a Tunnelwright run file. Each identifier is also the canonical
 * column name written in the header row (matched case-insensitively, see `channel-table.ts`).
 *
 * - `time` s, `point` set-condition number, `yaw` / `pitch` rad,
 * - `q` dynamic pressure Pa, `dp_ref` reference pressure difference Pa, `p_baro` barometric pressure Pa,
 * - `T_air` air temperature K, `RH` relative humidity (fraction 0..1), `V` informational speed m/s,
 * - `Fx` `Fy` `Fz` N and `Mx` `My` `Mz` N·m in balance axes, or `R1`…`R6` bridge outputs mV/V,
 * - `extra`: a column whose name starts with `x_`, carried in the header and otherwise ignored.
 */
export type ChannelId =
  | 'time'
  | 'point'
  | 'yaw'
  | 'pitch'
  | 'q'
  | 'dp_ref'
  | 'p_baro'
  | 'T_air'
  | 'RH'
  | 'V'
  | 'Fx'
  | 'Fy'
  | 'Fz'
  | 'Mx'
  | 'My'
  | 'Mz'
  | 'R1'
  | 'R2'
  | 'R3'
  | 'R4'
  | 'R5'
  | 'R6'
  | 'extra';

/** The six load channels in `RunSample.loads` order. */
export const LOAD_CHANNELS = ['Fx', 'Fy', 'Fz', 'Mx', 'My', 'Mz'] as const satisfies readonly ChannelId[];

/** The six bridge channels in `RunSample.bridges` order. */
export const BRIDGE_CHANNELS = ['R1', 'R2', 'R3', 'R4', 'R5', 'R6'] as const satisfies readonly ChannelId[];
