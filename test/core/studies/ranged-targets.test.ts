/**
 * What a ranged value writes to and which requirements it can move, worked
 * out by hand from how each boundary is drawn (core/methods.md):
 * - a stall limit reads only the configuration's CLmax (w <= 1/2 rho0 V^2
 *   CLmax, Anderson, Introduction to Flight);
 * - a landing-roll limit reads CLmax and the braking friction, and the drag
 *   polar only when a ground lift coefficient or lift dumping is given (the
 *   braking deceleration then includes the aerodynamic drag);
 * - curves (cruise, climb gradient) read the polar and the propulsion;
 * - a requirement flown in a configuration the aircraft lacks is flown clean;
 * - a configuration that writes no Oswald efficiency or CLmax takes clean's.
 */
import { describe, expect, it } from 'vitest';
import { resolveUncertainty, type UncertainParameter } from '../../../core/studies';
import type { Design } from '../../../core/model';
import { aircraft, climbGradient, cruise, design, landingRoll, stall } from '../helpers/design';

const KNOT = 0.514444; // m/s, international knot (common practice)

/** Builder aircraft: clean CD0 0.03, e 0.8, CLmax 1.5; takeoff +0.015, CLmax 1.8, e unwritten (clean's 0.8); landing +0.06, e 0.8 written, CLmax 2.1. */
const AIRCRAFT = aircraft({
  kind: 'turboprop',
  increments: {
    takeoff: { cd0Increment: 0.015, clMax: 1.8 },
    landing: { cd0Increment: 0.06, oswaldEfficiency: 0.8, clMax: 2.1 },
  },
});
/** The concept file as written: takeoff states no e, landing states its own. */
const WRITTEN = {
  aircraft: {
    aero: {
      configurations: {
        clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 },
        takeoff: { cd0Increment: 0.015, clMax: 1.8 },
        landing: { cd0Increment: 0.06, oswaldEfficiency: 0.8, clMax: 2.1 },
      },
    },
  },
};

const CONCEPT: Design = design({
  aircraft: AIRCRAFT,
  requirements: [
    stall(45 * KNOT, { id: 'stall' }),
    landingRoll(300, { id: 'landing' }),
    landingRoll(300, { id: 'landing-lift', clGround: 0.3 }),
    cruise(110 * KNOT, { id: 'cruise' }),
    climbGradient(0.083, { id: 'gradient' }),
    cruise(90 * KNOT, { id: 'ferry-cruise', configuration: 'ferry' }),
    stall(50 * KNOT, { id: 'ferry-stall', configuration: 'ferry' }),
  ],
});

function one(field: string, low: number, high: number, concept?: unknown): UncertainParameter {
  const result = resolveUncertainty({ parameters: [{ field, low, high }] }, CONCEPT, concept);
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result.parameters[0];
}

describe('the requirements a ranged value can move', () => {
  it.each<[string, string, number, number, string[]]>([
    ['aspect ratio: every curve, and the landing roll that reads drag; no stall', 'aircraft.aero.aspectRatio', 7, 8, ['landing-lift', 'cruise', 'gradient', 'ferry-cruise']],
    ['the linear drag term: the same', 'aircraft.aero.cdLinear', -0.01, 0.01, ['landing-lift', 'cruise', 'gradient', 'ferry-cruise']],
    ['the lapse exponent: the same', 'aircraft.propulsion.lapseExponent', 0.6, 0.9, ['landing-lift', 'cruise', 'gradient', 'ferry-cruise']],
    ["clean's CD0, which moves every configuration: every drag reader", 'aircraft.aero.configurations.clean.cd0', 0.025, 0.035, ['landing-lift', 'cruise', 'gradient', 'ferry-cruise']],
    ["landing's CD0 increment: only the landing roll that reads drag", 'aircraft.aero.configurations.landing.cd0Increment', 0.05, 0.07, ['landing-lift']],
    ["landing's CLmax: every requirement flown in landing", 'aircraft.aero.configurations.landing.clMax', 1.9, 2.3, ['stall', 'landing', 'landing-lift']],
    ["clean's CLmax: what is flown clean, and what is flown in a configuration the aircraft lacks", 'aircraft.aero.configurations.clean.clMax', 1.4, 1.6, ['cruise', 'ferry-cruise', 'ferry-stall']],
    ["takeoff's e: the climb gradient, flown in takeoff", 'aircraft.aero.configurations.takeoff.oswaldEfficiency', 0.7, 0.85, ['gradient']],
    ["a requirement's own value: that requirement", 'requirements.cruise.propellerEfficiency', 0.75, 0.85, ['cruise']],
  ])('%s', (_what, field, low, high, ids) => {
    expect(one(field, low, high).requirementIds).toEqual(ids);
  });
});

