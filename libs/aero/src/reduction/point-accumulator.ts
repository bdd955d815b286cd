import { ChannelStatistics } from './channel-statistics';
import { SAMPLE_CHANNELS } from './sample-channels';

/** Running statistics of every channel of one point; memory does not grow with the number of samples. */
export class PointAccumulator {
  /** Running statistics of every channel of `SAMPLE_CHANNELS`. */
  readonly statistics = new ChannelStatistics(SAMPLE_CHANNELS.length);
  sampleCount = 0;
  firstLine = 0;
  lastLine = 0;
  /** Samples whose air state lay outside the CIPM-2007 range. */
  outsideCipmValidity = 0;
  /** Samples with a component over its capacity. */
  overCapacity = 0;

  /**
   * @param point - the set-condition number
   */
  constructor(readonly point: number) {}

  /**
   * Adds one sample's values.
   * @param values - channel values, indexed as `SAMPLE_CHANNELS`
   * @param line - 1-based line of the sample
   * @param outsideCipm - whether the air state was outside the CIPM-2007 range
   * @param overCapacity - whether a component exceeded its capacity
   */
  push(values: Float64Array, line: number, outsideCipm: boolean, overCapacity: boolean): void {
    this.statistics.push(values);
    if (this.sampleCount === 0) this.firstLine = line;
    this.lastLine = line;
    this.sampleCount++;
    if (outsideCipm) this.outsideCipmValidity++;
    if (overCapacity) this.overCapacity++;
  }
}
