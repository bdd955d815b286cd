/**
 * Caution carried by every reduction result. Tunnel results describe a model in a tunnel; they are not design loads.
 */
export const DESIGN_CAUTION =
  'Wind-tunnel results are not design loads. Design is for a licensed engineer to carry out under the governing code; ' +
  'do not use these figures as design values.';
