/** Field delimiters an import profile may name (the same four the format's profile schema takes). */
export type ProfileDelimiter = ',' | ';' | '\t' | '|';

/** What to do with source columns the profile does not list. */
export type UnmappedColumns = 'keep' | 'drop';

/** One source column of a profile as the API takes it. */
export interface ProfileColumnJson {
  readonly source: string;
  readonly channel?: string;
  readonly unit?: string;
  readonly scale?: number;
  readonly drop: boolean;
}

/** An import profile as the API takes it in the multipart `profile` field (`libs/aero/src/run-file/import-profile.ts`). */
export interface ImportProfileJson {
  readonly name: string;
  readonly delimiter: ProfileDelimiter;
  readonly decimalComma: boolean;
  readonly skipLines: number;
  readonly unitsRow: boolean;
  readonly columns: readonly ProfileColumnJson[];
  readonly unmappedColumns: UnmappedColumns;
}

/** One row of the editor's column table. */
export interface ProfileColumnValue {
  readonly source: string;
  /** Canonical column to write; empty keeps the source's name. */
  readonly channel: string;
  /** Unit to write; empty keeps the units row's or the source's own. */
  readonly unit: string;
  /** Factor each value is multiplied by; null leaves the values as they are. */
  readonly scale: number | null;
  readonly drop: boolean;
}

/** The editor's form, as its raw value. */
export interface ProfileFormValue {
  readonly name: string;
  readonly description: string;
  readonly delimiter: ProfileDelimiter;
  readonly decimalComma: boolean;
  readonly skipLines: number | null;
  readonly unitsRow: boolean;
  readonly unmappedColumns: UnmappedColumns;
  readonly columns: readonly ProfileColumnValue[];
}

/** The delimiters in the order the editor offers them, with their names. */
export const DELIMITER_CHOICES: readonly { readonly value: ProfileDelimiter; readonly label: string }[] = [
  { value: ',', label: 'Comma ( , )' },
  { value: ';', label: 'Semicolon ( ; )' },
  { value: '\t', label: 'Tab' },
  { value: '|', label: 'Vertical bar ( | )' },
];

/** A fresh editor: the standard delimiter, nothing renamed. */
export const EMPTY_PROFILE_FORM: ProfileFormValue = {
  name: '',
  description: '',
  delimiter: ',',
  decimalComma: false,
  skipLines: 0,
  unitsRow: false,
  unmappedColumns: 'keep',
  columns: [],
};

/**
 * Builds the profile JSON the API validates from the editor's value: texts trimmed, empty channel, unit and
 * scale left out (so the source's name, unit and values stay as they are).
 */
export function profileFromForm(value: ProfileFormValue): ImportProfileJson {
  return {
    name: value.name.trim(),
    delimiter: value.delimiter,
    decimalComma: value.decimalComma,
    skipLines: value.skipLines ?? 0,
    unitsRow: value.unitsRow,
    unmappedColumns: value.unmappedColumns,
    columns: value.columns.map((column) => ({
      source: column.source.trim(),
      ...(column.channel.trim() ? { channel: column.channel.trim() } : {}),
      ...(column.unit.trim() ? { unit: column.unit.trim() } : {}),
      ...(column.scale !== null && column.scale !== 1 ? { scale: column.scale } : {}),
      drop: column.drop,
    })),
  };
}

/** The editor's value for a saved profile (its stored JSON, whose absent fields take the schema's defaults). */
export function formFromProfile(name: string, description: string, profile: Readonly<Record<string, unknown>>): ProfileFormValue {
  const columns = Array.isArray(profile['columns']) ? (profile['columns'] as Record<string, unknown>[]) : [];
  return {
    name,
    description,
    delimiter: DELIMITER_CHOICES.some((d) => d.value === profile['delimiter']) ? (profile['delimiter'] as ProfileDelimiter) : ',',
    decimalComma: profile['decimalComma'] === true,
    skipLines: typeof profile['skipLines'] === 'number' ? profile['skipLines'] : 0,
    unitsRow: profile['unitsRow'] === true,
    unmappedColumns: profile['unmappedColumns'] === 'drop' ? 'drop' : 'keep',
    columns: columns.map((column) => ({
      source: typeof column['source'] === 'string' ? column['source'] : '',
      channel: typeof column['channel'] === 'string' ? column['channel'] : '',
      unit: typeof column['unit'] === 'string' ? column['unit'] : '',
      scale: typeof column['scale'] === 'number' ? column['scale'] : null,
      drop: column['drop'] === true,
    })),
  };
}

/** What a saved profile changes compared with a standard run file, as short phrases for the list. */
export function profileChanges(profile: Readonly<Record<string, unknown>>): string[] {
  const value = formFromProfile('', '', profile);
  const changes: string[] = [];
  if (value.delimiter !== ',') changes.push(`${DELIMITER_CHOICES.find((d) => d.value === value.delimiter)?.label.split(' (')[0].toLowerCase()} between fields`);
  if (value.decimalComma) changes.push('decimal comma');
  if (value.skipLines) changes.push(`skips ${value.skipLines} line(s) before the names`);
  if (value.unitsRow) changes.push('units in their own row');
  const renamed = value.columns.filter((c) => !c.drop && c.channel !== '').length;
  const scaled = value.columns.filter((c) => !c.drop && c.scale !== null).length;
  const dropped = value.columns.filter((c) => c.drop).length;
  if (renamed) changes.push(`renames ${renamed} column(s)`);
  if (scaled) changes.push(`scales ${scaled} column(s)`);
  if (dropped) changes.push(`leaves out ${dropped} column(s)`);
  if (value.unmappedColumns === 'drop') changes.push('leaves out unlisted columns');
  return changes.length > 0 ? changes : ['nothing: reads like a standard run file'];
}
