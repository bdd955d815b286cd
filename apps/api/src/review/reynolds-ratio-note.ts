/** Ratios within this band of 1 are called "about the same" (a display choice, not a published limit). */
const SAME_BAND = 0.05;

const SCALE_SOURCE = 'Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 1 on scale effects (from memory)';

/**
 * Plain words on the model-to-full-scale Reynolds-number ratio Re_model / Re_full.
 *
 * Below 1 the model ran at a lower Re than the full-scale vehicle meets; flow features that depend on Re
 * (boundary-layer transition, separation from rounded edges, the drag crisis) may then sit differently on the model,
 * and a speed sweep in which C_D stays flat is the usual support for using the tunnel value (Barlow, Rae & Pope
 * 1999, ch. 1 — from memory).
 *
 * @param ratio - Re_model / Re_full (dimensionless, > 0)
 * @returns a sentence for the analyst, naming its source
 */
export function reynoldsRatioNote(ratio: number): string {
  const shown = ratio.toPrecision(2);
  if (Math.abs(ratio - 1) <= SAME_BAND) {
    return `The model ran at about the full-scale Reynolds number (ratio ${shown}), so Reynolds-number scale effects should be small at this condition (${SCALE_SOURCE}).`;
  }
  if (ratio < 1) {
    return (
      `The model ran at a lower Reynolds number than the full-scale vehicle meets here (ratio ${shown}). ` +
      'Where the flow depends on Reynolds number, such as boundary-layer transition, separation from rounded edges or the drag crisis, ' +
      'the tunnel C_D may not capture full-scale behaviour; a speed sweep in which C_D stays flat supports using it ' +
      `(${SCALE_SOURCE}).`
    );
  }
  return (
    `The model ran at a higher Reynolds number than the full-scale vehicle meets here (ratio ${shown}). ` +
    'Transition and separation may then sit differently on the model than at full scale; compare with a run at lower speed ' +
    `(${SCALE_SOURCE}).`
  );
}
