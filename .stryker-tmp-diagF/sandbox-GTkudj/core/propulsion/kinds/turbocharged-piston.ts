/**
 * Turbocharged piston engine: rated power held up to a critical altitude.
 */
// @ts-nocheck

import { atmosphere } from '../../atmosphere';
import { turbochargedPistonLapse } from '../lapse';
import { definePropulsion } from './descriptor';

export const turbochargedPiston = definePropulsion({
  kind: 'turbocharged-piston',
  title: 'Turbocharged piston',
  propeller: true,
  // sigma_crit is the standard day's (dT = 0) at the critical altitude.
  lapse: (sigma, inputs) => turbochargedPistonLapse(sigma, atmosphere(inputs.criticalAltitudeM ?? 0, 0).sigma),
  lapseExponent: null,
  lapseModels: ['density'],
  needsCriticalAltitude: true,
  cd0Band: 0,
  methods:
    '- **turbocharged piston**: alpha = 1 while sigma >= sigma_crit, else the piston lapse of sigma/sigma_crit; sigma_crit is the ' +
    'standard day\'s density ratio at the critical altitude (common practice).',
});
