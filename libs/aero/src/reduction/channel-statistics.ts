import { AeroInputError } from '../errors';

/**
 * Running mean and variance of many channels at once, Welford's one-pass update, in flat Float64Arrays.
 *
 * For each channel: n ← n + 1; δ = x − m; m ← m + δ/n; M2 ← M2 + δ·(x − m); s² = M2/(n − 1).
 * Source: Welford, *Technometrics* 4(3):419–420, 1962; Knuth, TAOCP vol. 2, 3rd ed., §4.2.2.
 * It gives the same figures as `RunningStatistics` (a spec checks this) but pushes a whole sample in one
 * call without allocating, which the per-sample path of `reduceRun` needs.
 *
 * @example
 * const stats = new ChannelStatistics(2);
 * stats.push(Float64Array.of(1, 10)); stats.push(Float64Array.of(3, 30));
 * stats.mean(0); // 2
 */
export class ChannelStatistics {
  private count = 0;
  private readonly means: Float64Array;
  private readonly sums: Float64Array;

  /**
   * @param channels - number of channels
   */
  constructor(readonly channels: number) {
    this.means = new Float64Array(channels);
    this.sums = new Float64Array(channels);
  }

  /** Number of samples pushed. */
  get n(): number {
    return this.count;
  }

  /**
   * Adds one sample: one value per channel.
   * @param values - at least `channels` values, any units
   * @throws {AeroInputError} `NOT_FINITE` when a value is NaN or ±Infinity (naming the channel index)
   */
  push(values: ArrayLike<number>): void {
    const { means, sums, channels } = this;
    const n = ++this.count;
    const weight = 1 / n;
    for (let i = 0; i < channels; i++) {
      const x = values[i];
      if (!Number.isFinite(x)) {
        this.count--;
        throw new AeroInputError('NOT_FINITE', `\`ChannelStatistics.push\` requires finite values; got ${x} in channel ${i}`);
      }
      const delta = x - means[i];
      means[i] += delta * weight;
      sums[i] += delta * (x - means[i]);
    }
  }

  /**
   * @param channel - channel index
   * @returns the mean (NaN before the first sample)
   */
  mean(channel: number): number {
    return this.count > 0 ? this.means[channel] : NaN;
  }

  /**
   * @param channel - channel index
   * @returns the sample standard deviation s (n − 1 denominator); 0 with fewer than two samples
   */
  standardDeviation(channel: number): number {
    return this.count > 1 ? Math.sqrt(Math.max(0, this.sums[channel]) / (this.count - 1)) : 0;
  }

  /**
   * @param channel - channel index
   * @returns the standard error s/√n (GUM Type A, JCGM 100:2008 §4.2.3); 0 with fewer than two samples
   */
  standardError(channel: number): number {
    return this.count > 1 ? this.standardDeviation(channel) / Math.sqrt(this.count) : 0;
  }
}
