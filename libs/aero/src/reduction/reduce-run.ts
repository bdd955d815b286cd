import { createHash } from 'node:crypto';
import type { ReductionConfig } from '../config';
import { AeroInputError } from '../errors';
import { readRunFile, type RunFileHeader, type RunFileInput } from '../run-file';
import { ENGINE_VERSION } from '../engine-version';
import { DESIGN_CAUTION } from './design-caution';
import { finishPoint } from './finish-point';
import { PointAccumulator } from './point-accumulator';
import { ReductionError } from './reduction-error';
import type { ReductionResult } from './reduction-result';
import type { ReductionWarning } from './reduction-warning';
import { SampleReducer } from './sample-reducer';
import { addFullScale } from './add-full-scale';
import { windAveragedDrag } from './wind-averaged-drag';

/** Options of `reduceRun`. */
export interface ReduceRunOptions {
  /** Name of the run file, used in every message. */
  fileName: string;
  /** Called after each input chunk with the bytes read so far. */
  onProgress?: (bytesRead: number) => void;
  /** Aborts the reduction; the promise then rejects with the signal's reason. */
  signal?: AbortSignal;
}

/** Frontal-area share of the section above which BRP's rule of thumb is exceeded. */
export const BLOCKAGE_RULE_OF_THUMB = 0.075;
/** Share above which the classical corrections become doubtful. */
export const BLOCKAGE_DOUBTFUL = 0.1;

/**
 * Reduces one run file: reads it as a stream, computes every per-sample quantity into per-point running
 * statistics (memory does not grow with the number of samples), then corrects and reports each point.
 *
 * @param input - the run file's bytes, e.g. `fs.createReadStream(path)`
 * @param config - a configuration from `parseReductionConfig`
 * @param options - file name, progress callback, abort signal
 * @returns engine version, input SHA-256, the configuration, every point, warnings and the design caution
 * @throws {RunFileError} when the file is malformed (each issue with file, line and column)
 * @throws {ReductionError} `ZERO_WIND`, `NOT_CONVERGED`, … located at the line of the sample
 * @example
 * const result = await reduceRun(fs.createReadStream('run-12.csv'), parseReductionConfig(json), { fileName: 'run-12.csv' });
 */
export async function reduceRun(input: RunFileInput, config: ReductionConfig, options: ReduceRunOptions): Promise<ReductionResult> {
  const { fileName, onProgress, signal } = options;
  const hash = createHash('sha256');
  const points = new Map<number, PointAccumulator>();
  let reducer: SampleReducer | undefined;
  let header: RunFileHeader | undefined;
  let current: PointAccumulator | undefined;

  const summary = await readRunFile(hashing(input, hash), {
    fileName,
    onProgress,
    signal,
    onHeader: (h) => {
      header = h;
      reducer = new SampleReducer(config, h);
    },
    onSample: (sample) => {
      const r = reducer as SampleReducer;
      r.reduce(sample);
      if (current?.point !== sample.point) {
        current = points.get(sample.point);
        if (!current) {
          current = new PointAccumulator(sample.point);
          points.set(sample.point, current);
        }
      }
      current.push(r.values, sample.line, r.outsideCipmValidity, r.overCapacity);
    },
  });
  const h = header ?? summary.header;
  const warnings: ReductionWarning[] = runWarnings(config);
  const context = { config, dynamicPressureFactor: reducer?.dynamicPressureFactor ?? NaN, warnings };
  const results = [...points.values()]
    .sort((a, b) => a.point - b.point)
    .map((accumulator) => {
      try {
        return addFullScale(finishPoint(accumulator, context), config);
      } catch (error) {
        if (error instanceof AeroInputError) {
          const code = error.code === 'ZERO_WIND' ? 'ZERO_WIND' : 'BAD_VALUE';
          throw new ReductionError(code, `${code} point ${accumulator.point} (lines ${accumulator.firstLine}–${accumulator.lastLine}): ${error.message}`, fileName, accumulator.firstLine, 1);
        }
        throw error;
      }
    });
  let windAveraged: ReductionResult['windAveraged'];
  try {
    windAveraged = windAveragedDrag(results, config);
  } catch (error) {
    if (!(error instanceof AeroInputError)) throw error;
    throw new ReductionError('NOT_COVERED', `NOT_COVERED windAveraging: ${error.message}`, fileName, h.headerLine, 1);
  }
  return {
    engineVersion: ENGINE_VERSION,
    inputSha256: hash.digest('hex'),
    fileName,
    sampleCount: summary.sampleCount,
    metadata: h.metadata,
    loadKind: h.loadKind,
    pressureKind: h.pressureKind,
    dynamicPressureFactor: h.pressureKind === 'reference' ? context.dynamicPressureFactor : null,
    config,
    points: results,
    ...(windAveraged ? { windAveraged } : {}),
    warnings,
    caution: DESIGN_CAUTION,
  };
}

/** Passes the input through unchanged while feeding every byte to the hash. */
async function* hashing(input: RunFileInput, hash: ReturnType<typeof createHash>): AsyncGenerator<Buffer | Uint8Array> {
  for await (const chunk of input as AsyncIterable<Buffer | Uint8Array | string>) {
    const bytes = typeof chunk === 'string' ? Buffer.from(chunk, 'utf8') : chunk;
    hash.update(bytes);
    yield bytes;
  }
}

/** Warnings that concern the whole run: blockage against the rules of thumb. */
function runWarnings(config: ReductionConfig): ReductionWarning[] {
  const { article, tunnel } = config;
  const frontal = article.frontalArea ?? (article.referenceAreaKind === 'frontal' ? article.referenceArea : undefined);
  if (frontal === undefined) {
    return [{ code: 'BLOCKAGE_UNKNOWN', message: 'no frontal area is configured (article.frontalArea), so blockage was not checked against the rules of thumb' }];
  }
  const share = frontal / tunnel.sectionArea;
  const percent = (share * 100).toFixed(2);
  if (share > BLOCKAGE_DOUBTFUL) {
    return [{ code: 'BLOCKAGE_OVER_10', message: `frontal area is ${percent} % of the section area: above about 10 % the classical blockage corrections become doubtful` }];
  }
  if (share > BLOCKAGE_RULE_OF_THUMB) {
    return [{ code: 'BLOCKAGE_OVER_7_5', message: `frontal area is ${percent} % of the section area, above the 7.5 % rule of thumb of Barlow, Rae & Pope` }];
  }
  return [];
}
