import { BalanceConvergenceError } from './balance-convergence-error';
import { INTERACTION_TERM_COUNT, interactionTerms } from './interaction-terms';
import { invertMatrix } from './invert-matrix';

/** The calibration of a six-component balance as stored in a reduction configuration. */
export interface BalanceCalibrationInput {
  /** C1, 6×6: bridge i in mV/V per N or N·m of component j. */
  linear: readonly (readonly number[])[];
  /** C2, 6×21 on H(F) (see `interactionTerms`); absent for a linear balance. */
  interaction?: readonly (readonly number[])[];
  /** Relative tolerance: |ΔF_i| ≤ tolerance·max(|F_i|, 1). */
  tolerance: number;
  /** Iteration limit. */
  maxIterations: number;
}

/**
 * Loads from the bridge outputs of a six-component balance, iterative method.
 *
 * The calibration is R = C1·F + C2·H(F). Loads are found by F(0) = C1⁻¹R, then
 * F(k+1) = C1⁻¹[R − C2·H(F(k))] until no component changes by more than tolerance·max(|F_i|, 1 N or N·m).
 * Without C2 it is the linear case F = C1⁻¹R. C1⁻¹ is computed once; solving allocates nothing.
 * Source: AIAA R-091-2003; Ulbrich, NASA NTRS 20120006665 (iterative method).
 *
 * @example
 * const cal = new BalanceCalibration({ linear: identity6, tolerance: 1e-12, maxIterations: 50 });
 * cal.loadsFromBridges(bridges, loads); // loads now holds F in N and N·m
 */
export class BalanceCalibration {
  private readonly inverse: Float64Array;
  private readonly interaction: Float64Array | undefined;
  private readonly terms = new Float64Array(INTERACTION_TERM_COUNT);
  private readonly rhs = new Float64Array(6);
  private readonly next = new Float64Array(6);
  private readonly tolerance: number;
  private readonly maxIterations: number;
  /** Iterations used by the last solve (0 for a linear balance). */
  lastIterations = 0;

  /**
   * @param input - C1, optional C2, tolerance and iteration limit
   * @throws {RangeError} when C1 is not 6×6, singular, or C2 is not 6×21
   */
  constructor(input: BalanceCalibrationInput) {
    if (input.linear.length !== 6 || input.linear.some((row) => row.length !== 6)) throw new RangeError('`BalanceCalibration` requires a 6×6 linear matrix C1');
    this.inverse = invertMatrix(input.linear);
    if (input.interaction) {
      if (input.interaction.length !== 6 || input.interaction.some((row) => row.length !== INTERACTION_TERM_COUNT)) {
        throw new RangeError(`\`BalanceCalibration\` requires a 6×${INTERACTION_TERM_COUNT} interaction matrix C2`);
      }
      this.interaction = Float64Array.from(input.interaction.flat());
    }
    this.tolerance = input.tolerance;
    this.maxIterations = input.maxIterations;
  }

  /**
   * @param bridges - R1…R6, mV/V (wind-off zero already removed)
   * @param out - receives F1…F6, N and N·m
   * @returns `out`
   * @throws {BalanceConvergenceError} when the iteration does not converge within the limit
   */
  loadsFromBridges(bridges: ArrayLike<number>, out: Float64Array): Float64Array {
    const { inverse, interaction, terms, rhs, next } = this;
    multiply6(inverse, bridges, out);
    this.lastIterations = 0;
    if (!interaction) return out;
    let change = Infinity;
    for (let k = 1; k <= this.maxIterations; k++) {
      interactionTerms(out, terms);
      for (let i = 0; i < 6; i++) {
        let sum = bridges[i];
        const base = i * INTERACTION_TERM_COUNT;
        for (let j = 0; j < INTERACTION_TERM_COUNT; j++) sum -= interaction[base + j] * terms[j];
        rhs[i] = sum;
      }
      multiply6(inverse, rhs, next);
      let converged = true;
      change = 0;
      for (let i = 0; i < 6; i++) {
        const delta = Math.abs(next[i] - out[i]);
        if (!(delta <= this.tolerance * Math.max(Math.abs(next[i]), 1))) converged = false;
        change = Math.max(change, delta);
        out[i] = next[i];
      }
      if (converged) {
        this.lastIterations = k;
        return out;
      }
    }
    throw new BalanceConvergenceError(this.maxIterations, change);
  }
}

/** out = M·v for a row-major 6×6 matrix. */
function multiply6(matrix: Float64Array, vector: ArrayLike<number>, out: Float64Array): void {
  for (let i = 0; i < 6; i++) {
    let sum = 0;
    for (let j = 0; j < 6; j++) sum += matrix[i * 6 + j] * vector[j];
    out[i] = sum;
  }
}