describe('the values a ranged value writes', () => {
  it("clean's e moves takeoff, which writes none, and not landing, which writes its own, when the concept file is given", () => {
    const c = one('aircraft.aero.configurations.clean.oswaldEfficiency', 0.7, 0.9, WRITTEN).apply(CONCEPT, 0.85).aircraft.configurations;
    expect([c.clean.oswaldEfficiency, c.takeoff.oswaldEfficiency, c.landing.oswaldEfficiency]).toEqual([0.85, 0.85, 0.8]);
    expect(one('aircraft.aero.configurations.clean.oswaldEfficiency', 0.7, 0.9, WRITTEN).requirementIds).toEqual(['cruise', 'gradient', 'ferry-cruise']);
  });

  it("without the concept file, a configuration whose e equals clean's is taken to inherit it", () => {
    const c = one('aircraft.aero.configurations.clean.oswaldEfficiency', 0.7, 0.9).apply(CONCEPT, 0.85).aircraft.configurations;
    expect([c.clean.oswaldEfficiency, c.takeoff.oswaldEfficiency, c.landing.oswaldEfficiency]).toEqual([0.85, 0.85, 0.85]);
    // A concept whose configurations are not an object says nothing: the same rule.
    const odd = one('aircraft.aero.configurations.clean.oswaldEfficiency', 0.7, 0.9, { aircraft: { aero: { configurations: 'none' } } });
    expect(odd.apply(CONCEPT, 0.85).aircraft.configurations.landing.oswaldEfficiency).toBe(0.85);
  });

  it("by the same rule clean's CLmax 1.5 leaves takeoff's 1.8 and landing's 2.1, whatever a concept without configurations says", () => {
    for (const concept of [undefined, null, {}, { aircraft: {} }, { aircraft: { aero: {} } }, { aircraft: { aero: { configurations: 'none' } } }]) {
      const p = one('aircraft.aero.configurations.clean.clMax', 1.4, 1.6, concept);
      const c = p.apply(CONCEPT, 1.6).aircraft.configurations;
      expect([c.clean.clMax, c.takeoff.clMax, c.landing.clMax], JSON.stringify(concept)).toEqual([1.6, 1.8, 2.1]);
    }
  });

  it('applied to a concept that lacks the configuration, writes the others and makes none up', () => {
    const p = one('aircraft.aero.configurations.clean.cd0', 0.025, 0.035);
    const { landing: _gone, ...rest } = CONCEPT.aircraft.configurations;
    const fewer: Design = { ...CONCEPT, aircraft: { ...CONCEPT.aircraft, configurations: rest } };
    const c = p.apply(fewer, 0.025).aircraft.configurations;
    expect(Object.keys(c)).toEqual(['clean', 'takeoff']);
    expect(c.takeoff.cd0).toBeCloseTo(0.025 + 0.015, 15);
  });

  it("a CD0 increment sets that configuration's CD0 to clean's plus the increment and leaves the others", () => {
    const c = one('aircraft.aero.configurations.landing.cd0Increment', 0.05, 0.07).apply(CONCEPT, 0.07).aircraft.configurations;
    expect(c.landing.cd0).toBeCloseTo(0.03 + 0.07, 15);
    expect(c.clean.cd0).toBe(0.03);
    expect(c.takeoff.cd0).toBeCloseTo(0.03 + 0.015, 15);
  });

  it("clean's CD0 keeps every configuration's increment", () => {
    const c = one('aircraft.aero.configurations.clean.cd0', 0.025, 0.035).apply(CONCEPT, 0.025).aircraft.configurations;
    expect(c.clean.cd0).toBe(0.025);
    expect(c.takeoff.cd0).toBeCloseTo(0.025 + 0.015, 15);
    expect(c.landing.cd0).toBeCloseTo(0.025 + 0.06, 15);
  });

  it("takeoff's e writes only takeoff", () => {
    const c = one('aircraft.aero.configurations.takeoff.oswaldEfficiency', 0.7, 0.85).apply(CONCEPT, 0.7).aircraft.configurations;
    expect([c.clean.oswaldEfficiency, c.takeoff.oswaldEfficiency, c.landing.oswaldEfficiency]).toEqual([0.8, 0.7, 0.8]);
  });

  it('the lapse exponent is written to the propulsion, the aspect ratio to the aircraft', () => {
    const lapsed = one('aircraft.propulsion.lapseExponent', 0.6, 0.9).apply(CONCEPT, 0.6);
    expect(lapsed.aircraft.propulsion.lapseExponent).toBe(0.6);
    expect(CONCEPT.aircraft.propulsion.lapseExponent).toBe(0.75); // the turboprop builder's own, left alone
    expect(one('aircraft.aero.aspectRatio', 7, 8).apply(CONCEPT, 8).aircraft.aspectRatio).toBe(8);
  });

  it("a requirement's value is written to that requirement only", () => {
    const varied = one('requirements.cruise.propellerEfficiency', 0.75, 0.85).apply(CONCEPT, 0.85);
    const eta = (id: string) => (varied.requirements.find((r) => r.id === id) as { propellerEfficiency: number }).propellerEfficiency;
    expect([eta('cruise'), eta('ferry-cruise')]).toEqual([0.85, 0.8]); // 0.8: the builder's cruise value
    expect((CONCEPT.requirements[3] as { propellerEfficiency: number }).propellerEfficiency).toBe(0.8);
  });
});
