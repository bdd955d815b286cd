import type { PointResult, ReductionConfig } from '@tunnelwright/aero';
import {
  BalanceCalibration,
  Booking,
  CalibrationOverride,
  Organisation,
  PointExclusion,
  RawFile,
  Reduction,
  ReductionPoint,
  Run,
  SigningRight,
  TestRecord,
  User,
  type Submission,
} from '@tunnelwright/db';
import type { Knex } from 'knex';
import { pointsFromReduction } from '../reports/points-from-reduction';
import { verificationUrl, type ExcludedPoint, type MethodDeviation, type ResultConfiguration, type ResultSheetData } from '../reports/result-sheet-data';

/** What the lab keeps in its organisation settings for its sheets; every field has a plain default. */
export interface LabReportSettings {
  addressLines?: string[];
  phone?: string;
  email?: string;
  /** Where the tunnels are, e.g. "Main site, Hall 2". */
  site?: string;
  /** Prefix of report numbers, e.g. "BAL" gives BAL-2026-0007-R1. */
  reportPrefix?: string;
  /** The lab's documented method the results were obtained by. */
  documentedMethod?: string;
  standardsFollowed?: string[];
}

export function reportSettings(lab: Organisation): LabReportSettings {
  const report = (lab.settings?.['report'] ?? {}) as LabReportSettings;
  return report;
}

/** The calendar date of `instant` in `timeZone`, `YYYY-MM-DD`. */
export function dateInZone(instant: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(instant);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}`;
}

const number = (value: number, decimals: number) => value.toFixed(decimals);

/** The correction methods a reduction applied, in the words a sheet prints. */
export function correctionMethods(config: ReductionConfig): string[] {
  const c = config.corrections;
  const lines: string[] = [];
  switch (c.solidBlockage) {
    case 'thom':
      lines.push(
        `Solid blockage: Thom's estimate from model volume (body shape factor ${number(config.article.bodyShapeFactor, 2)}${config.tunnel.tunnelShapeFactor ? `, tunnel shape factor ${number(config.tunnel.tunnelShapeFactor, 2)}` : ''})`,
      );
      break;
    case 'frontal-area':
      lines.push('Solid blockage: frontal-area ratio');
      break;
    case 'given':
      lines.push(`Solid blockage: given factor ${number(c.givenSolidBlockage, 4)}`);
      break;
    default:
      lines.push('Solid blockage: not corrected');
  }
  switch (c.wakeBlockage) {
    case 'streamlined':
      lines.push('Wake blockage: streamlined-body estimate from the measured drag');
      break;
    case 'maskell':
      lines.push(`Wake blockage: Maskell's method for bluff bodies (Maskell factor ${number(c.maskellTheta, 2)})`);
      break;
    case 'given':
      lines.push(`Wake blockage: given factor ${number(c.givenWakeBlockage, 4)}`);
      break;
    default:
      lines.push('Wake blockage: not corrected');
  }
  lines.push(
    c.horizontalBuoyancy
      ? `Horizontal buoyancy: drag corrected for the static-pressure gradient ${number(config.tunnel.pressureGradient, 2)} Pa/m`
      : 'Horizontal buoyancy: not corrected',
  );
  if (config.tunnel.kind === 'open_jet') {
    const o = config.tunnel.openJet;
    lines.push(`Open-jet corrections: jet expansion ${number(o.jetExpansion, 4)}, nozzle blockage ${number(o.nozzleBlockage, 4)}, collector blockage ${number(o.collectorBlockage, 4)}`);
  }
  lines.push(config.zeros.tare ? 'Zero and weight tare: interpolated in yaw and pitch from the tare table' : 'Zeros: wind-off zero loads subtracted');
  return lines;
}

/**
 * The corrections and density model as the sheet states them: plainly when every configuration was reduced the same
 * way, otherwise each line names the configurations it applies to ("Configurations A, C: …").
 */
export function methodsStated(groups: readonly { corrections: readonly string[]; densityModel: string; codes: readonly string[] }[]): { correctionMethods: string[]; densityModel: string } {
  if (groups.length === 1) return { correctionMethods: [...groups[0]!.corrections], densityModel: groups[0]!.densityModel };
  const which = (codes: readonly string[]) => `${codes.length === 1 ? 'Configuration' : 'Configurations'} ${codes.join(', ')}`;
  return {
    correctionMethods: groups.flatMap((g) => g.corrections.map((line) => `${which(g.codes)}: ${line}`)),
    densityModel: groups.map((g) => `${which(g.codes)}: ${g.densityModel}`).join('; '),
  };
}

export function densityModelText(config: ReductionConfig): string {
  return config.densityModel === 'cipm-2007'
    ? 'CIPM-2007 moist-air density from barometric pressure, air temperature and relative humidity'
    : 'Ideal-gas moist-air density with the Buck saturation vapour pressure';
}

