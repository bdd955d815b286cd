import type { TunnelKind } from '@tunnelwright/contracts';

/** Plain names of the tunnel kinds. */
export const tunnelKindLabels: Readonly<Record<TunnelKind, string>> = {
  closed: 'Closed test section',
  open_jet: 'Open jet',
};
