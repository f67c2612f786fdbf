/**
 * Properties of the weight closure over generated missions (fast-check):
 * more range, payload or specific fuel consumption raises the take-off mass,
 * a better lift-to-drag ratio or pack lowers it, and nothing is ever NaN.
 * These directions are facts of the trade (Breguet; the sizing equation).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { closeMass, missionMass, type Mission } from '../../../core/mission';
import { aircraft } from '../helpers/design';
import { cruise, jetFuel, loiter, mission, propellerFuel } from './helpers';

const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });
const WING_LOADING = 1500;

const missions = fc.record({
  payloadKg: fc.double({ min: 50, max: 3000, noNaN: true }),
  crewKg: fc.double({ min: 0, max: 300, noNaN: true }),
  rangeKm: fc.double({ min: 100, max: 3000, noNaN: true }),
  loiterMin: fc.double({ min: 0, max: 120, noNaN: true }),
  bsfc: fc.double({ min: 0.2, max: 0.4, noNaN: true }),
  jet: fc.boolean(),
  technologyFactor: fc.double({ min: 0.8, max: 1.1, noNaN: true }),
});

function build(p: { payloadKg: number; crewKg: number; rangeKm: number; loiterMin: number; bsfc: number; jet: boolean; technologyFactor: number }): Mission {
  return mission({
    payloadKg: p.payloadKg,
    crewKg: p.crewKg,
    technologyFactor: p.technologyFactor,
    energy: p.jet ? jetFuel(p.bsfc * 2.5) : propellerFuel(p.bsfc),
    segments: [{ kind: 'takeoff-climb', fraction: 0.955 }, cruise(p.rangeKm, 150, 8000), ...(p.loiterMin > 0 ? [loiter(p.loiterMin, 120, 5000)] : [])],
  });
}

/** Closed mass, or Infinity where the mission does not close (a heavier need than any that closes). */
function closed(m: Mission): number {
  const result = closeMass(m, twin, WING_LOADING);
  return result.ok ? result.takeoffKg : Infinity;
}

describe('the closure moves the way the trade expects', () => {
  it('more range, payload or specific fuel consumption never lowers the take-off mass', () => {
    fc.assert(
      fc.property(missions, (p) => {
        const base = closed(build(p));
        expect(closed(build({ ...p, rangeKm: p.rangeKm * 1.1 }))).toBeGreaterThanOrEqual(base);
        expect(closed(build({ ...p, payloadKg: p.payloadKg * 1.1 }))).toBeGreaterThanOrEqual(base);
        expect(closed(build({ ...p, bsfc: p.bsfc * 1.1 }))).toBeGreaterThanOrEqual(base);
        if (Number.isFinite(base)) {
          expect(closed(build({ ...p, rangeKm: p.rangeKm * 1.1 }))).toBeGreaterThan(base);
          expect(closed(build({ ...p, payloadKg: p.payloadKg * 1.1 }))).toBeGreaterThan(base);
        }
      }),
      { numRuns: 60, seed: 20261203 },
    );
  });

  it('a better lift-to-drag ratio never raises it', () => {
    fc.assert(
      fc.property(missions, fc.double({ min: 1.01, max: 1.5, noNaN: true }), (p, better) => {
        const m = build(p);
        expect(closed({ ...m, liftToDragScale: better })).toBeLessThanOrEqual(closed(m));
      }),
      { numRuns: 60, seed: 20261204 },
    );
  });

  it('a better battery pack never raises a battery aircraft', () => {
    fc.assert(
      fc.property(fc.double({ min: 120, max: 400, noNaN: true }), fc.double({ min: 5, max: 80, noNaN: true }), (whPerKg, km) => {
        const electric = (e: number): Mission =>
          mission({
            payloadKg: 2,
            crewKg: 0,
            emptyMassFraction: 0.5,
            segments: [cruise(km, 45, 1000)],
            energy: { kind: 'battery', specificEnergyJPerKg: e * 3600, usableFraction: 0.8, driveEfficiency: 0.7 },
          });
        const drone = aircraft({ kind: 'electric', aspectRatio: 12 });
        const at = (m: Mission) => {
          const r = closeMass(m, drone, 200);
          return r.ok ? r.takeoffKg : Infinity;
        };
        expect(at(electric(whPerKg * 1.2))).toBeLessThanOrEqual(at(electric(whPerKg)));
      }),
      { numRuns: 60, seed: 20261205 },
    );
  });

  it('never NaN: either every number of the mass object is finite, or a one-line message names a mission field', () => {
    fc.assert(
      fc.property(missions, fc.double({ min: 200, max: 8000, noNaN: true }), (p, wingLoading) => {
        const result = missionMass(build(p), twin, wingLoading);
        if (!result.ok) {
          expect(result.field).toMatch(/^mission/);
          expect(result.message).not.toMatch(/NaN|undefined|Infinity|\n/);
          return;
        }
        const { segments, drivers, ...totals } = result.mass;
        for (const value of Object.values(totals)) expect(Number.isFinite(value)).toBe(true);
        for (const s of segments) for (const v of Object.values(s)) if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
        for (const d of drivers) expect(Number.isFinite(d.elasticity)).toBe(true);
        // The parts add up to the whole (the closure's balance).
        expect((totals.empty + totals.fuel + totals.battery + totals.payload + totals.crew) / totals.takeoff).toBeCloseTo(1, 9);
      }),
      { numRuns: 60, seed: 20261206 },
    );
  });
});
