import type { QuantityKind } from '../units';
import type { ChannelId } from './channel-id';

/** How one canonical channel is named and measured. */
export interface ChannelDefinition {
  id: Exclude<ChannelId, 'extra'>;
  /** Other accepted names (matched case-insensitively, like the id). */
  aliases: readonly string[];
  kind: QuantityKind;
}

/** Every canonical channel with its accepted aliases. */
export const CHANNEL_TABLE: readonly ChannelDefinition[] = [
  { id: 'time', aliases: ['time_s', 'elapsed'], kind: 'time' },
  { id: 'point', aliases: ['pt', 'set_point', 'setpoint'], kind: 'count' },
  { id: 'yaw', aliases: ['yaw_angle', 'psi'], kind: 'angle' },
  { id: 'pitch', aliases: ['pitch_angle', 'theta'], kind: 'angle' },
  { id: 'q', aliases: ['q_dyn', 'dynamic_pressure'], kind: 'pressure' },
  { id: 'dp_ref', aliases: ['delta_p_ref', 'dpref', 'reference_pressure_difference'], kind: 'pressure' },
  { id: 'p_baro', aliases: ['p_bar', 'p_atm', 'pbaro', 'barometric_pressure'], kind: 'pressure' },
  { id: 'T_air', aliases: ['t_amb', 'tair', 'air_temperature', 'temperature'], kind: 'temperature' },
  { id: 'RH', aliases: ['rel_humidity', 'relative_humidity', 'humidity'], kind: 'fraction' },
  { id: 'V', aliases: ['speed', 'velocity'], kind: 'speed' },
  { id: 'Fx', aliases: [], kind: 'force' },
  { id: 'Fy', aliases: [], kind: 'force' },
  { id: 'Fz', aliases: [], kind: 'force' },
  { id: 'Mx', aliases: [], kind: 'moment' },
  { id: 'My', aliases: [], kind: 'moment' },
  { id: 'Mz', aliases: [], kind: 'moment' },
  { id: 'R1', aliases: ['bridge1'], kind: 'bridge' },
  { id: 'R2', aliases: ['bridge2'], kind: 'bridge' },
  { id: 'R3', aliases: ['bridge3'], kind: 'bridge' },
  { id: 'R4', aliases: ['bridge4'], kind: 'bridge' },
  { id: 'R5', aliases: ['bridge5'], kind: 'bridge' },
  { id: 'R6', aliases: ['bridge6'], kind: 'bridge' },
];

/** Prefix that marks an extra column: kept in the header, its cells are not read. */
export const EXTRA_COLUMN_PREFIX = 'x_';

const CHANNEL_INDEX = new Map<string, ChannelDefinition>();
for (const definition of CHANNEL_TABLE) {
  for (const name of [definition.id, ...definition.aliases]) CHANNEL_INDEX.set(name.toLowerCase(), definition);
}

/**
 * Finds the canonical channel for a column name (case-insensitive, surrounding spaces ignored).
 * @param name column name without its unit
 * @returns the channel, or undefined for an unknown name
 */
export function findChannel(name: string): ChannelDefinition | undefined {
  return CHANNEL_INDEX.get(name.trim().toLowerCase());
}

/**
 * Whether a column name marks an extra column (starts with `x_`, any case).
 * @param name column name without its unit
 */
export function isExtraColumnName(name: string): boolean {
  return name.trim().toLowerCase().startsWith(EXTRA_COLUMN_PREFIX);
}
