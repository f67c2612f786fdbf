import { describe, expect, it } from 'vitest';
import { parseConcept, type ConceptJson } from '../../../core/concept';
import { probabilityMap, resolveUncertainty, typicalRange, typicalUncertainty, type ProbabilityMap } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { demo } from './fixtures';

/** The trainer demo with its concept changed by `edit`, resolved. */
function trainerWith(edit: (concept: ConceptJson) => void) {
  const concept = structuredClone(demo('trainer').concept);
  edit(concept);
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return { concept: parsed.concept, design: parsed.design };
}

const takeoff = (concept: ConceptJson) => concept.requirements.find((r) => r.id === 'takeoff-grass') as Record<string, unknown>;

describe('typical ranges chosen by case and by the concept value', () => {
  it('takes the rolling-friction band of the stated runway surface', () => {
    // core/methods.md section 9 (Brandt et al.; common practice): paved 0.02-0.05, grass 0.05-0.1, soft ground 0.1-0.3.
    const on = (surface: 'paved' | 'grass' | 'soft' | undefined) => {
      const d = trainerWith((c) => {
        const r = takeoff(c);
        r.rollingFriction = 0.06;
        if (surface) r.runwaySurface = surface;
        else delete r.runwaySurface;
      });
      return typicalRange('requirements.takeoff-grass.rollingFriction', d.design);
    };
    const grass = on('grass');
    expect(grass && [grass.low, grass.high, grass.widened]).toEqual([0.05, 0.1, false]);
    expect(grass?.basis).toMatch(/^runway surface grass strip: .*0\.05-0\.1.*peaking at the concept's 0\.06$/);
    // On a paved runway 0.06 is above the band, so the band widens up to hold it.
    const paved = on('paved');
    expect(paved && [paved.low, paved.high, paved.widened]).toEqual([0.02, 0.06, true]);
    expect(paved?.basis).toMatch(/^runway surface paved runway: .*widened to 0\.02-0\.06/);
    const soft = on('soft');
    expect(soft && [soft.low, soft.high]).toEqual([0.06, 0.3]);
    // No surface stated: the band that holds 0.06 (grass), and the basis says so.
    const unstated = on(undefined);
    expect(unstated && [unstated.low, unstated.high]).toEqual([0.05, 0.1]);
    expect(unstated?.basis).toMatch(/^the band holding the concept's value/);
  });

  it('takes the aspect-ratio band of the stated aircraft class, not the one its value happens to fall in', () => {
    // core/methods.md section 9 (common practice): light aircraft 6-8, transports about 10 taken as 9-11.
    const ar9 = (cls: 'light-aircraft' | undefined) =>
      typicalRange(
        'aircraft.aero.aspectRatio',
        trainerWith((c) => {
          c.aircraft.aero.aspectRatio = 9;
          if (cls) c.aircraft.class = cls;
          else delete c.aircraft.class;
        }).design,
      );
    const light = ar9('light-aircraft');
    expect(light && [light.low, light.high, light.widened]).toEqual([6, 9, true]);
    expect(light?.basis).toMatch(/^aircraft class light aircraft: aspect ratio 6-8 .*widened to 6-9/);
    const unstated = ar9(undefined);
    expect(unstated && [unstated.low, unstated.high]).toEqual([9, 11]);
  });

  it('starts every typical range triangular, peaking at the concept value, with its basis', () => {
    const { design } = demo('trainer');
    const block = typicalUncertainty(design);
    expect(block.parameters.every((p) => p.distribution === 'triangular')).toBe(true);
    for (const p of block.parameters) expect(typicalRange(p.field, design)?.basis, p.field).toMatch(/peaking at the concept's /);
  });
});

describe('the chance study on typical ranges moves with the concept value', () => {
  const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1 (sea level)
  const V = 45 * KNOT_MPS; // the trainer's stall requirement, landing flaps, sea level
  const W = 650; // N/m^2, the trainer's design point
  const [A, B] = [1.6, 2.8]; // landing CLmax band (Roskam, Airplane Design I, Table 3.1, from memory; core/methods.md section 9)
  /** P(CLmax >= c) for a triangular (A, m, B) with c = 2W/(rho0 V^2) (Anderson, Introduction to Flight; triangular CDF, standard result). */
  function stallChance(m: number): number {
    const c = (2 * W) / (RHO0 * V * V);
    return c <= m ? 1 - (c - A) ** 2 / ((B - A) * (m - A)) : (B - c) ** 2 / ((B - A) * (B - m));
  }
  const N = 20000;
  const GRID = { wingLoading: [400, 900] as [number, number], loading: [5, 15] as [number, number], nx: 3, ny: 3 };
  function stallAtDesignPoint(clMax: number, seed = 20261202, samples = N): { chance: number; map: ProbabilityMap } {
    const d = trainerWith((c) => {
      (c.aircraft.aero.configurations.landing as { clMax: number }).clMax = clMax;
    });
    const resolved = resolveUncertainty(typicalUncertainty(d.design), d.design, d.concept);
    if (!resolved.ok) throw new Error(JSON.stringify(resolved.issues));
    const map = probabilityMap(d.design, resolved.parameters, { seed, samples, grid: GRID }) as ProbabilityMap;
    const stall = map.designPoint?.byRequirement.find((r) => r.id === 'stall');
    return { chance: stall?.probability ?? NaN, map };
  }

  it('gives a landing CLmax of 2.05 and of 2.2 different chances of meeting the stall speed, each as the closed form says', () => {
    // By hand: c = 2 x 650 / (1.225 x 23.15^2) = 1.980; m = 2.05: 1 - 0.380^2/(1.2 x 0.45) = 0.733; m = 2.2: 1 - 0.380^2/(1.2 x 0.6) = 0.799.
    expect(stallChance(2.05)).toBeCloseTo(0.733, 2);
    expect(stallChance(2.2)).toBeCloseTo(0.799, 2);
    const chances = [2.05, 2.2].map((m) => {
      const p = stallChance(m);
      const { chance } = stallAtDesignPoint(m);
      expect(Math.abs(chance - p), `CLmax ${m}`).toBeLessThanOrEqual(4 * Math.sqrt((p * (1 - p)) / N) + 1 / N);
      return chance;
    });
    expect((chances[1] as number) - (chances[0] as number)).toBeGreaterThan(0.04);
  });

  it('gives the same map for the same seed and another for another seed', () => {
    const one = stallAtDesignPoint(2.05, 7, 2000).map;
    const again = stallAtDesignPoint(2.05, 7, 2000).map;
    expect(Buffer.from(again.probability.buffer)).toEqual(Buffer.from(one.probability.buffer));
    expect(again.designPoint).toEqual(one.designPoint);
    expect(Buffer.from(stallAtDesignPoint(2.05, 8, 2000).map.probability.buffer)).not.toEqual(Buffer.from(one.probability.buffer));
  });
});

describe('the case fields in a concept file', () => {
  it('refuses an unknown aircraft class or runway surface, naming the field', () => {
    const concept = structuredClone(demo('trainer').concept) as unknown as Record<string, unknown> & ConceptJson;
    (concept.aircraft as unknown as Record<string, unknown>).class = 'airliner';
    const bad = parseConcept(concept);
    expect(bad.ok ? [] : bad.issues.map((i) => i.path)).toContain('aircraft.class');
    const other = structuredClone(demo('trainer').concept);
    takeoff(other).runwaySurface = 'ice';
    const worse = parseConcept(other);
    expect(worse.ok ? [] : worse.issues.map((i) => `${i.path}: ${i.message}`).join('\n')).toMatch(/runwaySurface: must be one of paved, grass, soft/);
  });
});
