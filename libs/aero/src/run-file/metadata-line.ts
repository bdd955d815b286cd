/**
 * Reads a `# key: value` metadata line. Lines starting with `#` without a colon are plain comments.
 * @param text line text without line ending
 * @returns key (trimmed, lower-case) and value (trimmed), or undefined for a plain comment
 * @example parseMetadataLine('# q_factor: 1.0043') // { key: 'q_factor', value: '1.0043' }
 */
export function parseMetadataLine(text: string): { key: string; value: string } | undefined {
  const match = /^\s*#\s*([^:]*?)\s*:\s*(.*?)\s*$/.exec(text);
  if (!match || match[1] === '') return undefined;
  return { key: match[1].toLowerCase(), value: match[2] };
}

/** Metadata keys whose value must be a positive finite number. */
export const NUMERIC_METADATA_KEYS: readonly string[] = ['q_factor'];
