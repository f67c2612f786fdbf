import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundaryOf } from '../../../core/constraints';
import type { Aircraft, Boundary } from '../../../core/model';
import { aircraftArb } from './arbitraries';
import { cruise, stall, takeoffRoll } from '../helpers/design';

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
});
