/** A measured value with its standard uncertainty, both in the same unit. */
export interface MeasuredQuantity {
  /** Best estimate of the quantity, in its SI unit. */
  readonly value: number;
  /** Standard uncertainty u (one standard deviation), same unit, ≥ 0. */
  readonly standardUncertainty: number;
}
