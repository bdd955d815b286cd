import type { ChannelId } from './channel-id';

/** Physical range a channel's SI value must lie in, with the range as shown in messages. */
export interface ValueRange {
  min: number;
  max: number;
  /** Completes "it must be …", e.g. `within 30 kPa … 120 kPa`. */
  text: string;
}

// Bounds get a slack of one part in 1e12 so that an edge value written in another unit
// (e.g. -40 degC = 233.15 K) is not rejected by a rounding error of the conversion.
function range(min: number, max: number, text: string): ValueRange {
  return { min: min - Math.abs(min) * 1e-12, max: max + Math.abs(max) * 1e-12, text };
}

const ANGLE = range(-2 * Math.PI, 2 * Math.PI, 'within -360 deg … 360 deg');

/**
 * Plausibility ranges of the run-file channels, in SI (common practice for a low-speed tunnel
 * hall: barometric 30–120 kPa, air −40…+80 °C). Channels not listed accept any finite value.
 */
export const VALUE_RANGES: Partial<Record<ChannelId, ValueRange>> = {
  yaw: ANGLE,
  pitch: ANGLE,
  q: range(0, Infinity, '≥ 0 Pa'),
  dp_ref: range(0, Infinity, '≥ 0 Pa'),
  p_baro: range(30_000, 120_000, 'within 30 kPa … 120 kPa'),
  T_air: range(233.15, 353.15, 'within -40 degC … 80 degC'),
  RH: range(0, 1, 'within 0 % … 100 %'),
  V: range(0, Infinity, '≥ 0 m/s'),
  point: range(0, Number.MAX_SAFE_INTEGER, 'a whole number ≥ 0'),
};
