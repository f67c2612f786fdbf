/**
 * Turbofan or turbojet: thrust falls as a power of density.
 */
import { band } from '../../assumptions/typical-range';
import { turbofanLapse } from '../lapse';
import { definePropulsion } from './descriptor';

export const turbofan = definePropulsion({
  kind: 'turbofan',
  title: 'Turbofan',
  propeller: false,
  lapse: (sigma, inputs) => turbofanLapse(sigma, inputs.lapseExponent),
  lapseExponent: {
    default: 1,
    typical: {
      low: 0.6,
      high: 1,
      text: '0.6-1 (common practice)',
      note: 'turbofan 0.6–1',
      bands: [band(0.6, 1, 'turbofan lapse exponent 0.6-1 (common range)')],
    },
  },
  needsCriticalAltitude: false,
  cd0Band: 1,
  methods:
    '- **turbofan**: alpha = sigma^m, m = 1 by default: thrust in proportion to density (Anderson, *Introduction to Flight*; from memory; ' +
    'common range 0.6-1). No Mach or flat-rating effect, so the cruise lapse is optimistic.',
});
