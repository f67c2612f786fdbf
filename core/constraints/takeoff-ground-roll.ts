/**
 * Take-off ground-roll requirement: mean acceleration over the roll with the
 * forces taken at 0.7 V_LOF (Raymer/Roskam practice; core/methods.md section 6).
 */
import { stallSpeed } from '../aero/speeds';
import { G0 } from '../units/factors';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { shaftPowerLoading } from '../propulsion/propeller';
import { flightCondition } from './flight-condition';
import type { RunwaySurface } from '../assumptions/study-case';

export interface TakeoffGroundRollRequirement extends RequirementCommon {
  kind: 'takeoff-ground-roll';
  distanceM: number;
  rollingFriction: number;
  /** The surface the concept states for the run; only the studies read it (rolling friction's typical band). */
  runwaySurface?: RunwaySurface;
  clGroundRun: number;
  liftoffSpeedFactor: number;
}

/** Speed at which the mean forces are taken, as a fraction of V_LOF. */
export const MEAN_ROLL_SPEED_FRACTION = 0.7;

/**
 * T_SL/W_TO = (beta/alpha)[V_LOF^2/(2 g0 S_G) + qbar C_D,g/(beta w) + mu(1 - qbar C_L,g/(beta w))],
 * C_D,g = C_D0,TO + K1 C_L,g + K C_L,g^2, qbar at 0.7 V_LOF, V_LOF = k_LOF V_s,TO at
 * field density (Raymer ch. 17; core/methods.md section 6). Propellers: x 0.7 V_LOF / eta.
 * The jet boundary is linear in w since qbar/w is constant.
 */
export function takeoffGroundRollBoundary(requirement: TakeoffGroundRollRequirement, aircraft: Aircraft): BoundaryOf<'takeoff-ground-roll'> {
  const c = flightCondition(requirement, aircraft);
  const { polar } = c;
  const clg = requirement.clGroundRun;
  const cdg = polar.cd0 + polar.k1 * clg + polar.k * clg * clg;
  const mu = requirement.rollingFriction;
  const twoGS = 2 * G0 * requirement.distanceM;
  const liftoffSpeed = (w: number): number =>
    requirement.liftoffSpeedFactor * stallSpeed(c.beta * w, c.densityKgM3, polar.clMax);

  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required(w: number): number {
      if (!(w > 0)) return NaN;
      const weightLoading = c.beta * w;
      const vLof = liftoffSpeed(w);
      const vMean = MEAN_ROLL_SPEED_FRACTION * vLof;
      // A Mach-aware lapse is taken at the mean roll speed, where the forces are.
      const alpha = c.alphaAt(vMean);
      if (!(alpha > 0)) return NaN;
      const qMean = 0.5 * c.densityKgM3 * vMean * vMean;
      const thrust =
        (c.beta / alpha) *
        ((vLof * vLof) / twoGS + (qMean * cdg) / weightLoading + mu * (1 - (qMean * clg) / weightLoading));
      return c.propeller ? shaftPowerLoading(thrust, vMean, c.propellerEfficiency) : thrust;
    },
    speedAt: (w: number): number => (w > 0 ? liftoffSpeed(w) : NaN),
  };
}
