/**
 * Cruise speed: level, unaccelerated flight at a true airspeed and altitude.
 */
// @ts-nocheck

import { PROPELLER_CRUISE } from '../assumptions/typical-ranges';
import { cruiseBoundary, type CruiseRequirement } from '../constraints/cruise';
import { atmosphere } from '../atmosphere';
import { formatQuantity } from '../units/display';
import { defineRequirement } from './descriptor';
import { trueAirspeed, trueSpeedValue } from './fields';

export type { CruiseRequirement };

export const cruise = defineRequirement<'cruise', CruiseRequirement, { speed: typeof trueAirspeed }>({
  kind: 'cruise',
  title: 'Cruise speed',
  colour: '#2e7d5b', // pine
  shape: { speed: trueAirspeed },
  resolve: (r, si) => ({ speedMps: si(r.speed, 'speed', NaN) }),
  drawnAs: 'curve',
  boundary: cruiseBoundary,
  speedText: 'the required cruise speed (TAS)',
  defaultConfiguration: 'clean',
  propeller: { default: 0.8, typical: PROPELLER_CRUISE },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [{ key: 'speed', title: 'Cruise speed (TAS)', value: trueSpeedValue(), required: true }],
  newRequirement: { speed: '150 kt', altitude: '8000 ft' },
  // A jet's cruise reads as a Mach number first (M = V/a at its own air).
  summary: (r, system) => {
    const mach = r.speedMps / atmosphere(r.altitudeM, r.temperatureOffsetK).speedOfSoundMps;
    const tas = `${formatQuantity(r.speedMps, 'speed', system)} TAS`;
    return [mach >= 0.4 ? `M${mach.toFixed(2)} (${tas})` : tas];
  },
  costStep: { field: 'speedMps', conceptField: 'speed', relaxed: 'down' },
  unattainableField: () => 'speed',
  typicalRanges: [],
  templates: [],
  methods: `### Cruise speed (\`cruise\`)

A curve: the master equation (section 6.1) in level flight, n = 1 and P_s = 0, at the required true airspeed and the cruise altitude, temperature offset, mass fraction and power setting.

- Propeller aircraft: eta_p 0.8 by default (about 0.8 typical in cruise, common practice).
- Where the speed is below the configuration's stall speed at a wing loading (C_L needed above C_Lmax) the curve has no value there.
- Source: Mattingly, Heiser and Pratt, *Aircraft Engine Design*, constraint analysis.`,
});
