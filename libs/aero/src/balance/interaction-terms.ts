/** Number of interaction terms of a six-component balance: 6 squares and 15 cross products. */
export const INTERACTION_TERM_COUNT = 21;

/**
 * Interaction terms H(F) of a six-component balance calibration: squares, then cross products.
 *
 * H = [F1², F2², …, F6², F1F2, F1F3, …, F1F6, F2F3, …, F5F6] (products i < j in row order).
 * Source: AIAA R-091-2003, *Calibration and Use of Internal Strain-Gage Balances*, and Ulbrich,
 * NASA NTRS 20120006665, which fit gauge outputs on such terms (the full sets also hold |F| terms).
 *
 * @param loads - F1…F6 in N and N·m
 * @param out - receives the 21 terms (N², N·N·m, (N·m)²); reused to avoid allocation
 * @returns `out`
 * @throws nothing: NaN loads give NaN terms
 * @example
 * interactionTerms([1, 2, 0, 0, 0, 0], new Float64Array(21))[6]; // F1·F2 = 2
 */
export function interactionTerms(loads: ArrayLike<number>, out: Float64Array): Float64Array {
  for (let i = 0; i < 6; i++) out[i] = loads[i] * loads[i];
  let k = 6;
  for (let i = 0; i < 5; i++) for (let j = i + 1; j < 6; j++) out[k++] = loads[i] * loads[j];
  return out;
}
