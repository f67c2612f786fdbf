// @ts-nocheck
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { resolveUncertainty, uncertaintySchema } from '../../../core/studies';
import { nominalOf, fieldRef, rangeableFields } from '../../../core/studies/uncertain-fields';
import { typicalRange } from '../../../core/studies';
import { DEMO_SLUGS, demo, frozen, ranged } from './fixtures';

const trainer = demo('trainer');
const jet = demo('business-jet');

function issuesOf(block: unknown, d = trainer): Array<{ path: string; message: string }> {
  const result = resolveUncertainty(block, d.design, d.concept);
  expect(result.ok).toBe(false);
  return result.ok ? [] : result.issues;
}

describe('uncertaintySchema', () => {
  it('fills in the seed, the sample count, the parameters and the uniform distribution', () => {
    const block = uncertaintySchema.parse({ parameters: [{ field: 'aircraft.aero.aspectRatio', low: 7, high: 8 }] });
    expect(block.seed).toBe(1);
    expect(block.samples).toBe(10000);
    expect(block.parameters[0].distribution).toBe('uniform');
    expect(uncertaintySchema.parse({}).parameters).toEqual([]);
  });
});

describe('resolveUncertainty', () => {
  it('takes the nominal value from the concept and keeps the written range', () => {
    const [e, ar, eta] = ranged(
      {
        seed: 20261202,
        samples: 5000,
        parameters: [
          { field: 'aircraft.aero.configurations.clean.oswaldEfficiency', low: 0.72, high: 0.88, distribution: 'triangular' },
          { field: 'aircraft.aero.aspectRatio', low: 7, high: 8.5 },
          { field: 'requirements.cruise.propellerEfficiency', low: 0.76, high: 0.84 },
        ],
      },
      trainer.design,
      trainer.concept,
    );
    // The trainer demo's own values (core/concept/demos/trainer.ts): e 0.79, AR 7.4, cruise eta default 0.8 (core/methods.md section 11).
    expect([e.nominal, ar.nominal, eta.nominal]).toEqual([0.79, 7.4, 0.8]);
    expect([e.low, e.high, e.distribution]).toEqual([0.72, 0.88, 'triangular']);
    expect(ar.distribution).toBe('uniform');
    expect(e.label).toBe('Oswald efficiency (clean)');
  });

  it('names uncertainty.parameters[i].low when the range lies above the concept value', () => {
    const issues = issuesOf({ parameters: [{ field: 'aircraft.aero.aspectRatio', low: 7.5, high: 8 }] });
    expect(issues[0].path).toBe('uncertainty.parameters[0].low');
    expect(issues[0].message).toMatch(/above the concept's value 7\.4/);
  });

  it('names .high when the range lies below the concept value, and when high is not above low', () => {
    expect(issuesOf({ parameters: [{ field: 'aircraft.aero.aspectRatio', low: 6, high: 7 }] })[0].path).toBe('uncertainty.parameters[0].high');
    expect(issuesOf({ parameters: [{ field: 'aircraft.aero.aspectRatio', low: 7.4, high: 7.4 }] })[0].message).toMatch(/greater than low/);
  });

  it('names the field of an unknown or non-uncertain assumption', () => {
    const issues = issuesOf({
      parameters: [
        { field: 'aircraft.aero.aspectRatio', low: 7, high: 8 },
        { field: 'aircraft.takeoffMass', low: 700, high: 800 },
        { field: 'aircraft.aero.configurations.flaps20.clMax', low: 1.5, high: 1.9 },
        { field: 'requirements.nope.propellerEfficiency', low: 0.7, high: 0.8 },
        { field: 'requirements.cruise.rollingFriction', low: 0.02, high: 0.05 },
      ],
    });
    expect(issues.map((i) => i.path)).toEqual([1, 2, 3, 4].map((i) => `uncertainty.parameters[${i}].field`));
    expect(issues[0].message).toMatch(/aircraft\.takeoffMass.*not an assumption that can carry a range/);
    expect(issues[1].message).toMatch(/no configuration "flaps20"/);
    expect(issues[2].message).toMatch(/no requirement has the id "nope"/);
    expect(issues[3].message).toMatch(/rollingFriction belongs to a takeoff-ground-roll or takeoff-distance requirement/);
  });

  it('refuses assumptions the concept does not use', () => {
    // A turbofan has no propeller; a piston engine has no lapse exponent (core/methods.md section 5).
    expect(issuesOf({ parameters: [{ field: 'requirements.cruise.propellerEfficiency', low: 0.7, high: 0.9 }] }, jet)[0].message).toMatch(/turbofan/);
    expect(issuesOf({ parameters: [{ field: 'aircraft.propulsion.lapseExponent', low: 0.7, high: 0.9 }] })[0].message).toMatch(/no lapse exponent/);
    expect(issuesOf({ parameters: [{ field: 'aircraft.aero.configurations.takeoff.cd0', low: 0.01, high: 0.02 }] })[0].message).toMatch(/cd0Increment/);
  });

  it('keeps ranges inside the physical bounds the concept file puts on the value', () => {
    // Oswald efficiency is at most 1 (core/concept/aircraft-schema.ts).
    const issues = issuesOf({ parameters: [{ field: 'aircraft.aero.configurations.clean.oswaldEfficiency', low: 0.7, high: 1.05 }] });
    expect(issues[0]).toEqual({ path: 'uncertainty.parameters[0].high', message: expect.stringMatching(/physical range/) });
  });

  it('refuses a field ranged twice and an unknown key, with a path', () => {
    const twice = issuesOf({
      parameters: [
        { field: 'aircraft.aero.aspectRatio', low: 7, high: 8 },
        { field: 'aircraft.aero.aspectRatio', low: 7, high: 9 },
      ],
    });
    expect(twice[0].path).toBe('uncertainty.parameters[1].field');
    expect(issuesOf({ parameters: [], sead: 3 })[0].path).toBe('uncertainty');
    expect(issuesOf({ samples: 10.5 })[0].path).toBe('uncertainty.samples');
    expect(issuesOf({ parameters: [{ field: 'aircraft.aero.aspectRatio', low: '7', high: 8 }] })[0].path).toBe('uncertainty.parameters[0].low');
  });
});

describe('UncertainParameter.apply', () => {
  it('sets the value it is given and leaves its input alone, for every rangeable field of every demo (property)', () => {
    for (const slug of DEMO_SLUGS) {
      const d = demo(slug);
      const input = frozen(d.design); // a write to the input would throw
      for (const field of rangeableFields(d.design)) {
        const ref = fieldRef(field, d.design);
        if (!ref.ok) throw new Error(field);
        const nominal = nominalOf(ref.ref, d.design);
        const typical = typicalRange(field, d.design) ?? { low: nominal - 0.01, high: nominal + 0.01 };
        const [p] = ranged({ parameters: [{ field, low: typical.low, high: typical.high }] }, d.design, d.concept);
        fc.assert(
          fc.property(fc.double({ min: p.low, max: p.high, noNaN: true }), (value) => {
            const varied = p.apply(input, value);
            return Math.abs(nominalOf(ref.ref, varied) - value) <= 1e-12 * Math.max(1, Math.abs(value));
          }),
          { numRuns: 20 },
        );
      }
    }
  });

  it("moves every configuration's cd0 with clean's, keeping the increments", () => {
    const [p] = ranged({ parameters: [{ field: 'aircraft.aero.configurations.clean.cd0', low: 0.025, high: 0.035 }] }, trainer.design, trainer.concept);
    const varied = p.apply(trainer.design, 0.034);
    const before = trainer.design.aircraft.configurations;
    const after = varied.aircraft.configurations;
    // Trainer demo: increments 0.014 (takeoff) and 0.06 (landing).
    expect(after.clean.cd0).toBe(0.034);
    expect(after.takeoff.cd0 - after.clean.cd0).toBeCloseTo(before.takeoff.cd0 - before.clean.cd0, 12);
    expect(after.landing.cd0 - after.clean.cd0).toBeCloseTo(0.06, 12);
  });

  it("moves clean's CLmax into the configurations that inherit it, and only those", () => {
    const written = structuredClone(trainer.concept);
    const configurations = written.aircraft.aero.configurations as Record<string, Record<string, number>>;
    delete configurations.takeoff.clMax; // takeoff now inherits clean's 1.45
    configurations.landing.clMax = 1.45; // landing states the same value explicitly
    const parsed = parseConcept(written);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    const [p] = ranged({ parameters: [{ field: 'aircraft.aero.configurations.clean.clMax', low: 1.3, high: 1.6 }] }, parsed.design, parsed.concept);
    const after = p.apply(parsed.design, 1.6).aircraft.configurations;
    expect([after.clean.clMax, after.takeoff.clMax, after.landing.clMax]).toEqual([1.6, 1.6, 1.45]);
    expect(p.requirementIds).toContain('takeoff-grass');
    expect(p.requirementIds).not.toContain('stall');
  });
});
