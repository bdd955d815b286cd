/**
 * Everything a certified result sheet states, already decided and checked by the approval workflow.
 * The renderer only lays it out; it computes nothing but ranges for the test-condition summary.
 * Units: pressures Pa, temperature °C, relative humidity %, density kg/m³, speed m/s, angles deg, areas m², lengths m.
 * Dates are ISO 8601 calendar dates (YYYY-MM-DD) in the laboratory's time zone.
 */

/** A value with its expanded uncertainty U (coverage factor k = 2, about 95 %), in the value's unit. */
export interface MeasuredValue {
  value: number;
  expandedUncertainty: number;
}

/** Reference area kinds a coefficient can be based on. */
export type ReferenceAreaKind = 'frontal' | 'planform' | 'wetted' | 'other';

/** Air state and flow of one point, as measured (means over the point). */
export interface PointConditions {
  barometricPressure: number;
  temperature: number;
  relativeHumidity: number;
  density: number;
  /** Corrected test-section speed, m/s. */
  speed: number;
  /** Corrected dynamic pressure q, Pa. */
  dynamicPressure: number;
  /** Reynolds number on the reference length. */
  reynoldsNumber: number;
}

/** One reported point: its setpoint, conditions and corrected coefficients. */
export interface ResultPoint {
  point: number;
  /** Yaw setpoint, deg. */
  yaw: number;
  conditions: PointConditions;
  dragCoefficient: MeasuredValue;
  liftCoefficient: MeasuredValue;
  sideForceCoefficient: MeasuredValue;
  rollingMomentCoefficient: MeasuredValue;
  pitchingMomentCoefficient: MeasuredValue;
  yawingMomentCoefficient: MeasuredValue;
  /** Drag area C_D·S, m². */
  dragArea: MeasuredValue;
}

/** One configuration of the article, measured in one run. */
export interface ResultConfiguration {
  /** Short code printed in tables and chart legends, e.g. "A". */
  code: string;
  label: string;
  description: string;
  runNumber: string;
  /** What was swept: yaw at constant speed, or speed (Reynolds number) at constant yaw. */
  sweep: 'yaw' | 'reynolds';
  points: ResultPoint[];
}

/** A point measured but not reported, with the reason. */
export interface ExcludedPoint {
  configurationCode: string;
  runNumber: string;
  point: number;
  reason: string;
}

/** A departure from, addition to or exclusion from the documented method. */
export interface MethodDeviation {
  kind: 'deviation' | 'addition' | 'exclusion';
  description: string;
  reason: string;
}

/** Work done by an external provider that contributes to the results. */
export interface ExternalProvider {
  name: string;
  activity: string;
  /** Which results depend on it. */
  affectedResults: string;
}

/** Sampling: either not applicable (items tested as received) with the reason, or the plan and method used. */
export type SamplingStatement =
  | { applicable: false; reason: string }
  | { applicable: true; plan: string; method: string; date: string };

export interface ResultSheetData {
  laboratory: {
    name: string;
    addressLines: string[];
    /** Where the tests were carried out (facility and site). */
    testLocation: string;
    phone: string;
    email: string;
  };
  report: {
    /** Unique report number, e.g. "TW-2026-0147". */
    number: string;
    revision: number;
    title: string;
    /** The revision this one replaces, if any, and why. */
    replaces?: { number: string; revision: number; reason: string };
    /** Set when a later revision supersedes this one. */
    supersededBy?: { number: string; revision: number; issueDate: string; reason: string };
  };
  customer: {
    name: string;
    addressLines: string[];
    contactName: string;
    contactEmail: string;
    /** Customer's order or booking reference. */
    orderReference: string;
  };
  method: {
    /** The laboratory's documented method, e.g. "TW-M-04 issue 3 — force and moment testing of road vehicles". */
    documentedMethod: string;
    standardsFollowed: string[];
    correctionMethods: string[];
    densityModel: string;
    engineVersion: string;
    uncertaintyMethod: string;
    facility: string;
    balance: string;
  };
  article: {
    description: string;
    identification: string;
    conditionOnReceipt: string;
    referenceArea: number;
    referenceAreaKind: ReferenceAreaKind;
    referenceLength: number;
    /** Model scale as the full-scale to model ratio, e.g. 4 for 1:4. */
    scale: number;
  };
  dates: {
    /** Day the item was received, `YYYY-MM-DD`; null when the laboratory did not record it. */
    receipt: string | null;
    testDates: string[];
    issue: string;
  };
  configurations: ResultConfiguration[];
  deviations: MethodDeviation[];
  exclusions: ExcludedPoint[];
  externalProviders: ExternalProvider[];
  sampling: SamplingStatement;
  authorisation: { name: string; role: string; date: string };
  /** `${PUBLIC_URL}/verify/<report number>`, from `verificationUrl`. */
  verificationUrl: string;
}

/**
 * The public address at which anyone holding the sheet can check it was issued and is current.
 *
 * @example verificationUrl('https://lab.example', 'TW-2026-0147') // 'https://lab.example/verify/TW-2026-0147'
 */
export function verificationUrl(publicUrl: string, reportNumber: string): string {
  return `${publicUrl.replace(/\/+$/, '')}/verify/${encodeURIComponent(reportNumber)}`;
}
