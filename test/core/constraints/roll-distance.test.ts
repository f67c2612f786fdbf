/**
 * The ground roll between two speeds under constant thrust, friction, lift
 * and drag. Newton's second law on the runway (Raymer ch. 17, from memory):
 *   dV/dt = g0 [T/W - mu - rho (C_D - mu C_L) V^2 / (2 W/S)] = g0 (K_T + K_A V^2),
 * and dS = V dV / (dV/dt). Here the distance is integrated numerically from
 * that law (composite Simpson), independently of the closed form in the code.
 */
import { describe, expect, it } from 'vitest';
import { rollDistance } from '../../../core/constraints/roll-distance';
import { G0 } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';

type Roll = Parameters<typeof rollDistance>[0];

/** S = integral of V / (g0 (K_T + K_A V^2)) dV from the start to the end speed, Simpson's rule with n steps. */
function integratedRoll(p: Roll, n = 2000): number {
  const kT = p.thrustToWeight - p.friction;
  const kA = (p.densityKgM3 * (p.friction * p.liftCoefficient - p.dragCoefficient)) / (2 * p.wingLoadingPa);
  const f = (v: number): number => v / (G0 * (kT + kA * v * v));
  const h = (p.endSpeed - p.startSpeed) / n;
  let sum = f(p.startSpeed) + f(p.endSpeed);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(p.startSpeed + i * h);
  return (sum * h) / 3;
}

const takeoff: Roll = {
  thrustToWeight: 0.3,
  friction: 0.04,
  densityKgM3: 1.225,
  wingLoadingPa: 3000,
  liftCoefficient: 0.5,
  dragCoefficient: 0.06,
  startSpeed: 0,
  endSpeed: 60,
};

describe('rollDistance', () => {
  it('agrees with the numerically integrated equation of motion for a take-off run and a braking run', () => {
    assertRelative(rollDistance(takeoff), integratedRoll(takeoff), 1e-9);
    assertRelative(rollDistance({ ...takeoff, startSpeed: 20 }), integratedRoll({ ...takeoff, startSpeed: 20 }), 1e-9);
    const braking: Roll = { ...takeoff, thrustToWeight: 0, friction: 0.3, liftCoefficient: 0.3, dragCoefficient: 0.12, startSpeed: 45, endSpeed: 0 };
    assertRelative(rollDistance(braking), integratedRoll(braking), 1e-9);
  });

  it('is the uniform-acceleration distance (V1^2 - V0^2)/(2 g0 (T/W - mu)) with no aerodynamic force', () => {
    // C_L = C_D = 0: constant acceleration a = g0 (T/W - mu) (kinematics, v^2 = v0^2 + 2 a s).
    // (50^2 - 10^2)/(2 x 9.80665 x 0.26) = 2400/5.099458 = 470.638 m.
    const still = { ...takeoff, liftCoefficient: 0, dragCoefficient: 0, startSpeed: 10, endSpeed: 50 };
    assertRelative(rollDistance(still), 470.638, 1e-6);
  });

  it('brakes as at constant deceleration where the lift that eases the friction matches the drag (mu C_L = C_D)', () => {
    // mu C_L - C_D = 0.4 x 0.25 - 0.1 = 0: K_A = 0, the aerodynamic terms cancel and a = -mu g0 (kinematics):
    // S = V^2/(2 mu g0) = 40^2/(2 x 0.4 x 9.80665) = 1600/7.84532 = 203.9432 m.
    const balanced: Roll = { ...takeoff, thrustToWeight: 0, friction: 0.4, liftCoefficient: 0.25, dragCoefficient: 0.1, startSpeed: 40, endSpeed: 0 };
    expect(0.4 * 0.25 - 0.1).toBe(0);
    assertRelative(rollDistance(balanced), 203.9432, 1e-6);
  });

  it('never reaches lift-off where the thrust is below the rolling friction: Infinity', () => {
    // T/W 0.03 < mu 0.04: the net force at rest already points backwards and drag only adds to it.
    expect(rollDistance({ ...takeoff, thrustToWeight: 0.03 })).toBe(Infinity);
    expect(rollDistance({ ...takeoff, thrustToWeight: 0.03, liftCoefficient: 0, dragCoefficient: 0 })).toBe(Infinity);
  });

  it('never reaches lift-off where the drag grows to the thrust before the end speed: Infinity', () => {
    // K_T + K_A V^2 = 0 at V = sqrt(K_T / -K_A): with T/W 0.06, K_T = 0.02, K_A = -8.1667e-6, that is 49.5 m/s < 60 m/s.
    expect(rollDistance({ ...takeoff, thrustToWeight: 0.06 })).toBe(Infinity);
    expect(Number.isFinite(rollDistance({ ...takeoff, thrustToWeight: 0.06, endSpeed: 45 }))).toBe(true);
  });

  it('takes no distance from a speed to the same speed', () => {
    expect(rollDistance({ ...takeoff, startSpeed: 30, endSpeed: 30 }) === 0).toBe(true);
    expect(rollDistance({ ...takeoff, liftCoefficient: 0, dragCoefficient: 0, startSpeed: 30, endSpeed: 30 }) === 0).toBe(true);
  });
});
