/** Thrown when the iterative balance calibration does not converge: never a silent answer. */
export class BalanceConvergenceError extends Error {
  readonly code = 'NOT_CONVERGED';
  /** Iterations done before giving up. */
  readonly iterations: number;
  /** Largest change of a component in the last iteration, N or N·m. */
  readonly lastChange: number;

  /**
   * @param iterations - iterations done
   * @param lastChange - last largest change, N or N·m
   */
  constructor(iterations: number, lastChange: number) {
    super(
      `\`BalanceCalibration.loadsFromBridges\` requires the iteration F(k+1) = C1⁻¹[R − C2·H(F(k))] to converge; ` +
        `after ${iterations} iterations the largest change was still ${lastChange.toExponential(3)} (check the interaction matrix, the bridge zero and the capacities)`,
    );
    this.name = 'BalanceConvergenceError';
    this.iterations = iterations;
    this.lastChange = lastChange;
  }
}
