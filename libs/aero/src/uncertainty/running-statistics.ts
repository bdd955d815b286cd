import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite } from '../errors/require-number';

/**
 * Mean, sample variance, minimum and maximum of a stream of readings in constant memory (Welford's update).
 *
 * For each new x: n ← n + 1; δ = x − x̄; x̄ ← x̄ + δ/n; M2 ← M2 + δ·(x − x̄). Then s² = M2/(n − 1).
 *
 * Source: Welford 1962, "Note on a method for calculating corrected sums of squares and products",
 * Technometrics 4(3):419–420; Knuth, TAOCP vol. 2, 4.2.2 (pages and section from memory).
 *
 * @example
 * const stats = new RunningStatistics();
 * for (const x of [1, 2, 3]) stats.push(x);
 * stats.mean; // 2
 * stats.variance; // 1
 */
export class RunningStatistics {
  private count = 0;
  private runningMean = 0;
  private sumOfSquares = 0;
  private smallest = Number.POSITIVE_INFINITY;
  private largest = Number.NEGATIVE_INFINITY;

  /**
   * Adds one reading.
   *
   * @param x - the reading, any one unit
   * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, so one bad sample cannot poison the totals
   */
  push(x: number): void {
    requireFinite('RunningStatistics.push', `reading number ${this.count + 1}`, x, '');
    this.count++;
    const delta = x - this.runningMean;
    this.runningMean += delta / this.count;
    this.sumOfSquares += delta * (x - this.runningMean);
    if (x < this.smallest) this.smallest = x;
    if (x > this.largest) this.largest = x;
  }

  /** Number of readings so far. */
  get n(): number {
    return this.count;
  }

  /** Arithmetic mean; throws `EMPTY_INPUT` before the first reading. */
  get mean(): number {
    this.requireReadings('mean', 1);
    return this.runningMean;
  }

  /** Sample variance s² (n − 1 denominator); throws `EMPTY_INPUT` with fewer than two readings. */
  get variance(): number {
    this.requireReadings('variance', 2);
    return this.sumOfSquares / (this.count - 1);
  }

  /** Sample standard deviation s. */
  get standardDeviation(): number {
    return Math.sqrt(this.variance);
  }

  /** Standard error of the mean s/√n (GUM Type A standard uncertainty, JCGM 100:2008 4.2.3). */
  get standardError(): number {
    return this.standardDeviation / Math.sqrt(this.count);
  }

  /** Smallest reading; throws `EMPTY_INPUT` before the first reading. */
  get min(): number {
    this.requireReadings('min', 1);
    return this.smallest;
  }

  /** Largest reading; throws `EMPTY_INPUT` before the first reading. */
  get max(): number {
    this.requireReadings('max', 1);
    return this.largest;
  }

  private requireReadings(what: string, needed: number): void {
    if (this.count < needed) {
      throw new AeroInputError('EMPTY_INPUT', `\`RunningStatistics.${what}\` requires at least ${needed} reading${needed > 1 ? 's' : ''}; got ${this.count}`);
    }
  }
}
