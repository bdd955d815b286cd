import { createReadStream } from 'node:fs';
import { applyImportProfile, readRunFile, RunFileError, type ImportProfile, type RunFileHeader } from '@tunnelwright/aero';
import type { Preview } from '@tunnelwright/contracts';

/** How many rows a preview shows. */
export const previewRowCount = 20;

/**
 * Reads a spooled upload with the run-file reader and reports what it understood: the header, the first
 * rows (SI units), the number of rows and points, or every issue found with its line and column. With an
 * import profile the file is first rewritten by it, line for line, so issues keep the file's line numbers.
 */
export async function previewUpload(path: string, fileName: string, profile?: ImportProfile): Promise<Preview> {
  let header: RunFileHeader | undefined;
  const firstSamples: Record<string, unknown>[] = [];
  const points = new Set<number>();
  let sampleCount = 0;
  const describeHeader = (h: RunFileHeader) => ({
    metadata: h.metadata,
    columns: h.columns.map((c) => ({ name: c.name, unit: c.unit, channel: c.channel, siUnit: c.siUnit })),
    loadKind: h.loadKind,
    pressureKind: h.pressureKind,
    delimiter: h.delimiter,
  });
  try {
    const bytes = createReadStream(path);
    await readRunFile(profile ? applyImportProfile(bytes, profile, fileName) : bytes, {
      fileName,
      onHeader: (h) => {
        header = h;
      },
      onSample: (sample) => {
        sampleCount += 1;
        points.add(sample.point);
        if (firstSamples.length < previewRowCount) {
          // The reader reuses its sample object; copy what is kept.
          firstSamples.push({ ...sample, loads: Array.from(sample.loads), bridges: Array.from(sample.bridges) });
        }
      },
    });
    return { fileName, valid: true, header: header ? describeHeader(header) : null, sampleCount, pointCount: points.size, firstSamples, issues: [] };
  } catch (error) {
    if (!(error instanceof RunFileError)) throw error;
    return { fileName, valid: false, header: header ? describeHeader(header) : null, sampleCount, pointCount: points.size, firstSamples, issues: error.issues };
  }
}
