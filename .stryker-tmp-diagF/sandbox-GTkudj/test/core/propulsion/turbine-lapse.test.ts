/**
 * Mach-aware turbine lapse against the published formulas worked by hand
 * (Mattingly, Heiser and Pratt, Aircraft Engine Design, 2nd ed., AIAA 2002,
 * eq. 2.54a-c; coefficients from memory). Air from the U.S. Standard
 * Atmosphere 1976: T = 216.65 K and p = 22,632 Pa at 11 km; sea level 288.15 K, 101,325 Pa.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { parseConcept, type ConceptJson } from '../../../core/concept';
import { evaluateDesign } from '../../../core/diagram';
import { availableFraction } from '../../../core/propulsion/available-fraction';
import { turbineLapse, totalRatios } from '../../../core/propulsion/turbine-lapse';
import type { Propulsion } from '../../../core/model';

describe('Mach-aware turbine lapse (published formulas, worked by hand)', () => {
  it('high bypass at 37,000 ft, M0.72, ISA, below the theta0 break', () => {
    // p at 37,000 ft (11,277.6 m): 22,632 exp(-g0 x 277.6 / (R x 216.65)) = 21,662.7 Pa, delta = 0.213794 (USSA 1976 isothermal layer).
    // 1 + 0.2 M^2 = 1.103680; theta0 = 0.751865 x 1.103680 = 0.829819 < TR = 1; delta0 = 0.213794 x 1.103680^3.5 = 0.301959.
    // alpha = delta0 (1 - 0.49 sqrt(0.72)) = 0.301959 x 0.584221 = 0.176411.
    const alpha = turbineLapse('high-bypass', { temperatureK: 216.65, pressurePa: 21662.7, mach: 0.72 }, 1);
    expect(alpha).toBeCloseTo(0.176411, 5);
    const { theta0, delta0 } = totalRatios({ temperatureK: 216.65, pressurePa: 21662.7, mach: 0.72 });
    expect(theta0).toBeCloseTo(0.829819, 5);
    expect(delta0).toBeCloseTo(0.301959, 5);
  });

  it('high bypass at sea level, ISA+20 K, M0.15, above the break (TR = 1)', () => {
    // theta0 = (308.15/288.15) x 1.0045 = 1.074221, delta0 = 1.0045^3.5 = 1.015839;
    // alpha = 1.015839 [1 - 0.49 sqrt(0.15) - 3 (0.074221)/(1.65)] = 1.015839 x 0.675274 = 0.685973.
    expect(turbineLapse('high-bypass', { temperatureK: 308.15, pressurePa: 101325, mach: 0.15 }, 1)).toBeCloseTo(0.685973, 5);
    // Flat-rated to ISA+15 K (TR = 303.15/288.15 = 1.052056) the penalty shrinks: 3 x 0.022165 / 1.65 instead.
    expect(turbineLapse('high-bypass', { temperatureK: 308.15, pressurePa: 101325, mach: 0.15 }, 303.15 / 288.15)).toBeCloseTo(
      1.015839 * (1 - 0.49 * Math.sqrt(0.15) - (3 * (1.074221 - 1.052056)) / 1.65),
      5,
    );
  });

  it('low-bypass mixed flow at sea level, M0.9, maximum thrust', () => {
    // theta0 = 1.162, delta0 = 1.162^3.5 = 1.691303; alpha = 1.691303 [1 - 3.5 x 0.162/1.162] = 0.866029.
    expect(turbineLapse('low-bypass-mixed', { temperatureK: 288.15, pressurePa: 101325, mach: 0.9 }, 1)).toBeCloseTo(0.866029, 5);
  });

  it('turbojet at 11 km, M0.8, below and above the break', () => {
    // theta0 = 0.751865 x 1.128 = 0.848104, delta0 = 0.223362 x 1.128^3.5 = 0.340478.
    // TR = 1: alpha = delta0 [1 - 0.3 (theta0 - 1) - 0.1 sqrt(0.8)] = 0.340478 x 0.956112 = 0.325540.
    const air = { temperatureK: 216.65, pressurePa: 22632.06, mach: 0.8 };
    expect(turbineLapse('turbojet', air, 1)).toBeCloseTo(0.32554, 5);
    // TR = 0.8: less 1.5 (0.048104)/0.848104 = 0.085080 inside the bracket: 0.296572.
    expect(turbineLapse('turbojet', air, 0.8)).toBeCloseTo(0.296572, 5);
  });

  it('takes the air of the flight condition: FL370 at M0.72, and sea level static and at M0.3', () => {
    const fan: Propulsion = { kind: 'turbofan', engines: 2, lapseExponent: 1, lapseModel: 'high-bypass', throttleRatio: 1 };
    expect(availableFraction(fan, 11277.6, 0, 1, 0.72)).toBeCloseTo(0.176411, 4);
    // Sea level static: theta0 = delta0 = 1, alpha = 1 (the rating point).
    expect(availableFraction(fan, 0, 0, 1, 0)).toBeCloseTo(1, 12);
    // M0.3: 1.018; theta0 = 1.018 > TR, delta0 = 1.018^3.5 = 1.064430;
    // alpha = 1.064430 [1 - 0.49 sqrt(0.3) - 3 x 0.018/1.8] = 1.064430 x 0.701616 = 0.746821; x 0.9 throttle.
    expect(availableFraction(fan, 0, 0, 0.9, 0.3)).toBeCloseTo(0.9 * 0.746821, 5);
  });
});

describe('which lapse model a concept file gets', () => {
  const base = (propulsion: Record<string, unknown>): ConceptJson =>
    ({
      format: 'loftpoint-concept/1',
      aircraft: {
        takeoffMass: '6000 kg',
        aero: { aspectRatio: 8, configurations: { clean: { cd0: 0.022, oswaldEfficiency: 0.8, clMax: 1.5 } } },
        propulsion: { kind: 'turbofan', engines: 2, ...propulsion },
      },
      requirements: [
        { id: 'stall', kind: 'stall', speed: '95 kt' },
        { id: 'cruise', kind: 'cruise', speed: 'M0.7', altitude: 'FL350' },
      ],
    }) as ConceptJson;
  const resolved = (c: ConceptJson) => {
    const parsed = parseConcept(c);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    return parsed;
  };

  it('a turbofan without an exponent gets the high-bypass model with TR = 1', () => {
    expect(resolved(base({})).design.aircraft.propulsion).toMatchObject({ lapseModel: 'high-bypass', throttleRatio: 1 });
  });

  it('a file that states an exponent keeps the density model and evaluates as the density model does', () => {
    const old = resolved(base({ lapseExponent: 0.9 }));
    expect(old.design.aircraft.propulsion.lapseModel ?? 'density').toBe('density');
    expect(evaluateDesign(old.design)).toEqual(evaluateDesign(resolved(base({ lapseExponent: 0.9, lapseModel: 'density' })).design));
    // sigma^0.9 at FL350 (sigma = 0.3099, USSA 1976, from memory) is the cruise alpha, not the Mach-aware one.
    const density = evaluateDesign(old.design).optimum?.thrustToWeight ?? NaN;
    const mach = evaluateDesign(resolved(base({})).design).optimum?.thrustToWeight ?? NaN;
    expect(mach).toBeGreaterThan(density * 1.3);
  });

  it('refuses a model the kind does not take, naming the field', () => {
    const parsed = parseConcept({ ...base({}), aircraft: { ...base({}).aircraft, propulsion: { kind: 'piston', lapseModel: 'high-bypass' } } });
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(JSON.stringify(parsed.issues)).toContain('aircraft.propulsion.lapseModel');
  });
});
