import { AeroInputError } from '../errors';
import type { ShapeEntry } from './shape-entry';
import { SHAPE_LIBRARY } from './shape-library';

/**
 * Looks up a library entry by id, or by family plus orientation (e.g. `cube` + `edge-on`).
 *
 * @param shapeId entry id, or a family name when `orientation` is given
 * @param orientation orientation within the family
 * @param library entries to search; the built-in library unless given
 * @returns the entry
 * @throws {AeroInputError} `UNKNOWN_ID` when no entry matches, naming the orientations the family offers
 * @example findShape('cube', 'edge-on').dragCoefficient // 0.8
 */
export function findShape(shapeId: string, orientation?: string, library: readonly ShapeEntry[] = SHAPE_LIBRARY): ShapeEntry {
  if (orientation === undefined) {
    const byId = library.find((entry) => entry.id === shapeId);
    if (byId) return byId;
    const family = library.filter((entry) => entry.family === shapeId);
    if (family.length === 1 && family[0]) return family[0];
    if (family.length > 1) {
      throw new AeroInputError(
        'UNKNOWN_ID',
        `\`findShape\` requires an orientation for '${shapeId}' (one of ${family.map((entry) => entry.orientation).join(', ')})`,
      );
    }
    throw new AeroInputError('UNKNOWN_ID', `\`findShape\` requires a known shape id; got '${shapeId}'`);
  }
  const match = library.find(
    (entry) => (entry.family === shapeId || entry.id === shapeId) && entry.orientation === orientation,
  );
  if (match) return match;
  const offered = library.filter((entry) => entry.family === shapeId).map((entry) => entry.orientation);
  throw new AeroInputError(
    'UNKNOWN_ID',
    offered.length > 0
      ? `\`findShape\` requires an orientation of '${shapeId}' from ${offered.join(', ')}; got '${orientation}'`
      : `\`findShape\` requires a known shape id; got '${shapeId}'`,
  );
}
