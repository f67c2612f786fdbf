/**
 * Where flight Mach is judged when there is no optimum: at the design point,
 * else mid-range. A take-off distance of 100 m with 15 m to clear cannot be
 * flown at any wing loading (so there is no optimum), but its lift-off speed
 * V_LOF = 1.1 sqrt(2 w / (rho C_Lmax)) (stall speed, Anderson, Introduction
 * to Flight; lift-off at 1.1 V_s, common practice) still rises with w. Sea
 * level ISA: rho = 1.225 kg/m^3, a = 340.294 m/s (U.S. Standard Atmosphere
 * 1976); take-off C_Lmax 1.8.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../../core/diagram';
import { aircraft, design, takeoffDistance } from '../helpers/design';

const RHO = 1.225;
const A0 = 340.294;
const liftoffMach = (w: number): number => (1.1 * Math.sqrt((2 * w) / (RHO * 1.8))) / A0;

function evaluated(designPointPa?: number, rangePa: [number, number] = [1000, 50000]) {
  return evaluateDesign(
    design({
      aircraft: aircraft({ kind: 'turbofan', engines: 2, takeoffMassKg: 20000 }),
      requirements: [takeoffDistance(100)],
      rangePa,
      ...(designPointPa === undefined ? {} : { designPoint: { wingLoadingPa: designPointPa, loading: 0.3 } }),
    }),
  );
}

const machCodes = (e: ReturnType<typeof evaluateDesign>) => e.warnings.filter((w) => w.code === 'compressibility-not-modelled' || w.code === 'supersonic');

describe('compressibility judged without an optimum', () => {
  it('at the design point: Mach 0.65 at 45 kPa, above 0.6 (mid-range, 25.5 kPa, would be Mach 0.49)', () => {
    // V_LOF at 45000 Pa = 1.1 sqrt(90000 / 2.205) = 222.2 m/s, Mach 0.653; at 25500 Pa, 167.3 m/s, Mach 0.492.
    expect(liftoffMach(45000)).toBeCloseTo(0.653, 3);
    expect(liftoffMach(25500)).toBeCloseTo(0.492, 3);
    const e = evaluated(45000);
    expect(e.optimum).toBeNull();
    expect(machCodes(e)).toEqual([
      {
        code: 'compressibility-not-modelled',
        field: 'requirements[0]',
        message:
          'Requirement "takeoff-distance" flies at Mach 0.65: compressibility (wave drag) is not modelled; give aircraft.aero thicknessRatio, quarterChordSweep and kornFactor to include it.',
      },
    ]);
  });

  it('mid-range without a design point: Mach 0.49 at 25.5 kPa, no warning', () => {
    const e = evaluated();
    expect(e.optimum).toBeNull();
    expect(machCodes(e)).toEqual([]);
  });

  it('mid-range without a design point: Mach 0.69 at 50 kPa in a range of 40 to 60 kPa, with a warning', () => {
    // V_LOF at 50000 Pa = 1.1 sqrt(100000 / 2.205) = 234.3 m/s, Mach 0.688.
    expect(liftoffMach(50000)).toBeCloseTo(0.688, 3);
    const e = evaluated(undefined, [40000, 60000]);
    expect(e.optimum).toBeNull();
    expect(machCodes(e).map((w) => w.message)).toEqual([
      'Requirement "takeoff-distance" flies at Mach 0.69: compressibility (wave drag) is not modelled; give aircraft.aero thicknessRatio, quarterChordSweep and kornFactor to include it.',
    ]);
  });
});
