import { AeroInputError, fullScaleDragArea } from '@tunnelwright/aero';
import type { CertifiedCandidate, CertifiedCandidateConfiguration, CertifiedResultSource, MeasuredLink } from '@tunnelwright/contracts';
import { Plan, recordAudit, ResultSheet, TestRecord, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { HttpError } from '../errors/http-error';
import type { ResultConfiguration, ResultPoint, ResultSheetData } from '../reports/result-sheet-data';

/**
 * The point of a configuration whose yaw is nearest 0°; of two equally near (e.g. −2° and +2°, or a repeated 0°)
 * the first in the sheet's order, so the choice never depends on anything but the sheet.
 */
export function pointNearestZeroYaw(configuration: Pick<ResultConfiguration, 'points'>): ResultPoint | undefined {
  let best: ResultPoint | undefined;
  for (const point of configuration.points) {
    if (!best || Math.abs(point.yaw) < Math.abs(best.yaw)) best = point;
  }
  return best;
}

/** What a link would take from one configuration of a sheet; undefined when the configuration reports no point. */
export function candidateConfiguration(configuration: ResultConfiguration, scale: number): CertifiedCandidateConfiguration | undefined {
  const point = pointNearestZeroYaw(configuration);
  if (!point || !(point.dragArea.value > 0)) return undefined;
  return {
    code: configuration.code,
    label: configuration.label,
    yaw: point.yaw,
    sheetDragArea: point.dragArea.value,
    sheetExpandedUncertainty: point.dragArea.expandedUncertainty,
    dragArea: fullScaleDragArea(point.dragArea.value, scale),
    expandedUncertainty: fullScaleDragArea(point.dragArea.expandedUncertainty, scale),
  };
}

function sheetData(sheet: ResultSheet): ResultSheetData {
  return sheet.data as unknown as ResultSheetData;
}

/** Valid sheets of tests of `organisationId`, newest first, each with the configurations a plan can be linked to. */
export async function certifiedCandidates(knex: Knex, organisationId: string): Promise<CertifiedCandidate[]> {
  const sheets = await ResultSheet.query(knex)
    .select('id', 'testId', 'reportNumber', 'issueDate', 'data')
    .where('state', 'valid')
    .whereIn('testId', TestRecord.query(knex).select('id').where('organisationId', organisationId))
    .orderBy('createdAt', 'desc');
  const tests = await TestRecord.query(knex).select('id', 'title').whereIn('id', sheets.map((s) => s.testId));
  return sheets.map((sheet) => {
    const data = sheetData(sheet);
    const scale = data.article.scale;
    return {
      sheetId: sheet.id,
      reportNumber: sheet.reportNumber,
      issueDate: sheet.issueDate,
      testTitle: tests.find((t) => t.id === sheet.testId)?.title ?? '',
      scale,
      configurations: data.configurations.map((c) => candidateConfiguration(c, scale)).filter((c): c is CertifiedCandidateConfiguration => c !== undefined),
    };
  });
}

/** The plan columns a link sets: everything the comparison and its source line need, frozen as the sheet states it. */
export interface CertifiedLinkColumns {
  measuredDragArea: number;
  measuredSource: string;
  measuredSheetId: string;
  measuredConfigurationCode: string;
  measuredConfigurationLabel: string;
  measuredYaw: number;
  measuredSheetDragArea: number;
  measuredSheetUncertainty: number;
  measuredScale: number;
  measuredExpandedUncertainty: number;
  measuredLinkedBy: string;
  measuredLinkedAt: Date;
}

const yawText = (yaw: number) => `${yaw.toFixed(1)}°`;

/**
 * Reads the link for `plan` from sheet `sheetId`, configuration `configurationCode`, inside `trx`.
 *
 * @throws {HttpError} 404 when no sheet of the plan's customer has that id; 400 on `sheetId` when the sheet is
 *   superseded, on `configurationCode` when the sheet has no such configuration or it reports no drag area
 */
export async function certifiedLinkColumns(trx: Knex.Transaction, plan: Plan, sheetId: string, configurationCode: string, linkedBy: string): Promise<CertifiedLinkColumns> {
  const sheet = await ResultSheet.query(trx)
    .select('id', 'reportNumber', 'state', 'data')
    .findById(sheetId)
    .whereIn('testId', TestRecord.query(trx).select('id').where('organisationId', plan.organisationId));
  if (!sheet) throw HttpError.notFound(`A result sheet of ${plan.organisation?.name ?? 'the plan’s customer'} with this id`);
  if (sheet.state !== 'valid') {
    throw HttpError.field('sheetId', `${sheet.reportNumber} is superseded; link the valid revision instead`);
  }
  const data = sheetData(sheet);
  const configuration = data.configurations.find((c) => c.code === configurationCode);
  if (!configuration) {
    const codes = data.configurations.map((c) => c.code).join(', ');
    throw HttpError.field('configurationCode', `${sheet.reportNumber} has no configuration ${configurationCode}; it reports ${codes}`);
  }
  let taken: CertifiedCandidateConfiguration | undefined;
  try {
    taken = candidateConfiguration(configuration, data.article.scale);
  } catch (error) {
    if (error instanceof AeroInputError) throw HttpError.field('sheetId', `${sheet.reportNumber} states no usable model scale`);
    throw error;
  }
  if (!taken) throw HttpError.field('configurationCode', `Configuration ${configurationCode} of ${sheet.reportNumber} reports no drag area`);
  return {
    measuredDragArea: taken.dragArea,
    measuredSource: `${sheet.reportNumber}, configuration ${taken.code} (${taken.label}) at yaw ${yawText(taken.yaw)}`,
    measuredSheetId: sheet.id,
    measuredConfigurationCode: taken.code,
    measuredConfigurationLabel: taken.label,
    measuredYaw: taken.yaw,
    measuredSheetDragArea: taken.sheetDragArea,
    measuredSheetUncertainty: taken.sheetExpandedUncertainty,
    measuredScale: data.article.scale,
    measuredExpandedUncertainty: taken.expandedUncertainty,
    measuredLinkedBy: linkedBy,
    measuredLinkedAt: new Date(),
  };
}

/**
 * Links `plan` (loaded with its organisation, locked in `trx`) to a sheet's configuration and writes the audit row
 * with the link before and after, so every way of linking records the same thing.
 */
export async function linkCertifiedResult(trx: Knex.Transaction, plan: Plan, sheetId: string, configurationCode: string, actorId: string): Promise<CertifiedLinkColumns> {
  const columns = await certifiedLinkColumns(trx, plan, sheetId, configurationCode, actorId);
  await Plan.query(trx).findById(plan.id).patch(columns);
  await recordAudit(trx, {
    actorId,
    action: 'plan.certified_result_linked',
    entity: 'plan',
    entityId: plan.id,
    before: plan.measuredDragArea === null ? null : { sheetId: plan.measuredSheetId, source: plan.measuredSource, dragArea: plan.measuredDragArea },
    after: { sheetId: columns.measuredSheetId, configurationCode: columns.measuredConfigurationCode, yaw: columns.measuredYaw, source: columns.measuredSource, dragArea: columns.measuredDragArea },
  });
  return columns;
}

/** The plan columns an unlink clears. */
export const unlinkedColumns = {
  measuredDragArea: null,
  measuredSource: null,
  measuredSheetId: null,
  measuredConfigurationCode: null,
  measuredConfigurationLabel: null,
  measuredYaw: null,
  measuredSheetDragArea: null,
  measuredSheetUncertainty: null,
  measuredScale: null,
  measuredExpandedUncertainty: null,
  measuredLinkedBy: null,
  measuredLinkedAt: null,
} as const;

/** The measured values of `plans` as the client reads them, by plan id, with each linked sheet's current state. */
export async function measuredLinks(knex: Knex, plans: readonly Plan[]): Promise<Map<string, MeasuredLink | null>> {
  const sheetIds = [...new Set(plans.map((p) => p.measuredSheetId).filter((id): id is string => id !== null))];
  const userIds = [...new Set(plans.map((p) => p.measuredLinkedBy).filter((id): id is string => id !== null))];
  const sheets = sheetIds.length ? await ResultSheet.query(knex).select('id', 'reportNumber', 'state').whereIn('id', sheetIds) : [];
  const users = userIds.length ? await User.query(knex).select('id', 'name').whereIn('id', userIds) : [];
  const links = new Map<string, MeasuredLink | null>();
  for (const plan of plans) {
    if (plan.measuredDragArea === null) {
      links.set(plan.id, null);
      continue;
    }
    const sheet = sheets.find((s) => s.id === plan.measuredSheetId);
    const certified: CertifiedResultSource | null =
      plan.measuredSheetId !== null && sheet
        ? {
            sheetId: sheet.id,
            reportNumber: sheet.reportNumber,
            sheetState: sheet.state,
            configurationCode: plan.measuredConfigurationCode ?? '',
            configurationLabel: plan.measuredConfigurationLabel ?? '',
            yaw: plan.measuredYaw ?? 0,
            sheetDragArea: plan.measuredSheetDragArea ?? 0,
            sheetExpandedUncertainty: plan.measuredSheetUncertainty ?? 0,
            scale: plan.measuredScale ?? 1,
            linkedBy: users.find((u) => u.id === plan.measuredLinkedBy)?.name ?? 'Former user',
            linkedAt: (plan.measuredLinkedAt ?? plan.updatedAt).toISOString(),
          }
        : null;
    links.set(plan.id, { dragArea: plan.measuredDragArea, expandedUncertainty: plan.measuredExpandedUncertainty, source: plan.measuredSource ?? '', certified });
  }
  return links;
}
