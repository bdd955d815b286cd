import { readFileSync } from 'node:fs';
import { Readable } from 'node:stream';
import { fileURLToPath } from 'node:url';
import { ENGINE_VERSION, parseReductionConfig, reduceRun, type ReductionResult } from '@tunnelwright/aero';
import { pointsFromReduction } from './points-from-reduction';
import { verificationUrl, type ExcludedPoint, type ResultConfiguration, type ResultSheetData } from './result-sheet-data';

/**
 * An invented but fully reduced result sheet: the closed-section yaw sweep shipped in libs/aero/examples, an invented
 * variant of it, and an invented speed sweep built from its zero-yaw point, each reduced with `reduceRun`.
 * Every name, address and figure in it is made up.
 */

const EXAMPLES = new URL('../../../../libs/aero/examples/', import.meta.url);
const RUN_FILE = 'closed-car-yaw-sweep.csv';
const LOAD_COLUMNS = [8, 9, 10, 11, 12, 13];
const Q_COLUMN = 4;
const POINT_COLUMN = 1;

/** Speed-sweep factors on q; the first is below the method's minimum q and is measured but excluded. */
const SPEED_SWEEP_Q_FACTORS = [0.3, 0.45, 0.6, 0.8, 1];
const MINIMUM_Q = 600;

interface RunFileText {
  comments: string[];
  header: string;
  rows: string[][];
}

function readExampleRun(): RunFileText {
  const lines = readFileSync(fileURLToPath(new URL(RUN_FILE, EXAMPLES)), 'utf8').split('\n').filter((l) => l.trim() !== '');
  const comments = lines.filter((l) => l.startsWith('#'));
  const [header, ...rows] = lines.filter((l) => !l.startsWith('#'));
  return { comments, header, rows: rows.map((r) => r.split(',').map((c) => c.trim())) };
}

function runText(run: RunFileText, runNumber: string, rows: string[][]): string {
  const comments = run.comments.map((c) => (c.startsWith('# run:') ? `# run: ${runNumber}` : c));
  return [...comments, run.header, ...rows.map((r) => r.join(', '))].join('\n') + '\n';
}

function scaled(cell: string, factor: number): string {
  const decimals = cell.split('.')[1]?.length ?? 0;
  return (Number(cell) * factor).toFixed(decimals);
}

/** Invented variant: the same sweep with mirrors removed — less drag, a little more lift. */
function mirrorsRemovedRows(run: RunFileText): string[][] {
  return run.rows.map((r) => r.map((c, i) => (i === 8 ? scaled(c, 0.962) : i === 10 ? scaled(c, 1.06) : c)));
}

/** Invented speed sweep at zero yaw: q scaled, loads scaled with a mild Reynolds-number effect on the coefficients. */
function speedSweepRows(run: RunFileText): string[][] {
  const zeroYaw = run.rows.filter((r) => Number(r[2]) === 0);
  return SPEED_SWEEP_Q_FACTORS.flatMap((f, index) => {
    const coefficientFactor = 1 + 0.12 * (1 / Math.sqrt(f) - 1);
    return zeroYaw.map((r) =>
      r.map((c, i) => {
        if (i === POINT_COLUMN) return String(index + 1);
        if (i === Q_COLUMN) return scaled(c, f);
        if (LOAD_COLUMNS.includes(i)) return scaled(c, f * coefficientFactor);
        return c;
      }),
    );
  });
}

async function reduce(text: string, fileName: string, sweep: 'yaw' | 'reynolds' = 'yaw'): Promise<ReductionResult> {
  const json = JSON.parse(readFileSync(fileURLToPath(new URL('closed-car-yaw-sweep.config.json', EXAMPLES)), 'utf8')) as Record<string, unknown>;
  // Wind averaging needs a yaw sweep, so a speed sweep is reduced without it.
  if (sweep === 'reynolds') delete json['windAveraging'];
  const config = parseReductionConfig(json);
  return reduceRun(Readable.from([Buffer.from(text)]), config, { fileName });
}

export interface SampleResultSheetOptions {
  publicUrl?: string;
  /** Revision of the sample; with `supersededBy`, the sheet carries the superseded mark. */
  revision?: number;
  supersededBy?: ResultSheetData['report']['supersededBy'];
  /** Extra invented yaw-sweep configurations (ride-height steps), to make longer sheets for the bench. */
  extraConfigurations?: number;
}

const REPORT_NUMBER = 'TW-2026-0147';

