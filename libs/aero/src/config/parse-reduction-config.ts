import { ReductionConfigError } from './reduction-config-error';
import { reductionConfigSchema, type ReductionConfig } from './reduction-config';

/**
 * Checks a reduction configuration and fills in its defaults.
 *
 * @param json - the configuration, as a JSON string or an already parsed value
 * @param source - name of the configuration file, used in messages
 * @returns the typed configuration with every default filled in
 * @throws {ReductionConfigError} listing each bad field by its path (e.g. `tunnel.sectionArea: …`), or invalid JSON
 * @example
 * parseReductionConfig({ tunnel: { kind: 'closed', sectionArea: 4 },
 *   article: { referenceArea: 0.2, referenceAreaKind: 'frontal', referenceLength: 1 } }).densityModel; // 'cipm-2007'
 */
export function parseReductionConfig(json: unknown, source = 'configuration'): ReductionConfig {
  let value = json;
  if (typeof json === 'string') {
    try {
      value = JSON.parse(json);
    } catch (error) {
      throw new ReductionConfigError([{ path: '', message: `is not valid JSON (${(error as Error).message})` }], source);
    }
  }
  const parsed = reductionConfigSchema.safeParse(value);
  if (!parsed.success) {
    throw new ReductionConfigError(
      parsed.error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message })),
      source,
    );
  }
  return parsed.data;
}