/** Whether a run swept yaw (spread of at least 1°) or speed at constant yaw. */
function sweepOf(points: readonly PointResult[]): 'yaw' | 'reynolds' {
  if (points.length === 0) return 'yaw';
  const yaws = points.map((p) => p.yaw);
  return Math.max(...yaws) - Math.min(...yaws) >= 1 ? 'yaw' : 'reynolds';
}

const configurationCode = (i: number) => (i < 26 ? String.fromCharCode(65 + i) : `Z${i - 25}`);

export interface SheetIdentity {
  reportNumber: string;
  revision: number;
  issueDate: string;
  replaces?: { number: string; revision: number; reason: string };
  publicUrl: string;
  authorisedBy: User;
}

/**
 * Gathers everything a certified sheet states for an approved submission, from the database, inside `trx`.
 * Only the submission's data runs are reported; sphere-calibration runs qualify the tunnel and are not results.
 *
 * @throws Error when a chosen reduction has no stored engine result (it would not be a reportable result)
 */
export async function buildSheetData(trx: Knex.Transaction, submission: Submission, identity: SheetIdentity): Promise<ResultSheetData> {
  const test = await TestRecord.query(trx).findById(submission.testId).withGraphFetched('[article, tunnel, balance]').throwIfNotFound();
  const lab = await Organisation.query(trx).findOne({ kind: 'lab' }).throwIfNotFound();
  const customer = await Organisation.query(trx).findById(test.organisationId).throwIfNotFound();
  const zone = lab.timeZone ?? 'UTC';
  const settings = reportSettings(lab);

  const chosen = (await trx('submissionReductions').where('submissionId', submission.id)) as { reductionId: string; runId: string }[];
  const reductions = await Reduction.query(trx).whereIn('id', chosen.map((c) => c.reductionId));
  const runs = await Run.query(trx).whereIn('id', chosen.map((c) => c.runId)).orderBy('runNumber');
  const dataRuns = runs.filter((r) => r.kind === 'data');
  const rawFiles = await RawFile.query(trx).whereIn('id', reductions.map((r) => r.rawFileId));
  const exclusions = await PointExclusion.query(trx).whereIn('reductionId', reductions.map((r) => r.id)).orderBy('pointIndex');

  const configurations: ResultConfiguration[] = [];
  const excludedPoints: ExcludedPoint[] = [];
  let firstConfig: ReductionConfig | undefined;
  /** The configurations reduced with each distinct set of corrections and density model, in order of first use. */
  const methodGroups: { corrections: string[]; densityModel: string; codes: string[] }[] = [];
  let engineVersion = '';
  for (const [i, run] of dataRuns.entries()) {
    const reduction = reductions.find((r) => r.runId === run.id);
    if (!reduction) continue;
    const config = reduction.config as unknown as ReductionConfig;
    firstConfig ??= config;
    engineVersion = reduction.engineVersion;
    const rows = await ReductionPoint.query(trx).where('reductionId', reduction.id).orderBy('index');
    const results = rows.map((row) => row.result as unknown as PointResult);
    if (results.some((r) => !r || typeof r.point !== 'number' || !r.corrected)) {
      throw new Error(`reduction ${reduction.id} has points without a stored engine result`);
    }
    const code = configurationCode(i);
    const corrections = correctionMethods(config);
    const densityModel = densityModelText(config);
    const group = methodGroups.find((g) => g.densityModel === densityModel && g.corrections.join('\n') === corrections.join('\n'));
    if (group) group.codes.push(code);
    else methodGroups.push({ corrections, densityModel, codes: [code] });
    const own = exclusions.filter((e) => e.reductionId === reduction.id);
    const excludedNumbers = new Set(own.map((e) => rows.find((r) => r.index === e.pointIndex)?.pointNumber).filter((n): n is number => n !== undefined));
    for (const e of own) {
      const row = rows.find((r) => r.index === e.pointIndex);
      if (row) excludedPoints.push({ configurationCode: code, runNumber: String(run.runNumber), point: row.pointNumber, reason: e.reason });
    }
    const description = test.configurations.find((c) => c.label === run.configurationLabel)?.description ?? run.notes;
    configurations.push({
      code,
      label: run.configurationLabel || `Run ${run.runNumber}`,
      description: description || '',
      runNumber: String(run.runNumber),
      sweep: sweepOf(results),
      points: pointsFromReduction(results, excludedNumbers),
    });
  }
  if (configurations.length === 0 || !firstConfig) throw new Error('an approved submission without data runs cannot be issued');

  const deviations: MethodDeviation[] = [];
  const overrides = await CalibrationOverride.query(trx).whereIn('id', reductions.map((r) => r.overrideId).filter((id): id is string => id !== null));
  for (const o of overrides) {
    deviations.push({ kind: 'deviation', description: "Reduced with the balance's calibration after its due date", reason: o.reason });
  }
  if (excludedPoints.length > 0) {
    deviations.push({ kind: 'exclusion', description: `${excludedPoints.length} measured point(s) not reported (listed under exclusions)`, reason: 'Each point is listed with the analyst’s reason' });
  }

  const calibrationIds = reductions.map((r) => r.calibrationId).filter((id): id is string => id !== null);
  const calibration = calibrationIds.length > 0 ? await BalanceCalibration.query(trx).findById(calibrationIds[0]) : undefined;
  const balanceText = test.balance
    ? `${test.balance.identifier}${test.balance.description ? ` (${test.balance.description.replace(/\.+$/, '')})` : ''}${calibration ? `, calibration version ${calibration.version} of ${calibration.calibratedOn}` : ''}`
    : 'No balance recorded';

  const booking = test.bookingId ? await Booking.query(trx).findById(test.bookingId) : undefined;
  const contact =
    (booking ? await User.query(trx).findById(booking.requestedBy) : undefined) ??
    (await User.query(trx).where({ organisationId: customer.id, role: 'customer', active: true }).orderBy('createdAt').first());
  const customerSettings = (customer.settings ?? {}) as { addressLines?: string[] };

  const testDates = [...new Set(rawFiles.map((f) => dateInZone(f.createdAt, zone)))].sort();
  // The day the lab recorded as receipt; not the day the record was made, which can be later.
  const receipt = test.article!.receivedOn ?? null;
  const right = await SigningRight.query(trx).where({ userId: identity.authorisedBy.id }).whereNull('revokedAt').first();
  const roleName = identity.authorisedBy.role === 'lab_manager' ? 'Laboratory manager' : 'Analyst';
  const article = test.article!;
  const tunnel = test.tunnel!;

  return {
    laboratory: {
      name: lab.name,
      addressLines: settings.addressLines ?? [],
      testLocation: `${tunnel.name}${settings.site ? `, ${settings.site}` : ''} (permanent facility)`,
      phone: settings.phone ?? '',
      email: settings.email ?? '',
    },
    report: {
      number: identity.reportNumber,
      revision: identity.revision,
      title: test.title,
      ...(identity.replaces ? { replaces: identity.replaces } : {}),
    },
    customer: {
      name: customer.name,
      addressLines: customerSettings.addressLines ?? [],
      contactName: contact?.name ?? '',
      contactEmail: contact?.email ?? '',
      orderReference: booking ? `Booking ${booking.id.slice(0, 8).toUpperCase()}` : `Test ${test.id.slice(0, 8).toUpperCase()}`,
    },
    method: {
      documentedMethod: settings.documentedMethod ?? 'Force and moment measurement on a six-component balance, reduced to corrected coefficients',
      standardsFollowed: settings.standardsFollowed ?? ['ISO/IEC 17025:2017 (reporting)', 'JCGM 100:2008 (GUM) for the evaluation of uncertainty'],
      ...methodsStated(methodGroups),
      engineVersion: `Tunnelwright reduction engine ${engineVersion}`,
      uncertaintyMethod:
        'Combined standard uncertainty of systematic (type B) and random (type A, standard error of the mean) parts, expanded with k = 2 (about 95 % coverage)',
      facility: `${tunnel.name}: ${tunnel.kind === 'open_jet' ? 'open-jet' : 'closed'} test section ${number(tunnel.width, 2)} m × ${number(tunnel.height, 2)} m (${number(tunnel.area, 2)} m²)`,
      balance: balanceText,
    },
    article: {
      description: article.description || article.name,
      identification: `${article.name}; laboratory item ${article.id.slice(0, 8).toUpperCase()}`,
      conditionOnReceipt: article.conditionOnReceipt || 'Not recorded on receipt',
      referenceArea: firstConfig.article.referenceArea,
      referenceAreaKind: firstConfig.article.referenceAreaKind,
      referenceLength: firstConfig.article.referenceLength,
      scale: firstConfig.article.scale,
    },
    dates: { receipt, testDates: testDates.length > 0 ? testDates : [identity.issueDate], issue: identity.issueDate },
    configurations,
    deviations,
    exclusions: excludedPoints,
    externalProviders: [],
    sampling: { applicable: false, reason: 'The item was supplied by the customer and tested as received; the laboratory did no sampling, so no sampling plan or method applies.' },
    authorisation: {
      name: identity.authorisedBy.name,
      role: `${roleName}, authorised signatory${right?.scopeNote ? ` (${right.scopeNote})` : ''}`,
      date: identity.issueDate,
    },
    verificationUrl: verificationUrl(identity.publicUrl, identity.reportNumber),
  };
}
