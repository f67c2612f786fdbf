/**
 * A required loading of exactly zero at a plotted sample is refused like a
 * negative one (core/diagram/impossible-inputs.ts), and the line says "no",
 * not "negative".
 *
 * Hand derivation: a jet (clean C_D0 0.03, K = 1/(pi e AR) with e 0.8 and
 * AR 7.5, no linear term) holding 64 m/s at sea level ISA (rho 1.225 kg/m^3,
 * U.S. Standard Atmosphere 1976; thrust lapse 1 there, beta 1) needs, by the
 * master equation (Mattingly, Aircraft Engine Design, from memory) with n = 1,
 * T/W = q C_D0/w + K C_L + P_s/V, q = 0.5 rho V^2, C_L = w/q.
 * Descending at P_s = -V (q C_D0/w + K C_L) makes T/W exactly zero at w: a
 * glide at that speed needs no thrust. For an exact zero, not a rounding
 * residue, the drag term is read from the level-flight boundary (P_s = 0,
 * checked against the hand value to 1e-6; the model's ISA density is
 * 1.2249999 kg/m^3) and V = 64 m/s is a power of two, so P_s/V gives it back
 * bit for bit. With samples 2 on [100, 3000] Pa the diagram is drawn at
 * 100 and 3000 Pa; at 3000 Pa the same descent needs negative thrust
 * (q C_D0/w falls from 0.753 to 0.025 while K C_L rises only to 0.063).
 */
import { describe, expect, it } from 'vitest';
import { impossibleInputs } from '../../../core/diagram';
import { requirementBoundaries } from '../../../core/diagram/boundaries';
import { aircraft, climbRate, design } from '../helpers/design';

const speed = 64;
const q = 0.5 * 1.225 * speed * speed;
const k = 1 / (Math.PI * 0.8 * 7.5);
const dragPerWeightAt = (w: number): number => (q * (0.03 + 0)) / w + 0 * 1 + k * 1 * (w / q);

const descent = (rateMps: number) =>
  design({
    aircraft: aircraft({ kind: 'turbofan', engines: 2 }),
    requirements: [climbRate(rateMps, { speedMps: speed })],
    rangePa: [100, 3000],
    samples: 2,
  });

function levelFlightLoading(w: number): number {
  const boundary = requirementBoundaries(descent(0))[0].boundary;
  if (boundary.type !== 'curve') throw new Error('climb rate is drawn as a curve');
  return boundary.required(w);
}

function glideAt(w: number) {
  const level = levelFlightLoading(w);
  expect(level).toBeCloseTo(dragPerWeightAt(w), 6);
  return descent(-speed * level);
}

describe('a required loading of exactly zero', () => {
  it('is refused at the first sample where it is zero, and called "no" thrust', () => {
    expect(impossibleInputs(glideAt(100))).toEqual([
      {
        field: 'requirements[0]',
        message: 'makes requirement "climb" need no thrust at 100 Pa wing loading, so it sizes nothing; check its values',
      },
    ]);
  });

  it('a descent slower than the glide at both samples is accepted', () => {
    // -1 m/s: about 1/48 of the glide's sink at 100 Pa and 1/5.6 of it at 3000 Pa
    expect(impossibleInputs(descent(-1))).toEqual([]);
  });
});
