/**
 * Turboprop: shaft power falls as a power of density.
 */
// @ts-nocheck

import { band } from '../../assumptions/typical-range';
import { turbopropLapse } from '../lapse';
import { definePropulsion } from './descriptor';

export const turboprop = definePropulsion({
  kind: 'turboprop',
  title: 'Turboprop',
  propeller: true,
  lapse: (sigma, inputs) => turbopropLapse(sigma, inputs.lapseExponent),
  lapseExponent: {
    default: 0.75,
    typical: {
      low: 0.7,
      high: 0.9,
      text: '0.7-0.9 (common practice)',
      note: 'turboprop 0.7–0.9',
      bands: [band(0.7, 0.9, 'turboprop lapse exponent 0.7-0.9 (common practice)')],
    },
  },
  lapseModels: ['density'],
  needsCriticalAltitude: false,
  cd0Band: 0,
  methods:
    '- **turboprop**: alpha = sigma^m, m = 0.75 by default (common practice, 0.7-0.9), a lapse of shaft power. ' +
    "Mattingly's turboprop model is a lapse of installed thrust that includes the propeller, which Loftpoint counts through eta_p, " +
    'so it is not offered here; no Mach effect on shaft power is modelled.',
});
