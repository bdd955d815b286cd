import type { ChannelId } from './channel-id';

/** One column of the header row as the reader understood it. */
export interface RunFileColumn {
  /** 0-based position of the column in each row. */
  index: number;
  /** Name as written in the file, without the unit. */
  name: string;
  /** Unit as written in the file between brackets ('' when none). */
  unit: string;
  /** Canonical channel the column feeds. */
  channel: ChannelId;
  /** Unit the reader converts the values to (SI, or mV/V for bridges, '1' for fractions and counts). */
  siUnit: string;
}

/** What the reader learnt from the metadata lines and the header row. */
export interface RunFileHeader {
  /** Name of the file, used in every message. */
  fileName: string;
  /** `# key: value` lines before the header row; keys trimmed and lower-cased, values trimmed. */
  metadata: Record<string, string>;
  /** Every column in file order. */
  columns: RunFileColumn[];
  /** Whether the file gives six loads or six bridge outputs. */
  loadKind: 'loads' | 'bridges';
  /** Whether the file gives dynamic pressure q or a reference pressure difference Δp_ref. */
  pressureKind: 'dynamic' | 'reference';
  /** 1-based line number of the header row. */
  headerLine: number;
  /** Field delimiter detected from the header row. */
  delimiter: ',' | ';';
}
