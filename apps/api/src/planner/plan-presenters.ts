import { PLANNER_CAUTION, SHAPE_LIBRARY, type AreaRule, type ShapeEntry } from '@tunnelwright/aero';
import type { MeasuredLink, PlanInput, PlanSummary, PlanVersion as PlanVersionDto, ShapeAreaRule, ShapeInfo, ShapeList } from '@tunnelwright/contracts';
import type { Plan, PlanVersion } from '@tunnelwright/db';

/** `plan.organisation` should be loaded for the organisation's name; `measured` comes from `measuredLinks`. */
export function toPlanSummary(plan: Plan, measured: MeasuredLink | null): PlanSummary {
  return {
    id: plan.id,
    organisationId: plan.organisationId,
    organisationName: plan.organisation?.name ?? '',
    name: plan.name,
    currentVersion: plan.currentVersion,
    bookingId: plan.bookingId,
    measured,
    createdAt: plan.createdAt.toISOString(),
    updatedAt: plan.updatedAt.toISOString(),
  };
}

export function toPlanVersion(version: PlanVersion): PlanVersionDto {
  return {
    id: version.id,
    version: version.version,
    // Stored only after validation against the plan input schema.
    input: version.input as unknown as PlanInput,
    note: version.note,
    createdBy: version.createdBy,
    createdAt: version.createdAt.toISOString(),
  };
}

function toAreaRule(rule: AreaRule): ShapeAreaRule {
  return { basis: rule.basis, formula: rule.formula, dimensions: [...rule.dimensions] };
}

function toShapeInfo(entry: ShapeEntry): ShapeInfo {
  return {
    id: entry.id,
    label: entry.label,
    kind: entry.kind,
    family: entry.family,
    orientation: entry.orientation,
    dragCoefficient: entry.dragCoefficient,
    referenceArea: toAreaRule(entry.referenceArea),
    frontalArea: entry.frontalArea ? toAreaRule(entry.frontalArea) : null,
    characteristicLength: entry.characteristicLength ? { ...entry.characteristicLength } : null,
    reynoldsRange: entry.reynoldsRange ? { ...entry.reynoldsRange } : null,
    edges: entry.edges,
    typicalFrontalArea: entry.typicalFrontalArea ?? null,
    source: { citation: entry.source.citation, corroboration: entry.source.corroboration ?? null },
    fromMemory: entry.fromMemory,
    note: entry.note ?? null,
  };
}

/** The shape library as the client reads it: every entry without its area evaluators, with the caution. */
export function shapeList(): ShapeList {
  return { items: SHAPE_LIBRARY.map(toShapeInfo), caution: PLANNER_CAUTION };
}
