import type { ReferenceAreaKind } from '@tunnelwright/contracts';

/** How each kind of reference area reads when a customer picks the basis of their coefficients. */
export const referenceAreaKindLabels: Readonly<Record<ReferenceAreaKind, string>> = {
  frontal: 'Frontal area',
  planform: 'Planform area',
  wetted: 'Wetted area',
  other: 'Other (say which in the description)',
};
