/**
 * Stall speed: a wing-loading limit from the landing configuration's C_Lmax.
 */
// @ts-nocheck

import { stallBoundary, type StallRequirement } from '../constraints/stall';
import { formatQuantity } from '../units/display';
import { defineRequirement } from './descriptor';
import { positiveSpeed, speedValue } from './fields';

export type { StallRequirement };

export const stall = defineRequirement<'stall', StallRequirement, { speed: typeof positiveSpeed }>({
  kind: 'stall',
  title: 'Stall speed',
  colour: '#33658a', // harbour blue
  shape: { speed: positiveSpeed },
  resolve: (r, si) => ({ speedMps: si(r.speed, 'speed', NaN) }),
  drawnAs: 'limit',
  boundary: stallBoundary,
  speedText: 'the required stall speed (CAS, taken as EAS)',
  defaultConfiguration: 'landing',
  propeller: null,
  atmosphere: { altitude: false, temperature: false },
  editorFields: [{ key: 'speed', title: 'Stall speed (CAS)', value: speedValue(), required: true }],
  newRequirement: { speed: '50 kt' },
  summary: (r, system) => [`${formatQuantity(r.speedMps, 'speed', system)} CAS`],
  costStep: { field: 'speedMps', conceptField: 'speed', relaxed: 'up' },
  typicalRanges: [],
  templates: [
    {
      code: 'part-23',
      id: '14cfr-23.49c', title: 'Stall speed, landing configuration, 61 kt CAS', source: '14 CFR 23.49(c) (before Amendment 23-64)',
      note: 'V_SO at most 61 kt CAS for single-engine airplanes, and for twins of 6000 lb or less that do not meet 23.67(a)(1).',
      configurations: ['landing'],
      requirement: { kind: 'stall', speed: '61 kt' },
    },
    {
      code: 'sailplane',
      id: 'cs-22.49', title: 'Sailplane stall speed, 80 km/h', source: 'EASA CS 22.49',
      note: 'V_S0 at most 80 km/h at maximum weight, landing configuration.',
      configurations: ['landing'],
      requirement: { kind: 'stall', speed: '80 km/h' },
    },
  ],
  methods: `### Stall speed (\`stall\`)

A limit: the wing may carry at most the load that the configuration's maximum lift holds at the required stall speed.

    w <= 1/2 rho0 V_E^2 C_Lmax,c / beta

- V_E: the required stall speed. The file gives it as calibrated airspeed (CAS), the way certification rules state it; it is taken as equivalent airspeed, which differs by less than 0.1 % below Mach 0.3, so sea-level density rho0 applies and the altitude does not matter.
- C_Lmax,c: the maximum lift coefficient of the requirement's configuration (landing flaps by default).
- beta: the mass fraction at the requirement.
- Valid for a quasi-steady 1 g stall; power effects on C_Lmax are not modelled.
- Source: Anderson, *Introduction to Flight*, stalling speed.`,
});
