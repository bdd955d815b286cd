import { parseUnit, SI_UNIT_OF_KIND, unitSymbolsOfKind, type UnitDefinition } from '../units';
import { BRIDGE_CHANNELS, LOAD_CHANNELS, type ChannelId } from './channel-id';
import { CHANNEL_TABLE, findChannel, isExtraColumnName } from './channel-table';
import { runFileIssue, type RunFileIssue } from './run-file-error';
import type { RunFileColumn, RunFileHeader } from './run-file-header';

/** A header row as understood, with the unit of each column for conversion. */
export interface ParsedHeaderRow {
  columns: RunFileColumn[];
  /** Unit of each column (undefined for extra columns, whose cells are not read). */
  units: (UnitDefinition | undefined)[];
  delimiter: RunFileHeader['delimiter'];
  loadKind: RunFileHeader['loadKind'];
  pressureKind: RunFileHeader['pressureKind'];
}

/** Channels every run file must have (besides one pressure and one load set). */
const ALWAYS_REQUIRED: readonly ChannelId[] = ['point', 'yaw', 'pitch', 'p_baro', 'T_air', 'RH'];

const NUMBER_PATTERN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const CELL_PATTERN = /^([^[\]]*?)\s*(?:\[([^[\]]*)\])?$/;

/**
 * Picks the field delimiter of a header row: `;` when the row contains a semicolon and no comma,
 * `,` otherwise.
 * @param line header row text
 */
export function detectDelimiter(line: string): ',' | ';' {
  return line.includes(';') && !line.includes(',') ? ';' : ',';
}

/** 1-based column of a UTF-16 offset, counted in code points. */
function columnOf(line: string, offset: number, firstColumn: number): number {
  let count = 0;
  for (let i = 0; i < offset; i++) {
    const code = line.charCodeAt(i);
    // Count a surrogate pair once.
    if (code < 0xdc00 || code > 0xdfff) count++;
  }
  return firstColumn + count;
}

/**
 * Reads the header row: column names with units in brackets, e.g. `q [Pa]`.
 * @param line header row text without line ending or BOM
 * @param lineNumber 1-based line of the row
 * @param fileName file name for messages
 * @param firstColumn column number of the first character of `line` (1)
 * @returns the parsed row, or the issues that make it unusable
 */
