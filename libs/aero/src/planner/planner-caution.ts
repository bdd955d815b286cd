/**
 * Caution carried by every planner result. Planner numbers size a tunnel test; they are not design values.
 */
export const PLANNER_CAUTION =
  'Planning estimate only, not a design value: design loads are for a licensed engineer to determine under the local code.';
