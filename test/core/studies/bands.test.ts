import { describe, expect, it } from 'vitest';
import { boundaryOf } from '../../../core/constraints';
import type { Requirement } from '../../../core/model';
import { boundaryBands, typicalUncertainty, type CurveBand, type LimitBand } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';
import { aircraft, cruise, design, stall } from '../helpers/design';
import { DEMO_SLUGS, demo, densityLapseJet, ranged } from './fixtures';

const RHO0 = 1.225; // kg/m^3, sea-level density of the U.S. Standard Atmosphere 1976 (Table 1)
const KT = 1852 / 3600; // m/s, NIST SP 811

describe('boundaryBands', () => {
  it('spans a stall limit from the low to the high CLmax: w = 1/2 rho0 V^2 CLmax', () => {
    // Stall speed relation V_s = sqrt(2 (W/S) / (rho CLmax)) (Anderson, Introduction to Flight, stalling speed).
    const d = design({ requirements: [stall(45 * KNOT_MPS, { id: 'stall' })] });
    const params = ranged({ parameters: [{ field: 'aircraft.aero.configurations.landing.clMax', low: 1.9, high: 2.3 }] }, d);
    const [band] = boundaryBands(d, params, [500, 1000]) as LimitBand[];
    const q = 0.5 * RHO0 * (45 * KT) ** 2;
    expect(band.type).toBe('limit');
    assertRelative(band.limits[0], q * 1.9, 1e-4, 'least limit');
    assertRelative(band.limits[1], q * 2.3, 1e-4, 'greatest limit');
    assertRelative(band.nominal, q * 2.1, 1e-4, 'nominal limit'); // builder's landing CLmax 2.1
  });

  it('spans a sea-level jet cruise curve between its best and worst corners of the master equation', () => {
    // Master equation, n = 1, P_s = 0, sea level (alpha = sigma^1 = 1, beta = 1):
    // T/W = q CD0 / w + K w / q, K = 1 / (pi e AR) (Mattingly, Aircraft Engine Design; Anderson for K).
    const v = 200 * KT;
    const d = design({
      aircraft: aircraft({ kind: 'turbofan', aspectRatio: 8, clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.5 } }),
      requirements: [cruise(v, { id: 'cruise' })],
    });
    const params = ranged(
      {
        parameters: [
          { field: 'aircraft.aero.configurations.clean.cd0', low: 0.02, high: 0.03 },
          { field: 'aircraft.aero.configurations.clean.oswaldEfficiency', low: 0.7, high: 0.9 },
        ],
      },
      d,
    );
    const ws = [800, 1500, 2500, 4000];
    const [band] = boundaryBands(d, params, ws) as CurveBand[];
    const q = 0.5 * RHO0 * v * v;
    const tw = (cd0: number, e: number, w: number) => (q * cd0) / w + w / (Math.PI * e * 8 * q);
    expect(band.method).toBe('corners');
    expect(band.evaluated).toBe(5); // nominal and the 4 corners
    ws.forEach((w, i) => {
      assertRelative(band.lower[i], tw(0.02, 0.9, w), 1e-4, `lower at ${w}`);
      assertRelative(band.upper[i], tw(0.03, 0.7, w), 1e-4, `upper at ${w}`);
      assertRelative(band.nominal[i], tw(0.025, 0.8, w), 1e-4, `nominal at ${w}`);
    });
  });

  it('leaves NaN where a corner cannot fly the curve: open above, and NaN nominal where the nominal stalls', () => {
    // A 50 m/s sea-level cruise needs C_L = w/q, q = 1/2 rho0 50^2 = 1531.25 Pa (lift equation): with clean
    // C_Lmax from 1.3 to 1.7 (nominal 1.5) it stalls above 1990.6, 2296.9 and 2603.1 N/m^2 respectively.
    const d = design({ requirements: [cruise(50, { id: 'cruise' })] });
    const params = ranged({ parameters: [{ field: 'aircraft.aero.configurations.clean.clMax', low: 1.3, high: 1.7 }] }, d);
    const [band] = boundaryBands(d, params, [1500, 2100, 2400, 2700]) as CurveBand[];
    expect(band.type).toBe('curve');
    // 1500: every corner flies it. 2100: the low corner stalls (open above). 2400: the nominal stalls too. 2700: none flies it.
    expect(Number.isFinite(band.upper[0]) && Number.isFinite(band.nominal[0])).toBe(true);
    expect(band.upper[1]).toBeNaN();
    expect(Number.isFinite(band.nominal[1]) && Number.isFinite(band.lower[1])).toBe(true);
    expect(band.nominal[2]).toBeNaN();
    expect(Number.isFinite(band.lower[2])).toBe(true);
    expect([band.lower[3], band.upper[3], band.nominal[3]].every(Number.isNaN)).toBe(true);
  });

  it('switches to the ends one at a time plus all-low and all-high above 8 assumptions', () => {
    // The utility twin's take-off distance carries more assumptions than the jet's balanced field (which has no friction or ground-run C_L).
    const twin = demo('utility-twin');
    const block = typicalUncertainty(twin.design);
    block.parameters.push({ field: 'aircraft.aero.cdLinear', low: -0.01, high: 0.01, distribution: 'uniform' });
    const params = ranged(block, twin.design, twin.concept);
    const bands = boundaryBands(twin.design, params, [2000, 3000]);
    for (const band of bands) {
      const k = band.fields.length;
      if (k > 8) expect([band.method, band.evaluated]).toEqual(['one-at-a-time', 2 * k + 3]);
      else expect([band.method, band.evaluated]).toEqual(['corners', k === 0 ? 1 : 2 ** k + 1]);
    }
    expect(bands.some((b) => b.method === 'one-at-a-time')).toBe(true);
  });

  it('holds the nominal boundary inside every band of every demo', () => {
    const outside: string[] = [];
    for (const slug of DEMO_SLUGS) {
      const d = demo(slug);
      const params = ranged(typicalUncertainty(d.design), d.design, d.concept);
      const ws = Array.from({ length: 41 }, (_, i) => 300 + i * 150);
      for (const band of boundaryBands(d.design, params, ws)) {
        if (band.type === 'limit') {
          if (!(band.limits[0] <= band.nominal && band.nominal <= band.limits[1])) outside.push(`${slug} ${band.id}`);
          continue;
        }
        band.nominal.forEach((y, i) => {
          if (!Number.isFinite(y)) return;
          if (!(band.lower[i] <= y)) outside.push(`${slug} ${band.id} below lower at ${ws[i]}`);
          if (Number.isFinite(band.upper[i]) && !(y <= band.upper[i])) outside.push(`${slug} ${band.id} above upper at ${ws[i]}`);
        });
      }
    }
    expect(outside).toEqual([]);
  });

  it('leaves out only assumptions that cannot move the boundary (each demo, each end of each typical range)', () => {
    for (const slug of DEMO_SLUGS) {
      const d = demo(slug);
      const params = ranged(typicalUncertainty(d.design), d.design, d.concept);
      const ws = [400, 900, 1600, 2500, 4000];
      const valuesOf = (r: Requirement, x: typeof d.design) => {
        const b = boundaryOf(x.requirements.find((q) => q.id === r.id) as Requirement, x.aircraft);
        return b.type === 'limit' ? [b.wingLoadingMaxPa] : ws.map((w) => b.required(w));
      };
      for (const p of params) {
        for (const r of d.design.requirements) {
          if (p.requirementIds?.includes(r.id)) continue;
          const nominal = valuesOf(r, d.design);
          for (const end of [p.low, p.high]) expect(valuesOf(r, p.apply(d.design, end)), `${slug}: ${p.field} moves ${r.id}`).toEqual(nominal);
        }
      }
    }
  });
});
