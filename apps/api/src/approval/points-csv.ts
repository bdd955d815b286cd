import { DESIGN_CAUTION, type PointResult } from '@tunnelwright/aero';
import { stringify } from 'csv-stringify/sync';

/** Characters that make a spreadsheet read a cell as a formula or a control sequence (OWASP CSV injection). */
const FORMULA_TRIGGERS = new Set(['=', '+', '-', '@', '\t', '\r']);

/**
 * Neutralises a text cell against formula injection: a cell that begins with `=`, `+`, `-`, `@`, tab or carriage
 * return gets a leading apostrophe, which spreadsheets show as text. Numbers we format ourselves are not text and
 * are left alone, so negative values stay numbers.
 */
export function neutraliseCell(value: string): string {
  return value.length > 0 && FORMULA_TRIGGERS.has(value[0]!) ? `'${value}` : value;
}

/** One reduction's points for the CSV: the run, the version and which point indexes are excluded and why. */
export interface CsvRun {
  runNumber: number;
  configurationLabel: string;
  version: number;
  points: { index: number; result: PointResult }[];
  exclusions: Map<number, string>;
}

const columns = [
  'run',
  'configuration',
  'reduction_version',
  'point',
  'yaw_deg',
  'pitch_deg',
  'dynamic_pressure_pa',
  'speed_m_s',
  'reynolds_number',
  'density_kg_m3',
  'cd',
  'cd_expanded_uncertainty_k2',
  'cl',
  'cl_expanded_uncertainty_k2',
  'cy',
  'cy_expanded_uncertainty_k2',
  'drag_area_m2',
  'excluded',
  'exclusion_reason',
];

/**
 * The points as CSV (RFC 4180 quoting by csv-stringify), corrected coefficients with U (k = 2), excluded points
 * kept and marked. The first lines are comments naming the source and the design caution.
 */
export function pointsCsv(title: string, runs: readonly CsvRun[]): string {
  const rows: (string | number)[][] = [];
  for (const run of runs) {
    for (const { index, result: p } of run.points) {
      const c = p.corrected;
      const reason = run.exclusions.get(index);
      rows.push([
        run.runNumber,
        neutraliseCell(run.configurationLabel),
        run.version,
        p.point,
        p.yaw,
        p.pitch,
        p.correctedDynamicPressure,
        p.correctedSpeed,
        p.reynoldsNumber,
        p.density,
        c.dragCoefficient.value,
        c.dragCoefficient.uncertainty?.expandedUncertainty ?? '',
        c.liftCoefficient.value,
        c.liftCoefficient.uncertainty?.expandedUncertainty ?? '',
        c.sideForceCoefficient.value,
        c.sideForceCoefficient.uncertainty?.expandedUncertainty ?? '',
        p.dragArea,
        reason === undefined ? 'no' : 'yes',
        neutraliseCell(reason ?? ''),
      ]);
    }
  }
  const preface = stringify([[neutraliseCell(`# ${title}`)], [neutraliseCell(`# ${DESIGN_CAUTION}`)]]);
  return preface + stringify(rows, { header: true, columns, cast: { number: (v) => String(v) } });
}
