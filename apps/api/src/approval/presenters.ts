import { DESIGN_CAUTION } from '@tunnelwright/aero';
import type {
  PointExclusion as PointExclusionDto,
  ResultSheet as ResultSheetDto,
  SigningRight as SigningRightDto,
  Submission as SubmissionDto,
} from '@tunnelwright/contracts';
import { Organisation, PointExclusion, RawFile, Reduction, ReductionPoint, ResultSheet, Run, SigningRight, Submission, TestRecord, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { verificationUrl } from '../reports/result-sheet-data';

type People = Map<string, User>;

async function people(knex: Knex, ids: (string | null | undefined)[]): Promise<People> {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))];
  const users = wanted.length > 0 ? await User.query(knex).whereIn('id', wanted) : [];
  return new Map(users.map((u) => [u.id, u]));
}

function person(map: People, id: string): { id: string; name: string } {
  return { id, name: map.get(id)?.name ?? 'Former user' };
}

export async function toSigningRights(knex: Knex, rights: SigningRight[]): Promise<SigningRightDto[]> {
  const map = await people(knex, rights.flatMap((r) => [r.userId, r.grantedBy, r.revokedBy]));
  return rights.map((r) => {
    const user = map.get(r.userId);
    return {
      id: r.id,
      user: { id: r.userId, name: user?.name ?? 'Former user', email: user?.email ?? '', role: user?.role ?? '' },
      grantedBy: person(map, r.grantedBy),
      grantedAt: r.createdAt.toISOString(),
      scopeNote: r.scopeNote,
      revokedAt: r.revokedAt?.toISOString() ?? null,
      revokedBy: r.revokedBy ? person(map, r.revokedBy) : null,
      revokedReason: r.revokedReason,
    };
  });
}

export async function toExclusions(knex: Knex, exclusions: PointExclusion[]): Promise<PointExclusionDto[]> {
  const map = await people(knex, exclusions.map((e) => e.excludedBy));
  const points = exclusions.length > 0 ? await ReductionPoint.query(knex).select('reductionId', 'index', 'pointNumber').whereIn('reductionId', [...new Set(exclusions.map((e) => e.reductionId))]) : [];
  return exclusions.map((e) => ({
    id: e.id,
    reductionId: e.reductionId,
    pointIndex: e.pointIndex,
    pointNumber: points.find((p) => p.reductionId === e.reductionId && p.index === e.pointIndex)?.pointNumber ?? e.pointIndex + 1,
    reason: e.reason,
    excludedBy: person(map, e.excludedBy),
    createdAt: e.createdAt.toISOString(),
  }));
}

export async function toSubmissions(knex: Knex, submissions: Submission[]): Promise<SubmissionDto[]> {
  if (submissions.length === 0) return [];
  const ids = submissions.map((s) => s.id);
  const links = (await knex('submissionReductions').whereIn('submissionId', ids)) as { submissionId: string; reductionId: string; runId: string }[];
  const reductions = await Reduction.query(knex).whereIn('id', links.map((l) => l.reductionId));
  const runs = await Run.query(knex).whereIn('id', links.map((l) => l.runId));
  const files = await RawFile.query(knex).whereIn('id', reductions.map((r) => r.rawFileId));
  const sheets = await ResultSheet.query(knex).select('id', 'submissionId', 'reportNumber', 'state').whereIn('submissionId', ids);
  const counts = (await knex('pointExclusions').select('reductionId').count('* as count').whereIn('reductionId', reductions.map((r) => r.id)).groupBy('reductionId')) as { reductionId: string; count: string }[];
  const map = await people(knex, [...submissions.flatMap((s) => [s.submittedBy, s.decidedBy]), ...files.map((f) => f.uploadedBy)]);
  return submissions.map((s) => {
    const sheet = sheets.find((x) => x.submissionId === s.id);
    return {
      id: s.id,
      testId: s.testId,
      sequence: s.sequence,
      state: s.state,
      note: s.note,
      submittedBy: person(map, s.submittedBy),
      submittedAt: s.createdAt.toISOString(),
      decidedBy: s.decidedBy ? person(map, s.decidedBy) : null,
      decidedAt: s.decidedAt?.toISOString() ?? null,
      decisionReason: s.decisionReason,
      reductions: links
        .filter((l) => l.submissionId === s.id)
        .map((l) => {
          const reduction = reductions.find((r) => r.id === l.reductionId)!;
          const run = runs.find((r) => r.id === l.runId)!;
          const file = files.find((f) => f.id === reduction.rawFileId)!;
          return {
            reductionId: l.reductionId,
            runId: l.runId,
            runNumber: run.runNumber,
            runKind: run.kind,
            configurationLabel: run.configurationLabel,
            version: reduction.version,
            uploadedBy: person(map, file.uploadedBy),
            excludedPoints: Number(counts.find((c) => c.reductionId === l.reductionId)?.count ?? 0),
          };
        })
        .sort((a, b) => a.runNumber - b.runNumber),
      sheet: sheet ? { id: sheet.id, reportNumber: sheet.reportNumber, state: sheet.state } : null,
    };
  });
}

/** Sheets as the client sees them; the PDF bytes and the stored sheet data stay on the server. */
export async function toResultSheets(knex: Knex, sheets: ResultSheet[], publicUrl: string): Promise<ResultSheetDto[]> {
  if (sheets.length === 0) return [];
  const related = await ResultSheet.query(knex)
    .select('id', 'reportNumber', 'issueDate')
    .whereIn('id', sheets.flatMap((s) => [s.supersedesId, s.supersededById]).filter((id): id is string => !!id));
  const tests = await TestRecord.query(knex).select('id', 'title', 'organisationId').whereIn('id', sheets.map((s) => s.testId));
  const organisations = await Organisation.query(knex).select('id', 'name').whereIn('id', tests.map((t) => t.organisationId));
  const map = await people(knex, sheets.map((s) => s.authorisedBy));
  const ref = (id: string | null) => {
    const found = id ? related.find((r) => r.id === id) : undefined;
    return found ? { id: found.id, reportNumber: found.reportNumber, issueDate: found.issueDate } : null;
  };
  return sheets.map((s) => {
    const test = tests.find((t) => t.id === s.testId)!;
    const signer = map.get(s.authorisedBy);
    return {
      id: s.id,
      testId: s.testId,
      testTitle: test.title,
      organisationId: test.organisationId,
      organisationName: organisations.find((o) => o.id === test.organisationId)?.name ?? '',
      series: s.series,
      revision: s.revision,
      reportNumber: s.reportNumber,
      state: s.state,
      issueDate: s.issueDate,
      issuedAt: s.createdAt.toISOString(),
      sha256: s.sha256.trim(),
      size: s.size,
      pageCount: s.pageCount,
      revisionReason: s.revisionReason,
      supersedes: ref(s.supersedesId),
      supersededBy: ref(s.supersededById),
      authorisedBy: { name: signer?.name ?? 'Former user', role: signer?.role === 'lab_manager' ? 'Laboratory manager, authorised signatory' : 'Analyst, authorised signatory' },
      verificationUrl: verificationUrl(publicUrl, s.reportNumber),
      caution: DESIGN_CAUTION,
    };
  });
}

/** The columns of a sheet without its PDF bytes and stored data, for lists. */
export const sheetListColumns = [
  'id',
  'testId',
  'submissionId',
  'series',
  'revision',
  'reportNumber',
  'state',
  'revisionReason',
  'supersedesId',
  'supersededById',
  'supersededAt',
  'issueDate',
  'issuedBy',
  'authorisedBy',
  'sha256',
  'size',
  'pageCount',
  'createdAt',
  'updatedAt',
] as const;
