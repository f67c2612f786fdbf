// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept, type ConceptJson } from '../../../core/concept';
import { evaluateDesign } from '../../../core/diagram';
import { parseQuantity } from '../../../core/units/quantity';

function concept(cruise: Record<string, string | number>): ConceptJson {
  const jet = DEMO_CONCEPTS.find((d) => d.slug === 'business-jet');
  if (!jet) throw new Error('no business-jet demo');
  const base = structuredClone(jet.concept) as ConceptJson;
  base.requirements = base.requirements.map((r) => (r.id === 'cruise' ? ({ ...r, ...cruise } as typeof r) : r));
  return base;
}

function design(c: ConceptJson) {
  const parsed = parseConcept(c);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.design;
}

describe('flight levels, Mach numbers, percentages and power loadings as input', () => {
  it('reads "FL370" as 37,000 ft of pressure altitude', () => {
    // A flight level is hundreds of feet of pressure altitude (ICAO Annex 2; common practice); 1 ft = 0.3048 m exactly (NIST SP 811).
    const parsed = parseQuantity('FL370', 'length');
    expect(parsed).toEqual({ ok: true, value: 37000 * 0.3048 });
    expect(parseQuantity('fl 060', 'length')).toEqual({ ok: true, value: 6000 * 0.3048 });
  });

  it('turns "M0.75" at FL370 into TAS with the speed of sound there', () => {
    const d = design(concept({ altitude: 'FL370', speed: 'M0.75' }));
    const cruise = d.requirements.find((r) => r.id === 'cruise') as { speedMps: number; altitudeM: number };
    expect(cruise.altitudeM).toBe(11277.6);
    // a = 295.07 m/s from 11 km to 20 km (U.S. Standard Atmosphere 1976, table of speed of sound), so V = 0.75 x 295.07 = 221.30 m/s.
    expect(cruise.speedMps).toBeCloseTo(0.75 * 295.07, 1);
  });

  it('gives exactly the results of the same altitude and TAS written with units', () => {
    const byMach = design(concept({ altitude: 'FL370', speed: 'M0.75' }));
    const tas = (byMach.requirements.find((r) => r.id === 'cruise') as { speedMps: number }).speedMps;
    // String(x) of a double reads back as the same double (ECMA-262 Number::toString), so this is the same TAS.
    const byUnits = design(concept({ altitude: '37000 ft', speed: `${String(tas)} m/s` }));
    expect(evaluateDesign(byMach)).toEqual(evaluateDesign(byUnits));
  });

  it('takes the speed of sound of a hot day for a Mach number on that day', () => {
    // a = sqrt(gamma R T): 15 K warmer at sea level (288.15 -> 303.15 K) scales a by sqrt(303.15/288.15) (ideal gas; common practice).
    const hot = design(concept({ altitude: '0 ft', temperatureOffset: '15 K', speed: 'M0.3' }));
    const cold = design(concept({ altitude: '0 ft', speed: 'M0.3' }));
    const speed = (d: ReturnType<typeof design>) => (d.requirements.find((r) => r.id === 'cruise') as { speedMps: number }).speedMps;
    // 340.29 m/s at sea level ISA (U.S. Standard Atmosphere 1976).
    expect(speed(cold)).toBeCloseTo(0.3 * 340.29, 1);
    expect(speed(hot) / speed(cold)).toBeCloseTo(Math.sqrt(303.15 / 288.15), 9);
  });

  it('refuses a Mach number where the field is not a true airspeed', () => {
    const stall = parseConcept({
      ...concept({}),
      requirements: [{ id: 's', kind: 'stall', speed: 'M0.2' }],
    });
    expect(stall.ok).toBe(false);
    if (!stall.ok) expect(JSON.stringify(stall.issues)).toMatch(/Mach number is taken only for a true airspeed/);
  });

  it('reads "75 %" for a power setting as 0.75', () => {
    const d = design(concept({ powerSetting: '75 %', massFraction: '88 %' }));
    const cruise = d.requirements.find((r) => r.id === 'cruise');
    expect(cruise?.powerSetting).toBe(0.75);
    expect(cruise?.massFraction).toBe(0.88);
  });

  it('reads power loadings in lb/hp and kg/kW as their power-to-weight', () => {
    // 1 hp = 745.69987 W, 1 lbf = 4.4482216 N (NIST SP 811): 10 lb/hp is 745.69987 / 44.482216 = 16.7638 W/N.
    const lbPerHp = parseQuantity('10 lb/hp', 'powerToWeight');
    expect(lbPerHp.ok && lbPerHp.value).toBeCloseTo(16.7638, 3);
    // 5 kg/kW: 1 kgf = 9.80665 N (CGPM 1901), so P/W = 1000 / (5 x 9.80665) = 20.3943 W/N.
    const kgPerKw = parseQuantity('5 kg/kW', 'powerToWeight');
    expect(kgPerKw.ok && kgPerKw.value).toBeCloseTo(20.3943, 3);
    expect(parseQuantity('0 lb/hp', 'powerToWeight').ok).toBe(false);
  });

  it('gives every boundary its flight Mach at the optimum', () => {
    const evaluation = evaluateDesign(design(concept({ altitude: 'FL370', speed: 'M0.75' })));
    const cruise = evaluation.boundaries.find((b) => b.id === 'cruise');
    expect(cruise?.machAtOptimum).toBeCloseTo(0.75, 12);
    for (const b of evaluation.boundaries) expect(b.machAtOptimum).toBeGreaterThan(0);
  });
});