/** Builds the invented sample sheet; every figure comes from `reduceRun`. */
export async function buildSampleResultSheet(options: SampleResultSheetOptions = {}): Promise<ResultSheetData> {
  const run = readExampleRun();
  const baseline = await reduce(runText(run, '4107', run.rows), 'run-4107.csv');
  const mirrors = await reduce(runText(run, '4108', mirrorsRemovedRows(run)), 'run-4108.csv');
  const speed = await reduce(runText(run, '4109', speedSweepRows(run)), 'run-4109.csv', 'reynolds');
  const lowQ = new Set(speed.points.filter((p) => p.correctedDynamicPressure < MINIMUM_Q).map((p) => p.point));

  const configurations: ResultConfiguration[] = [
    { code: 'A', label: 'Baseline', description: 'As received: mirrors fitted, wheels static, ride height 38 mm', runNumber: '4107', sweep: 'yaw', points: pointsFromReduction(baseline.points) },
    { code: 'B', label: 'Mirrors removed', description: 'Both door mirrors removed, mounting faces taped flush', runNumber: '4108', sweep: 'yaw', points: pointsFromReduction(mirrors.points) },
    { code: 'C', label: 'Speed sweep', description: 'Baseline at 0° yaw, five speeds from 28 m/s to 51 m/s', runNumber: '4109', sweep: 'reynolds', points: pointsFromReduction(speed.points, lowQ) },
  ];
  for (let i = 0; i < (options.extraConfigurations ?? 0); i++) {
    const drop = 0.985 - 0.01 * i;
    const rows = run.rows.map((r) => r.map((c, j) => (j === 8 ? scaled(c, drop) : j === 10 ? scaled(c, 0.97 - 0.02 * i) : c)));
    const runNumber = String(4110 + i);
    const reduced = await reduce(runText(run, runNumber, rows), `run-${runNumber}.csv`);
    configurations.push({
      code: String.fromCharCode(68 + i),
      label: `Ride height −${(i + 1) * 4} mm`,
      description: `Baseline lowered by ${(i + 1) * 4} mm on the strut adaptor`,
      runNumber,
      sweep: 'yaw',
      points: pointsFromReduction(reduced.points),
    });
  }
  const exclusions: ExcludedPoint[] = [...lowQ].map((point) => ({
    configurationCode: 'C',
    runNumber: '4109',
    point,
    reason: `q below the method's ${MINIMUM_Q} Pa minimum for this balance; measured, not reported`,
  }));

  return {
    laboratory: {
      name: 'Harrowgate Flow Laboratory',
      addressLines: ['Unit 7, Quarry Lane Technology Park', 'Aldermoor AM4 2QT', 'United Kingdom'],
      testLocation: 'Hall B closed test section, Quarry Lane site (permanent facility)',
      phone: '+44 1632 960 418',
      email: 'reports@harrowgate-flow.example',
    },
    report: {
      number: REPORT_NUMBER,
      revision: options.revision ?? 1,
      title: 'Force and moment test of a 1:4 scale estate car model',
      ...(options.supersededBy ? { supersededBy: options.supersededBy } : {}),
    },
    customer: {
      name: 'Brackenfield Motor Studio Ltd',
      addressLines: ['14 Tanner Row', 'Wexcombe WX9 8LP', 'United Kingdom'],
      contactName: 'Imogen Varley-Shaw',
      contactEmail: 'i.varley-shaw@brackenfield.example',
      orderReference: 'PO-88214 / booking BK-2026-0391',
    },
    method: {
      documentedMethod: 'TW-M-04 issue 3: six-component force and moment testing of road-vehicle models',
      standardsFollowed: ['ISO/IEC 17025:2017 (reporting)', 'JCGM 100:2008 (GUM) for the evaluation of uncertainty', 'SAE J1252 wind-tunnel test procedure for road vehicles (as referenced by TW-M-04)'],
      correctionMethods: [
        'Solid blockage: Thom (body shape factor 0.96, tunnel shape factor 0.86)',
        'Wake blockage: streamlined-body estimate from the measured drag',
        'Horizontal buoyancy: drag corrected for the measured static-pressure gradient −1.8 Pa/m',
        'Zero and weight tare: interpolated in yaw from the tare run',
      ],
      densityModel: 'CIPM-2007 moist-air density from barometric pressure, air temperature and relative humidity',
      engineVersion: `Tunnelwright reduction engine ${ENGINE_VERSION}`,
      uncertaintyMethod: 'Combined standard uncertainty of systematic (type B) and random (type A, standard error of the mean) parts, expanded with k = 2 (about 95 % coverage)',
      facility: 'Hall B closed test section, 2.4 m × 1.8 m (4.32 m²), fixed floor',
      balance: 'Six-component strut balance HB-6 (s/n 0419), calibrated 2026-09-14',
    },
    article: {
      description: '1:4 scale estate car model, painted resin body on an aluminium chassis, static wheels',
      identification: 'Customer model VR-E4 no. 2; laboratory item tag HFL-IT-26-0582',
      conditionOnReceipt: 'Received in its transport case, undamaged; left rear wheel arch liner loose, refitted by the customer’s representative before test',
      referenceArea: baseline.config.article.referenceArea,
      referenceAreaKind: baseline.config.article.referenceAreaKind,
      referenceLength: baseline.config.article.referenceLength,
      scale: baseline.config.article.scale ?? 1,
    },
    dates: { receipt: '2026-10-19', testDates: ['2026-10-21', '2026-10-22'], issue: '2026-11-03' },
    configurations,
    deviations: [
      { kind: 'deviation', description: 'Yaw range limited to ±10° instead of the method’s ±15°', reason: 'Customer request (order PO-88214)' },
      { kind: 'exclusion', description: 'Rotating wheels and moving ground not used', reason: 'Not requested; Hall B has a fixed floor' },
    ],
    exclusions,
    externalProviders: [],
    sampling: { applicable: false, reason: 'The item was supplied by the customer and tested as received; the laboratory did no sampling, so no sampling plan or method applies.' },
    authorisation: { name: 'Dr Tamsin Okonjo-Reyes', role: 'Technical Manager, authorised signatory', date: '2026-11-03' },
    verificationUrl: verificationUrl(options.publicUrl ?? 'https://results.harrowgate-flow.example', REPORT_NUMBER),
  };
}