export function parseHeaderRow(
  line: string,
  lineNumber: number,
  fileName: string,
  firstColumn = 1,
): { row: ParsedHeaderRow; issues: [] } | { row?: undefined; issues: RunFileIssue[] } {
  const delimiter = detectDelimiter(line);
  const issues: RunFileIssue[] = [];
  const issue = (code: RunFileIssue['code'], offset: number, what: string) =>
    issues.push(runFileIssue(code, fileName, lineNumber, columnOf(line, offset, firstColumn), what));

  const columns: RunFileColumn[] = [];
  const units: (UnitDefinition | undefined)[] = [];
  const seen = new Map<string, number>();
  let offset = 0;
  const cells = line.split(delimiter);
  for (let index = 0; index < cells.length; index++) {
    const raw = cells[index];
    const lead = raw.length - raw.trimStart().length;
    const cellOffset = offset + lead;
    offset += raw.length + 1;
    let text = raw.trim();
    if (text.length >= 2 && text.startsWith('"') && text.endsWith('"')) text = text.slice(1, -1).trim();
    if (index === 0 && NUMBER_PATTERN.test(text)) {
      issues.push(
        runFileIssue('NO_HEADER', fileName, lineNumber, firstColumn,
          `line ${lineNumber} looks like a data row; expected a header row of channel names with units, e.g. "time [s], point, yaw [deg], …"`),
      );
      return { issues };
    }
    const match = CELL_PATTERN.exec(text);
    if (!match) {
      issue('MISSING_UNIT', cellOffset, `column ${index + 1} "${text}": cannot read the unit; write it as name [unit], e.g. "q [Pa]"`);
      continue;
    }
    const name = match[1].trim();
    const unitText = match[2];
    if (name === '') {
      issue('UNKNOWN_COLUMN', cellOffset, `column ${index + 1} has no name`);
      continue;
    }
    const extra = isExtraColumnName(name);
    const definition = extra ? undefined : findChannel(name);
    if (!extra && !definition) {
      issue('UNKNOWN_COLUMN', cellOffset,
        `unknown column "${name}"; expected one of ${CHANNEL_TABLE.map((d) => d.id).join(', ')}, or an extra column named x_…`);
      continue;
    }
    const key = extra ? `extra:${name.toLowerCase()}` : definition!.id;
    const previous = seen.get(key);
    if (previous !== undefined) {
      issue('DUPLICATE_COLUMN', cellOffset, `column "${name}" repeats ${extra ? 'the extra column' : `channel ${key}`} of column ${previous + 1}`);
      continue;
    }
    seen.set(key, index);
    if (extra) {
      columns.push({ index, name, unit: unitText?.trim() ?? '', channel: 'extra', siUnit: unitText?.trim() ?? '' });
      units.push(undefined);
      continue;
    }
    const kind = definition!.kind;
    if (unitText === undefined && kind !== 'count') {
      issue('MISSING_UNIT', cellOffset, `column "${name}" needs a unit in brackets, one of ${unitSymbolsOfKind(kind).join(', ')}`);
      continue;
    }
    const unit = parseUnit(unitText ?? '', kind);
    if (!unit) {
      issue('UNKNOWN_UNIT', cellOffset,
        `unit "${unitText}" of column "${name}" is not a ${kind} unit; accepted: ${unitSymbolsOfKind(kind).join(', ')}`);
      continue;
    }
    columns.push({ index, name, unit: unitText?.trim() ?? '', channel: definition!.id, siUnit: SI_UNIT_OF_KIND[kind] });
    units.push(unit);
  }
  if (issues.length > 0) return { issues };

  const has = (id: ChannelId) => seen.has(id);
  const atColumn = (id: ChannelId) => {
    const index = seen.get(id) ?? 0;
    const lead = cells[index].length - cells[index].trimStart().length;
    return cells.slice(0, index).reduce((sum, cell) => sum + cell.length + 1, lead);
  };
  for (const id of ALWAYS_REQUIRED) {
    if (!has(id)) issue('MISSING_CHANNEL', 0, `required channel "${id}" is missing from the header row`);
  }
  if (has('q') && has('dp_ref')) {
    issue('CONFLICTING_CHANNELS', atColumn('dp_ref'), 'the header gives both q and dp_ref; give exactly one of them');
  } else if (!has('q') && !has('dp_ref')) {
    issue('MISSING_CHANNEL', 0, 'the header needs a dynamic pressure "q" or a reference pressure difference "dp_ref"');
  }
  const loadsGiven = LOAD_CHANNELS.filter(has);
  const bridgesGiven = BRIDGE_CHANNELS.filter(has);
  if (loadsGiven.length > 0 && bridgesGiven.length > 0) {
    issue('CONFLICTING_CHANNELS', atColumn(bridgesGiven[0]), 'the header gives both loads (Fx…Mz) and bridge outputs (R1…R6); give one set');
  } else if (loadsGiven.length === 0 && bridgesGiven.length === 0) {
    issue('MISSING_CHANNEL', 0, 'the header needs six loads Fx, Fy, Fz, Mx, My, Mz or six bridge outputs R1…R6');
  } else {
    const set = loadsGiven.length > 0 ? LOAD_CHANNELS : BRIDGE_CHANNELS;
    const missing = set.filter((id) => !has(id));
    if (missing.length > 0) issue('MISSING_CHANNEL', 0, `incomplete ${loadsGiven.length > 0 ? 'load' : 'bridge'} set: missing ${missing.join(', ')}`);
  }
  if (issues.length > 0) return { issues };
  return {
    row: {
      columns,
      units,
      delimiter,
      loadKind: loadsGiven.length > 0 ? 'loads' : 'bridges',
      pressureKind: has('q') ? 'dynamic' : 'reference',
    },
    issues: [],
  };
}
