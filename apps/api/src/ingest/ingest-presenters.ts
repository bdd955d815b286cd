import { DESIGN_CAUTION } from '@tunnelwright/aero';
import type { Article, Balance as BalanceDto, Calibration, RawFileSummary, ReductionView, Run as RunDto, Test } from '@tunnelwright/contracts';
import type { Balance, BalanceCalibration, RawFile, Reduction, ReductionPoint, Run, TestArticle, TestRecord } from '@tunnelwright/db';
import { isOverdue } from './calibration-check';

/** Contract shapes of the ingest models. */
export function toArticle(a: TestArticle): Article {
  return {
    id: a.id,
    organisationId: a.organisationId,
    name: a.name,
    description: a.description,
    kind: a.kind,
    conditionOnReceipt: a.conditionOnReceipt,
    receivedOn: a.receivedOn ?? null,
    referenceArea: a.referenceArea,
    referenceAreaKind: a.referenceAreaKind,
    referenceLength: a.referenceLength,
    volume: a.volume,
    frontalArea: a.frontalArea,
    momentCentre: { x: a.momentCentreX, y: a.momentCentreY, z: a.momentCentreZ },
    scale: a.scale,
    createdAt: a.createdAt.toISOString(),
    updatedAt: a.updatedAt.toISOString(),
  };
}

export function toCalibration(c: BalanceCalibration): Calibration {
  return {
    id: c.id,
    balanceId: c.balanceId,
    version: c.version,
    matrices: c.matrices,
    calibratedOn: c.calibratedOn,
    dueOn: c.dueOn,
    overdue: isOverdue(c),
    enteredBy: c.enteredBy,
    createdAt: c.createdAt.toISOString(),
  };
}

export function toBalance(b: Balance, current: BalanceCalibration | undefined): BalanceDto {
  return {
    id: b.id,
    identifier: b.identifier,
    description: b.description,
    capacities: b.capacities,
    tunnelId: b.tunnelId ?? null,
    currentCalibration: current ? toCalibration(current) : null,
    createdAt: b.createdAt.toISOString(),
    updatedAt: b.updatedAt.toISOString(),
  };
}

export function toTest(t: TestRecord): Test {
  return {
    id: t.id,
    organisationId: t.organisationId,
    articleId: t.articleId,
    tunnelId: t.tunnelId,
    balanceId: t.balanceId,
    bookingId: t.bookingId,
    title: t.title,
    state: t.state,
    configurations: t.configurations,
    reductionSettings: t.reductionSettings,
    createdAt: t.createdAt.toISOString(),
    updatedAt: t.updatedAt.toISOString(),
  };
}

export function toRawFile(f: RawFile): RawFileSummary {
  return { id: f.id, runId: f.runId, originalName: f.originalName, size: f.size, sha256: f.sha256, createdAt: f.createdAt.toISOString() };
}

export function toRun(r: Run, rawFiles: RawFile[]): RunDto {
  return {
    id: r.id,
    testId: r.testId,
    runNumber: r.runNumber,
    kind: r.kind,
    configurationLabel: r.configurationLabel,
    notes: r.notes,
    rawFiles: rawFiles.map(toRawFile),
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

export function toReduction(r: Reduction, pointCount: number): ReductionView {
  return {
    id: r.id,
    runId: r.runId,
    rawFileId: r.rawFileId,
    version: r.version,
    engineVersion: r.engineVersion,
    state: r.state,
    progress: r.progress,
    error: r.errorCode ? { code: r.errorCode, message: r.errorMessage ?? '', line: r.errorLine, column: r.errorColumn } : null,
    inputSha256: r.inputSha256,
    config: r.config,
    warnings: r.warnings as Record<string, unknown>[],
    summary: r.summary,
    pointCount,
    caution: DESIGN_CAUTION,
    createdBy: r.createdBy,
    startedAt: r.startedAt ? new Date(r.startedAt).toISOString() : null,
    finishedAt: r.finishedAt ? new Date(r.finishedAt).toISOString() : null,
    createdAt: r.createdAt.toISOString(),
  };
}

/** A point's key columns, and with `full` everything the engine reported. */
export function toPoint(p: ReductionPoint, full: boolean) {
  return {
    index: p.index,
    pointNumber: p.pointNumber,
    sampleCount: p.sampleCount,
    yaw: p.yaw,
    pitch: p.pitch,
    dynamicPressure: p.dynamicPressure,
    speed: p.speed,
    reynoldsNumber: p.reynoldsNumber,
    cdUncorrected: p.cdUncorrected,
    cdCorrected: p.cdCorrected,
    clCorrected: p.clCorrected,
    csCorrected: p.csCorrected,
    dragCounts: p.dragCounts,
    result: full ? p.result : {},
  };
}
