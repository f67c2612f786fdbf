/**
 * Electric motor: rated power does not lapse with altitude.
 */
// @ts-nocheck

import { electricLapse } from '../lapse';
import { definePropulsion } from './descriptor';

export const electric = definePropulsion({
  kind: 'electric',
  title: 'Electric',
  propeller: true,
  lapse: () => electricLapse(),
  lapseExponent: null,
  lapseModels: ['density'],
  needsCriticalAltitude: false,
  cd0Band: 3,
  methods: '- **electric**: alpha = 1 at every altitude (a motor needs no air; battery limits are outside the diagram).',
});
