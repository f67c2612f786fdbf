/**
 * Maximum speed: level flight at a top speed with full power or thrust
 * (or the power setting given), written as TAS, EAS or a Mach number.
 */
import * as z from 'zod';
import { PROPELLER_CRUISE } from '../assumptions/typical-ranges';
import { atmosphere } from '../atmosphere';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import { flightCondition } from '../constraints/flight-condition';
import { loadingRequired } from '../constraints/master-equation';
import { formatQuantity } from '../units/display';
import { parseQuantity } from '../units/quantity';
import type { RequirementCommon } from './common';
import { defineRequirement } from './descriptor';
import { trueAirspeed, trueSpeedValue } from './fields';

export interface MaximumSpeedRequirement extends RequirementCommon {
  kind: 'maximum-speed';
  /** The top speed as written, in m/s: TAS, or EAS where `equivalent`. */
  speedMps: number;
  /** True: speedMps is an equivalent airspeed, turned into TAS at the requirement's air. */
  equivalent: boolean;
  /** The Mach number where the file gives one. */
  mach?: number;
}

const shape = {
  speed: trueAirspeed,
  /** "TAS" (default) or "EAS"; a Mach number needs neither. */
  airspeed: z.enum(['TAS', 'EAS']).optional(),
};

/** V = V_E / sqrt(sigma) for an EAS (Anderson, Introduction to Flight). */
function trueSpeed(r: MaximumSpeedRequirement): number {
  return r.equivalent ? r.speedMps / Math.sqrt(atmosphere(r.altitudeM, r.temperatureOffsetK).sigma) : r.speedMps;
}

/** Master equation with n = 1, P_s = 0 at the top speed (Mattingly; core/methods.md section 6). */
function maximumSpeedBoundary(requirement: MaximumSpeedRequirement, aircraft: Aircraft): BoundaryOf<'maximum-speed'> {
  const c = flightCondition(requirement, aircraft);
  const v = trueSpeed(requirement);
  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required: (w: number): number => loadingRequired(c, w, v, 1, 0),
    speedAt: (): number => v,
  };
}

export const maximumSpeed = defineRequirement<'maximum-speed', MaximumSpeedRequirement, typeof shape>({
  kind: 'maximum-speed',
  title: 'Maximum speed',
  colour: '#8a3b5c', // mulberry
  shape,
  resolve: (r, si) => {
    const mach = typeof r.speed === 'string' ? parseQuantity(r.speed, 'speed', { mach: true }) : undefined;
    const isMach = mach?.ok === true && mach.mach !== undefined;
    return {
      speedMps: si(r.speed, 'speed', NaN),
      equivalent: !isMach && r.airspeed === 'EAS',
      ...(isMach && mach?.ok ? { mach: mach.mach } : {}),
    };
  },
  drawnAs: 'curve',
  boundary: maximumSpeedBoundary,
  speedText: 'the required top speed (TAS, or EAS or Mach turned into TAS at the altitude)',
  defaultConfiguration: 'clean',
  propeller: { default: 0.8, typical: PROPELLER_CRUISE },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [{ key: 'speed', title: 'Maximum speed (TAS or Mach)', value: trueSpeedValue(), required: true }],
  newRequirement: { speed: '200 kt', altitude: '10000 ft' },
  summary: (r, system) => [
    r.mach !== undefined
      ? `M${r.mach} (${formatQuantity(trueSpeed(r), 'speed', system)} TAS)`
      : `${formatQuantity(r.speedMps, 'speed', system)} ${r.equivalent ? 'EAS' : 'TAS'}`,
  ],
  costStep: { field: 'speedMps', conceptField: 'speed', relaxed: 'down' },
  unattainableField: () => 'speed',
  typicalRanges: [],
  templates: [],
  methods: `### Maximum speed (\`maximum-speed\`)

A curve: the master equation (section 6.1) in level flight, n = 1 and P_s = 0, at the top speed, with full power or thrust unless \`powerSetting\` says otherwise, at the given altitude, temperature offset and mass fraction. It is the thrust or power that reaches that top speed.

- \`speed\`: a true airspeed ("250 kt"), an equivalent airspeed with \`"airspeed": "EAS"\` (V = V_E / sqrt(sigma)), or a Mach number ("M0.8", V = M a at the requirement's air).
- A Mach-aware turbine lapse (section 5) and the wave drag of section 3.1 are taken at that speed.
- Propeller aircraft: eta_p 0.8 by default.
- Source: Mattingly, Heiser and Pratt, *Aircraft Engine Design*, constraint analysis (maximum Mach number at altitude).`,
});
