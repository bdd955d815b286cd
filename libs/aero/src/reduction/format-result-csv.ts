import type { CoefficientSet, PointResult, ReductionResult } from './reduction-result';

const COEFFICIENT_NAMES: readonly (keyof CoefficientSet)[] = [
  'dragCoefficient',
  'liftCoefficient',
  'sideForceCoefficient',
  'rollingMomentCoefficient',
  'pitchingMomentCoefficient',
  'yawingMomentCoefficient',
  'axialForceCoefficient',
];

const SHORT: Record<keyof CoefficientSet, string> = {
  dragCoefficient: 'CD',
  liftCoefficient: 'CL',
  sideForceCoefficient: 'CY',
  rollingMomentCoefficient: 'Cl',
  pitchingMomentCoefficient: 'Cm',
  yawingMomentCoefficient: 'Cn',
  axialForceCoefficient: 'CX',
};

/** Columns of the point table: header with unit, and how to read the value from a point. */
const COLUMNS: readonly [string, (p: PointResult) => number | string | null][] = [
  ['point', (p) => p.point],
  ['samples', (p) => p.sampleCount],
  ['yaw [deg]', (p) => p.yaw],
  ['pitch [deg]', (p) => p.pitch],
  ['rho [kg/m3]', (p) => p.density],
  ['mu [Pa s]', (p) => p.viscosity],
  ['nu [m2/s]', (p) => p.kinematicViscosity],
  ['a [m/s]', (p) => p.speedOfSound],
  ['q_u [Pa]', (p) => p.uncorrectedDynamicPressure],
  ['q_c [Pa]', (p) => p.correctedDynamicPressure],
  ['V_u [m/s]', (p) => p.uncorrectedSpeed],
  ['V_c [m/s]', (p) => p.correctedSpeed],
  ['Re', (p) => p.reynoldsNumber],
  ['Mach', (p) => p.machNumber],
  ['eps_sb', (p) => p.corrections.solidBlockage],
  ['eps_wb', (p) => p.corrections.wakeBlockage],
  ['eps_s', (p) => p.corrections.jetExpansion],
  ['eps_n', (p) => p.corrections.nozzleBlockage],
  ['eps_c', (p) => p.corrections.collectorBlockage],
  ['eps_t', (p) => p.corrections.totalBlockage],
  ['dD_buoyancy [N]', (p) => p.corrections.buoyancyDrag],
  ['D [N]', (p) => p.windAxisLoads.drag],
  ['L [N]', (p) => p.windAxisLoads.lift],
  ['Y_w [N]', (p) => p.windAxisLoads.sideForce],
  ...COEFFICIENT_NAMES.map((name) => [`${SHORT[name]}_u`, (p: PointResult) => p.uncorrected[name].value] as [string, (p: PointResult) => number]),
  ...COEFFICIENT_NAMES.flatMap((name) => [
    [`${SHORT[name]}_c`, (p: PointResult) => p.corrected[name].value] as [string, (p: PointResult) => number],
    [`U(${SHORT[name]}_c) k=2`, (p: PointResult) => p.corrected[name].uncertainty?.expandedUncertainty ?? null] as [string, (p: PointResult) => number | null],
    [`B(${SHORT[name]}_c)`, (p: PointResult) => p.corrected[name].uncertainty?.biasLimit ?? null] as [string, (p: PointResult) => number | null],
    [`P(${SHORT[name]}_c)`, (p: PointResult) => p.corrected[name].uncertainty?.precisionLimit ?? null] as [string, (p: PointResult) => number | null],
  ]),
  ['CdA [m2]', (p) => p.dragArea],
  ['drag counts', (p) => p.dragCounts],
  ['L/D', (p) => p.liftToDragRatio],
  ['full-scale D [N]', (p) => p.fullScale?.drag ?? null],
  ['full-scale P [W]', (p) => p.fullScale?.power ?? null],
  ['Re ratio model/full', (p) => p.fullScale?.reynoldsNumberRatio ?? null],
];

/**
 * The result as CSV: `#` lines with the engine version, input hash, reference area and kind, methods,
 * warnings and the design caution, then one row per point with every intermediate and coefficient.
 *
 * @param result - a result of `reduceRun`
 * @returns CSV text, comma-separated, newline-terminated; numbers in shortest round-trip form, empty when absent
 * @throws nothing
 * @example
 * process.stdout.write(formatResultCsv(await reduceRun(stream, config, { fileName })));
 */
export function formatResultCsv(result: ReductionResult): string {
  const { config } = result;
  const lines = [
    `# engine version: ${result.engineVersion}`,
    `# input sha256: ${result.inputSha256}`,
    `# file: ${csvText(result.fileName)}`,
    `# reference area [m2]: ${config.article.referenceArea} (${config.article.referenceAreaKind}); reference length [m]: ${config.article.referenceLength}`,
    `# tunnel: ${config.tunnel.kind}; solid blockage: ${config.corrections.solidBlockage}; wake blockage: ${config.corrections.wakeBlockage}; horizontal buoyancy: ${config.corrections.horizontalBuoyancy ? 'on' : 'off'}; density: ${config.densityModel}`,
    ...(result.windAveraged ? [`# wind-averaged CD (${result.windAveraged.method}): ${result.windAveraged.dragCoefficient}`] : []),
    ...result.warnings.map((w) => `# warning ${w.code}: ${csvText(w.message)}`),
    `# caution: ${result.caution}`,
    COLUMNS.map(([name]) => csvField(name)).join(','),
    ...result.points.map((p) => COLUMNS.map(([, read]) => csvValue(read(p))).join(',')),
  ];
  return lines.join('\n') + '\n';
}

function csvValue(value: number | string | null): string {
  if (value === null || (typeof value === 'number' && !Number.isFinite(value))) return '';
  return typeof value === 'number' ? String(value) : csvField(value);
}

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function csvText(text: string): string {
  return text.replace(/[\r\n]+/g, ' ');
}
