import type { ServiceUnit } from '@tunnelwright/contracts';

/** How a service's charging unit reads after a price, e.g. "per hour". */
export const serviceUnitLabels: Readonly<Record<ServiceUnit, string>> = {
  hour: 'per hour',
  half_day: 'per half day',
  day: 'per day',
  item: 'per item',
};
