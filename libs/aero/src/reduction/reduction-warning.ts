/**
 * Codes of the warnings a reduction attaches to its result (never silent):
 * - `BLOCKAGE_OVER_7_5`: frontal area over 7.5 % of the section (BRP rule of thumb).
 * - `BLOCKAGE_OVER_10`: over 10 %; classical corrections become doubtful.
 * - `BLOCKAGE_UNKNOWN`: no frontal area, so blockage could not be checked.
 * - `MACH_OVER_0_3`: compressibility is no longer negligible.
 * - `LOAD_OVER_CAPACITY`: a balance component exceeded its capacity.
 * - `FEW_SAMPLES`: a point has fewer samples than configured.
 * - `CIPM_OUT_OF_VALIDITY`: air state outside 600–1100 hPa or 15–27 °C.
 */
export type ReductionWarningCode =
  | 'BLOCKAGE_OVER_7_5'
  | 'BLOCKAGE_OVER_10'
  | 'BLOCKAGE_UNKNOWN'
  | 'MACH_OVER_0_3'
  | 'LOAD_OVER_CAPACITY'
  | 'FEW_SAMPLES'
  | 'CIPM_OUT_OF_VALIDITY';

/** One warning: a code, a sentence, and the point it concerns (absent for the whole run). */
export interface ReductionWarning {
  code: ReductionWarningCode;
  message: string;
  point?: number;
}
