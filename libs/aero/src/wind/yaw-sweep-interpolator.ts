import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite } from '../errors/require-number';

/** One measured point of a yaw sweep. */
export interface YawSweepPoint {
  /** Yaw angle ψ, rad. */
  readonly yawAngle: number;
  /** Body-axis drag coefficient measured at that yaw (dimensionless). */
  readonly dragCoefficient: number;
}

/** A yaw sweep turned into a symmetric C_D(|ψ|) for wind averaging. */
export interface YawSweepInterpolator {
  /** Drag coefficient at yaw ψ (rad), linear between measured points; uses |ψ|. */
  readonly dragCoefficientAtYaw: (yawAngle: number) => number;
  /** Largest |ψ| the sweep covers on the side(s) used, rad. */
  readonly coveredYawAngle: number;
  /** Whether only one side was measured, so it was mirrored for the other. */
  readonly mirrored: boolean;
}

/**
 * Sorts a sweep by yaw and replaces repeat points at one yaw by their mean C_D.
 *
 * @param points - checked sweep points, yaw in rad
 * @returns distinct yaw angles, rising, each with its mean drag coefficient
 */
function collapseRepeats(points: readonly YawSweepPoint[]): YawSweepPoint[] {
  const sorted = [...points].sort((a, b) => a.yawAngle - b.yawAngle);
  const result: { yawAngle: number; sum: number; count: number }[] = [];
  for (const point of sorted) {
    const last = result[result.length - 1];
    if (last && last.yawAngle === point.yawAngle) {
      last.sum += point.dragCoefficient;
      last.count++;
    } else {
      result.push({ yawAngle: point.yawAngle, sum: point.dragCoefficient, count: 1 });
    }
  }
  return result.map((r) => ({ yawAngle: r.yawAngle, dragCoefficient: r.sum / r.count }));
}

/**
 * Linear interpolation of C_D in a sorted table of one side of the sweep.
 *
 * @param table - points with yaw (rad) rising from 0, at least one
 * @param x - yaw to evaluate, rad, inside the table (the caller checks)
 * @returns interpolated drag coefficient
 */
function interpolate(table: readonly YawSweepPoint[], x: number): number {
  if (table.length === 1) return table[0].dragCoefficient;
  let i = 0;
  while (i < table.length - 2 && table[i + 1].yawAngle < x) i++;
  const a = table[i];
  const b = table[i + 1];
  return a.dragCoefficient + ((x - a.yawAngle) / (b.yawAngle - a.yawAngle)) * (b.dragCoefficient - a.dragCoefficient);
}

/**
 * Builds a symmetric C_D(ψ) from a measured yaw sweep: linear between points, repeat points averaged.
 * With both signs of yaw measured, C_D(ψ) = ½[C_D(+|ψ|) + C_D(−|ψ|)] (wind equally likely from either side); with
 * one side only, that side is mirrored. Outside the covered range it throws; check `coveredYawAngle` first.
 *
 * Source: symmetric wind averaging of SAE J1252 (from memory); linear interpolation is common practice.
 *
 * @param points - measured { yawAngle (rad), dragCoefficient } in any order, at least one
 * @returns the interpolating function, the covered |ψ| and whether the sweep was mirrored
 * @throws {AeroInputError} `EMPTY_INPUT` for no points; `NOT_FINITE` for a NaN or infinite value, naming the point
 * @example
 * yawSweepInterpolator([{ yawAngle: 0, dragCoefficient: 0.5 }, { yawAngle: 0.2, dragCoefficient: 0.6 }]).dragCoefficientAtYaw(-0.1); // 0.55
 */
export function yawSweepInterpolator(points: readonly YawSweepPoint[]): YawSweepInterpolator {
  const fn = 'yawSweepInterpolator';
  if (points.length === 0) throw new AeroInputError('EMPTY_INPUT', `\`${fn}\` requires at least one measured yaw point; got none`);
  points.forEach((point, index) => {
    requireFinite(fn, `yaw angle at point ${index}`, point.yawAngle, 'rad');
    requireFinite(fn, `drag coefficient at point ${index}`, point.dragCoefficient, '');
  });
  const table = collapseRepeats(points);
  const positive = table.filter((p) => p.yawAngle >= 0);
  const negative = table.filter((p) => p.yawAngle <= 0).map((p) => ({ yawAngle: -p.yawAngle, dragCoefficient: p.dragCoefficient })).reverse();
  const hasPositive = positive.some((p) => p.yawAngle > 0);
  const hasNegative = negative.some((p) => p.yawAngle > 0);
  const sides = hasPositive && hasNegative ? [positive, negative] : [hasNegative ? negative : positive];
  // Each side must start at ψ = 0 to be usable from zero yaw; a side starting later covers nothing.
  const covered = (side: YawSweepPoint[]) => (side.length > 0 && side[0].yawAngle === 0 ? side[side.length - 1].yawAngle : -1);
  const coveredYawAngle = Math.min(...sides.map(covered));
  const dragCoefficientAtYaw = (yawAngle: number): number => {
    const x = Math.abs(yawAngle);
    if (!(x <= coveredYawAngle)) {
      throw new AeroInputError('NOT_COVERED', `\`${fn}\` requires a yaw inside the measured sweep (|ψ| ≤ ${coveredYawAngle} rad); got ${yawAngle} rad`);
    }
    return sides.reduce((sum, side) => sum + interpolate(side, x), 0) / sides.length;
  };
  return { dragCoefficientAtYaw, coveredYawAngle, mirrored: sides.length === 1 };
}
