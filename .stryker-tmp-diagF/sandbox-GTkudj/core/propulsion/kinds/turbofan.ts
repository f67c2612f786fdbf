/**
 * Turbofan or turbojet: installed thrust lapses with flight Mach number and
 * the air (Mattingly's models, core/propulsion/turbine-lapse.ts), or, chosen
 * with lapseModel "density" or by giving an exponent, as a power of density.
 */
// @ts-nocheck

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
  lapseModels: ['high-bypass', 'low-bypass-mixed', 'turbojet', 'density'],
  needsCriticalAltitude: false,
  cd0Band: 1,
  methods:
    '- **turbofan**: by default the installed-thrust lapse of a high-bypass turbofan with flight Mach number M0 and the air ' +
    '(Mattingly, Heiser and Pratt, *Aircraft Engine Design*, 2nd ed., AIAA 2002, section 2.3.2, eq. 2.54; coefficients from memory), ' +
    'with theta0 = theta (1 + 0.2 M0^2), delta0 = delta (1 + 0.2 M0^2)^3.5 and the throttle ratio TR (`throttleRatio`, 1 by default: ' +
    'the break at the sea-level standard day, no flat rating; an engine flat-rated to ISA+15 K has TR = 303.15/288.15 = 1.052):\n' +
    '  - `"lapseModel": "high-bypass"`: alpha = delta0 (1 - 0.49 sqrt(M0)), less 3 (theta0 - TR)/(1.5 + M0) inside the bracket where theta0 > TR.\n' +
    '  - `"low-bypass-mixed"` (maximum thrust, reheat where fitted): alpha = delta0, times 1 - 3.5 (theta0 - TR)/theta0 where theta0 > TR.\n' +
    '  - `"turbojet"` (maximum thrust): alpha = delta0 (1 - 0.3 (theta0 - 1) - 0.1 sqrt(M0)), less 1.5 (theta0 - TR)/theta0 where theta0 > TR.\n' +
    '  - `"density"`: alpha = sigma^m, m = 1 by default: thrust in proportion to density (Anderson, *Introduction to Flight*; from memory; ' +
    'common range 0.6-1). No Mach or flat-rating effect, so the cruise and ceiling lapse is optimistic (about 1.6 times the high-bypass ' +
    'value at M0.72 and 37,000 ft). A file that gives `lapseExponent` and no model keeps this model, as before.\n' +
    '  Each boundary takes the lapse at its own flight speed: the given or best-rate speed, V2 for a climb gradient, and the mean ' +
    'roll speed 0.7 V_LOF for the take-off ground roll. Negative alpha (far above the break) counts as no thrust.',
});
