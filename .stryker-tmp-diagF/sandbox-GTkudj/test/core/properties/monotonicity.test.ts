// @ts-nocheck
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundaryOf } from '../../../core/constraints';
import type { Aircraft, Boundary } from '../../../core/model';
import { aircraftArb } from './arbitraries';
import { balancedField, cruise, landingDistance, stall, takeoffDistance, takeoffRoll } from '../helpers/design';

const curve = (b: Boundary) => {
  if (b.type !== 'curve') throw new Error('expected a curve');
  return b.required;
};
const wingLoadings = fc.array(fc.double({ min: 30, max: 8000, noNaN: true }), { minLength: 1, maxLength: 20 });

function withClean(ac: Aircraft, change: Partial<Aircraft['configurations']['clean']>): Aircraft {
  const configurations = Object.fromEntries(Object.entries(ac.configurations).map(([k, c]) => [k, k === 'clean' ? { ...c, ...change } : c]));
  return { ...ac, configurations };
}

describe('boundaries move the way physics says', () => {
  it('more C_Lmax moves the stall limit right', () => {
    // w_max = 1/2 rho0 V^2 C_Lmax / beta (core/methods.md section 6).
    fc.assert(
      fc.property(aircraftArb, fc.double({ min: 15, max: 60, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (ac, v, more) => {
        const requirement = stall(v, { configuration: 'clean' });
        const base = boundaryOf(requirement, ac);
        const raised = boundaryOf(requirement, withClean(ac, { clMax: ac.configurations.clean.clMax + more }));
        if (base.type !== 'limit' || raised.type !== 'limit') throw new Error('expected limits');
        expect(raised.wingLoadingMaxPa).toBeGreaterThan(base.wingLoadingMaxPa);
      }),
    );
  });

  it('more C_D0 raises the cruise curve wherever it can be met', () => {
    fc.assert(
      fc.property(
        aircraftArb,
        fc.double({ min: 20, max: 260, noNaN: true }),
        fc.double({ min: 0, max: 11000, noNaN: true }),
        fc.double({ min: 0.001, max: 0.02, noNaN: true }),
        wingLoadings,
        (ac, v, h, more, ws) => {
          const requirement = cruise(v, { altitudeM: h });
          const base = curve(boundaryOf(requirement, ac));
          const draggy = curve(boundaryOf(requirement, withClean(ac, { cd0: ac.configurations.clean.cd0 + more })));
          for (const w of ws) {
            const [y0, y1] = [base(w), draggy(w)];
            expect(Number.isNaN(y0)).toBe(Number.isNaN(y1)); // C_L > C_Lmax does not depend on drag
            if (Number.isFinite(y0)) expect(y1).toBeGreaterThan(y0);
          }
        },
      ),
    );
  });

  it('a higher or hotter airfield raises the take-off curve', () => {
    // Lower density: faster lift-off and no more power (core/methods.md sections 5 and 6).
    fc.assert(
      fc.property(
        aircraftArb,
        fc.double({ min: 100, max: 2500, noNaN: true }),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        fc.double({ min: -10, max: 25, noNaN: true }),
        fc.double({ min: 1, max: 1500, noNaN: true }),
        fc.double({ min: 1, max: 20, noNaN: true }),
        wingLoadings,
        (ac, distance, h, dT, higher, hotter, ws) => {
          const at = (altitudeM: number, temperatureOffsetK: number) => curve(boundaryOf(takeoffRoll(distance, { altitudeM, temperatureOffsetK }), ac));
          const base = at(h, dT);
          const high = at(h + higher, dT);
          const hot = at(h, dT + hotter);
          for (const w of ws) {
            expect(high(w)).toBeGreaterThan(base(w));
            expect(hot(w)).toBeGreaterThan(base(w));
          }
        },
      ),
    );
  });

  it('a higher, hotter, shorter or heavier take-off over an obstacle or balanced field needs more, where it can be met', () => {
    // Lower density, less distance or more weight per area: more thrust or power (Raymer ch. 17; Torenbeek).
    fc.assert(
      fc.property(
        aircraftArb,
        fc.constantFrom('distance', 'balanced'),
        fc.double({ min: 300, max: 3000, noNaN: true }),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        fc.double({ min: 100, max: 1500, noNaN: true }),
        fc.double({ min: 2, max: 20, noNaN: true }),
        fc.double({ min: 300, max: 6000, noNaN: true }),
        (ac, which, d, h, higher, hotter, w) => {
          if (which === 'balanced' && ac.propulsion.engines < 2) return;
          const make = (distanceM: number, extra: { altitudeM?: number; temperatureOffsetK?: number }) =>
            which === 'distance' ? takeoffDistance(distanceM, { altitudeM: h, ...extra }) : balancedField(distanceM, { altitudeM: h, ...extra });
          const at = (distanceM: number, extra: { altitudeM?: number; temperatureOffsetK?: number } = {}, wl = w) => curve(boundaryOf(make(distanceM, extra), ac))(wl);
          const base = at(d);
          if (!Number.isFinite(base)) return;
          for (const worse of [at(d, { altitudeM: h + higher }), at(d, { temperatureOffsetK: hotter }), at(0.9 * d), at(d, {}, 1.1 * w)]) {
            // Either at least as much is needed (to the root search's 1e-9 relative width; near the thrust at which the
            // field length grows without bound the loading barely changes), or it can no longer be met at all (NaN).
            if (Number.isFinite(worse)) expect(worse).toBeGreaterThanOrEqual(base * (1 - 1e-9));
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it('a higher, hotter, shorter or heavier landing over an obstacle allows less wing loading', () => {
    fc.assert(
      fc.property(
        aircraftArb,
        fc.double({ min: 300, max: 3000, noNaN: true }),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        fc.double({ min: 0.7, max: 0.95, noNaN: true }),
        fc.boolean(),
        (ac, d, h, beta, liftDumping) => {
          const at = (distanceM: number, extra: { altitudeM?: number; temperatureOffsetK?: number; massFraction?: number } = {}) => {
            const b = boundaryOf(landingDistance(distanceM, { altitudeM: h, massFraction: beta, liftDumping, ...extra }), ac);
            if (b.type !== 'limit') throw new Error('expected a limit');
            return b.wingLoadingMaxPa;
          };
          const base = at(d);
          expect(Number.isFinite(base)).toBe(true);
          if (!(base > 0)) return;
          expect(at(d, { altitudeM: h + 500 })).toBeLessThan(base);
          expect(at(d, { temperatureOffsetK: 15 })).toBeLessThan(base);
          expect(at(0.9 * d)).toBeLessThan(base);
          expect(at(d, { massFraction: beta + 0.05 })).toBeLessThan(base);
        },
      ),
      { numRuns: 60 },
    );
  });
});
