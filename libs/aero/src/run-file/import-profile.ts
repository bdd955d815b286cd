import { z } from 'zod';
import { findChannel, isExtraColumnName } from './channel-table';
import type { RunFileInput } from './read-run-file-options';
import { toBuffer } from './read-run-file';
import { RunFileError, runFileIssue } from './run-file-error';

const NUMBER_PATTERN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const CELL_PATTERN = /^([^[\]]*?)\s*(?:\[([^[\]]*)\])?$/;

/** One source column of an import profile. */
const importColumnSchema = z.object({
  /** Column name in the source file (matched trimmed and case-insensitively, without any [unit]). */
  source: z.string().trim().min(1),
  /** Canonical channel (or x_ extra name) to write; omitted keeps the source name. */
  channel: z
    .string()
    .trim()
    .refine((name) => findChannel(name) !== undefined || isExtraColumnName(name), {
      message: 'must be a canonical channel name (e.g. q, p_baro, Fx) or an extra column name starting with x_',
    })
    .optional(),
  /** Unit to write, overriding the units row or the source's own bracket. */
  unit: z.string().trim().optional(),
  /** Each value is multiplied by this before it is written (e.g. a sign flip -1 or a gain). */
  scale: z.number().finite().refine((s) => s !== 0, { message: 'must not be 0' }).optional(),
  /** Whether to leave the column out. */
  drop: z.boolean().default(false),
});

/**
 * How a file of another layout maps onto the canonical run-file format. Lines stay one-to-one, so
 * reader issues keep the source's line numbers; columns refer to the canonical line.
 */
export const importProfileSchema = z
  .object({
    name: z.string().trim().min(1),
    /** Field delimiter of the source. */
    delimiter: z.enum([',', ';', '\t', '|']).default(','),
    /** Whether numbers use a decimal comma (then the delimiter cannot be a comma). */
    decimalComma: z.boolean().default(false),
    /** Lines before the names row to skip (titles, instrument banners). */
    skipLines: z.number().int().min(0).max(1000).default(0),
    /** Whether units stand in their own row right below the names row. */
    unitsRow: z.boolean().default(false),
    columns: z.array(importColumnSchema).default([]),
    /** What to do with source columns the profile does not list. */
    unmappedColumns: z.enum(['keep', 'drop']).default('keep'),
  })
  .refine((p) => !(p.decimalComma && p.delimiter === ','), {
    message: 'decimalComma needs a delimiter other than ","',
    path: ['delimiter'],
  });

/** A validated import profile. */
export type ImportProfile = z.output<typeof importProfileSchema>;
/** An import profile as written in configuration (defaults may be omitted). */
export type ImportProfileInput = z.input<typeof importProfileSchema>;

/**
 * Validates an import profile.
 * @param value profile object, e.g. parsed from JSON
 * @throws Error listing every invalid field as `path: message`
 */
export function parseImportProfile(value: unknown): ImportProfile {
  const result = importProfileSchema.safeParse(value);
  if (result.success) return result.data;
  const details = result.error.issues.map((i) => `${i.path.join('.') || '(profile)'}: ${i.message}`).join('; ');
  throw new Error(`parseImportProfile requires a valid import profile: ${details}`);
}

/** Per source column: whether kept, the output header cell and the value transform. */
interface ColumnPlan {
  keep: boolean;
  headerCell: string;
  scale: number | undefined;
}

/**
 * Rewrites a file of another layout as canonical run-file text, line for line: skipped lines and the
 * units row become `#` comment lines, metadata and comments pass through, CRLF becomes LF, and a
 * last line without line ending stays without one (so TRUNCATED is still detected).
 * @param input the source bytes or text chunks
 * @param profile the import profile (validated here)
 * @param fileName name used in PROFILE_MISMATCH and BINARY_FILE messages
 * @returns canonical text chunks for `readRunFile`
 * @throws RunFileError PROFILE_MISMATCH when the file does not fit the profile (a listed column is
 *   absent, the units row is missing or has another number of cells), BINARY_FILE for invalid UTF-8
 * @example await readRunFile(applyImportProfile(fs.createReadStream(p), profile, 'legacy.txt'), { fileName: 'legacy.txt', onSample })
 */
