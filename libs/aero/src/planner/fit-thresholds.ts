/**
 * Blockage ratio (model frontal area / test-section area) at and above which the planner warns.
 * Rule of thumb attributed to J. B. Barlow, W. H. Rae, A. Pope, *Low-Speed Wind Tunnel Testing*, 3rd ed., Wiley, 1999
 * (attribution from memory).
 */
export const BLOCKAGE_WARN_RATIO = 0.075;

/** Blockage ratio above which the planner fails the fit; same rule of thumb and attribution (from memory). */
export const BLOCKAGE_FAIL_RATIO = 0.1;

/** Fraction of a balance capacity at and above which the planner warns. Our choice (common practice). */
export const CAPACITY_WARN_FRACTION = 0.8;

/** Fraction of a balance capacity above which the planner fails the fit. Our choice (common practice). */
export const CAPACITY_FAIL_FRACTION = 1;

/**
 * Mach number above which the planner warns: incompressible data reduction is usually accepted up to about
 * M = 0.3 (common practice), where the isentropic stagnation-to-static density ratio (1 + 0.2 M²)^2.5 is 1.046.
 */
export const MACH_WARN = 0.3;

/**
 * Mach number above which the planner fails the fit: our choice; at M = 0.4 the isentropic density ratio is 1.082,
 * an 8 % density change that the planner's incompressible loads ignore.
 */
export const MACH_FAIL = 0.4;

/**
 * Reynolds number above which a sharp-edged article's drag is taken as Reynolds-independent, because separation is
 * fixed at its edges (from memory).
 */
export const SHARP_EDGE_REYNOLDS = 1e4;