export async function* applyImportProfile(input: RunFileInput, profile: ImportProfileInput, fileName = 'input'): AsyncGenerator<string> {
  const p = parseImportProfile(profile);
  const decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false });
  let lineNumber = 0;
  let rest = '';
  let plans: ColumnPlan[] | undefined;
  let names: { name: string; unit: string | undefined }[] | undefined;
  let namesLine = 0;
  let awaitingUnits = false;

  const mismatch = (line: number, what: string) => new RunFileError([runFileIssue('PROFILE_MISMATCH', fileName, line, 1, `${what} (import profile "${p.name}")`)]);

  const planColumns = (units: (string | undefined)[]): ColumnPlan[] => {
    const wanted = new Map(p.columns.map((c) => [c.source.toLowerCase(), c]));
    const found = new Set<string>();
    const result = names!.map(({ name }, i) => {
      const spec = wanted.get(name.toLowerCase());
      if (spec) found.add(spec.source.toLowerCase());
      const keep = spec ? !spec.drop : p.unmappedColumns === 'keep';
      const unit = spec?.unit ?? units[i];
      const outName = spec?.channel ?? name;
      return { keep, headerCell: unit ? `${outName} [${unit}]` : outName, scale: spec?.scale };
    });
    const missing = p.columns.filter((c) => !found.has(c.source.toLowerCase())).map((c) => `"${c.source}"`);
    if (missing.length > 0) throw mismatch(namesLine, `the names row has no column ${missing.join(', ')}`);
    return result;
  };

  const convertCell = (cell: string, plan: ColumnPlan | undefined): string => {
    let text = cell.trim();
    if (p.decimalComma) text = text.replace(',', '.');
    if (plan?.scale !== undefined && NUMBER_PATTERN.test(text)) text = String(Number(text) * plan.scale);
    return text;
  };

  const headerLine = () => plans!.filter((c) => c.keep).map((c) => c.headerCell).join(', ');

  // Returns the canonical lines for one source line: none for a names row waiting for its units
  // row, two (header and a comment) for that units row, one otherwise.
  const convertLine = (raw: string): string[] => {
    lineNumber++;
    const line = raw.endsWith('\r') ? raw.slice(0, -1) : raw;
    const trimmed = line.trim();
    if (lineNumber <= p.skipLines) return ['#'];
    if (awaitingUnits) {
      awaitingUnits = false;
      const units = line.split(p.delimiter).map((u) => u.trim().replace(/^\[(.*)\]$/, '$1').trim());
      if (units.length !== names!.length) {
        throw mismatch(lineNumber, `the units row has ${units.length} cells, the names row ${names!.length}`);
      }
      plans = planColumns(units);
      return [headerLine(), `# units row of line ${namesLine} moved into the header`];
    }
    if (trimmed === '' || trimmed.startsWith('#')) return [line];
    if (!names) {
      namesLine = lineNumber;
      names = line.split(p.delimiter).map((cell) => {
        const match = CELL_PATTERN.exec(cell.trim().replace(/^"(.*)"$/, '$1'));
        return match ? { name: match[1].trim(), unit: match[2]?.trim() } : { name: cell.trim(), unit: undefined };
      });
      if (p.unitsRow) {
        awaitingUnits = true;
        return [];
      }
      plans = planColumns(names.map((n) => n.unit));
      return [headerLine()];
    }
    const cells = line.split(p.delimiter);
    const out: string[] = [];
    for (let i = 0; i < cells.length; i++) {
      const plan = plans![i];
      if (plan && !plan.keep) continue;
      out.push(convertCell(cells[i], plan));
    }
    return [out.join(', ')];
  };

  const decode = (bytes: Buffer | undefined): string => {
    try {
      return bytes ? decoder.decode(bytes, { stream: true }) : decoder.decode();
    } catch {
      throw new RunFileError([runFileIssue('BINARY_FILE', fileName, lineNumber + 1, 1, 'invalid UTF-8 byte: a run file is UTF-8 text')]);
    }
  };

  for await (const chunk of input as AsyncIterable<Buffer | Uint8Array | string>) {
    const text = rest + decode(toBuffer(chunk));
    const cut = text.lastIndexOf('\n');
    if (cut === -1) {
      rest = text;
      continue;
    }
    rest = text.slice(cut + 1);
    const lines = text.slice(0, cut).split('\n').flatMap(convertLine);
    if (lines.length > 0) yield `${lines.join('\n')}\n`;
  }
  rest += decode(undefined);
  if (rest !== '') {
    const lines = convertLine(rest);
    if (lines.length > 0) yield lines.join('\n');
  }
  if (awaitingUnits) throw mismatch(namesLine, 'the file ends before the units row');
}
