/**
 * One table of typical ranges, three readers: the engine's warnings, the
 * window's marks and the studies' starting ranges must say the same thing
 * for every assumption.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { AERO_FIELDS, configurationFieldSpecs, propulsionFieldSpecs, requirementFieldSpecs, type FieldSpec } from '../../../app/renderer/lib/concept/fields';
import type { TypicalRange } from '../../../core/assumptions/typical-range';
import { ASPECT_RATIO, CD0_CLEAN, CD0_INCREMENT, CLMAX, OSWALD } from '../../../core/assumptions/typical-ranges';
import { configurationRole } from '../../../core/assumptions/configuration-role';
import { assumptionWarnings } from '../../../core/diagram/assumption-warnings';
import type { Design, PropulsionKind } from '../../../core/model';
import { PROPULSION_DESCRIPTORS } from '../../../core/propulsion/kinds';
import { REQUIREMENT_DESCRIPTORS } from '../../../core/requirements';
import { typicalRange } from '../../../core/studies/typical-ranges';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../../core';
import { aircraft, approachSpeed, balancedField, ceiling, climbGradient, climbRate, cruise, design, landingDistance, landingRoll, maximumSpeed, stall, sustainedTurn, takeoffDistance, takeoffRoll } from '../helpers/design';

/** One requirement of every kind, on an aircraft with the usual configurations and an engine-out one. */
function baseDesign(kind: PropulsionKind = 'piston'): Design {
  return design({
    aircraft: aircraft({
      kind,
      engines: 2,
      increments: {
        takeoff: { cd0Increment: 0.015, oswaldEfficiency: 0.76, clMax: 1.8 },
        landing: { cd0Increment: 0.06, oswaldEfficiency: 0.72, clMax: 2.1 },
        'engine-out': { cd0Increment: 0.004 },
      },
    }),
    requirements: [
      stall(25),
      landingRoll(300),
      takeoffRoll(300),
      cruise(60),
      climbRate(3),
      climbGradient(0.02),
      ceiling(3000),
      sustainedTurn(50, 1.5),
      takeoffDistance(600),
      balancedField(1200),
      landingDistance(600),
      approachSpeed(35),
      maximumSpeed(70),
    ],
    rangePa: [200, 2000],
  });
}

interface Assumption {
  name: string;
  field: string;
  range: TypicalRange;
  /** The window's mark for it. */
  mark: FieldSpec['typical'];
  /** A design of the right kind with this value set. */
  withValue: (value: number) => Design;
  /** False where the engine only checks a physical rule (CD0 increment below clean), not the range. */
  warns?: boolean;
}

const find = (specs: FieldSpec[], key: string) => specs.find((spec) => spec.key === key)?.typical;

function configurationAssumptions(): Assumption[] {
  const out: Assumption[] = [];
  for (const name of ['clean', 'takeoff', 'landing', 'engine-out']) {
    const role = configurationRole(name);
    const specs = configurationFieldSpecs(name);
    const set = (key: 'oswaldEfficiency' | 'clMax') => (value: number) => {
      const d = baseDesign();
      d.aircraft.configurations[name] = { ...d.aircraft.configurations[name], [key]: value };
      return d;
    };
    out.push({ name: `Oswald e (${name})`, field: `aircraft.aero.configurations.${name}.oswaldEfficiency`, range: OSWALD[role], mark: find(specs, 'oswaldEfficiency'), withValue: set('oswaldEfficiency') });
    const clMax = CLMAX[role];
    if (clMax) out.push({ name: `CLmax (${name})`, field: `aircraft.aero.configurations.${name}.clMax`, range: clMax, mark: find(specs, 'clMax'), withValue: set('clMax') });
    if (name !== 'clean') {
      out.push({
        name: `CD0 increment (${name})`,
        field: `aircraft.aero.configurations.${name}.cd0Increment`,
        range: CD0_INCREMENT[role],
        mark: find(specs, 'cd0Increment'),
        withValue: (value) => {
          const d = baseDesign();
          d.aircraft.configurations[name] = { ...d.aircraft.configurations[name], cd0: d.aircraft.configurations.clean.cd0 + value };
          return d;
        },
        warns: false,
      });
    }
  }
  return out;
}

function assumptions(): Assumption[] {
  const out: Assumption[] = [
    {
      name: 'aspect ratio',
      field: 'aircraft.aero.aspectRatio',
      range: ASPECT_RATIO,
      mark: find(AERO_FIELDS, 'aspectRatio'),
      withValue: (value) => ({ ...baseDesign(), aircraft: { ...baseDesign().aircraft, aspectRatio: value } }),
    },
    {
      name: 'clean CD0',
      field: 'aircraft.aero.configurations.clean.cd0',
      range: CD0_CLEAN,
      mark: find(configurationFieldSpecs('clean'), 'cd0'),
      withValue: (value) => {
        const d = baseDesign();
        d.aircraft.configurations.clean = { ...d.aircraft.configurations.clean, cd0: value };
        return d;
      },
    },
    ...configurationAssumptions(),
  ];
  for (const p of PROPULSION_DESCRIPTORS) {
    if (!p.lapseExponent) continue;
    out.push({
      name: `lapse exponent (${p.kind})`,
      field: 'aircraft.propulsion.lapseExponent',
      range: p.lapseExponent.typical,
      mark: find(propulsionFieldSpecs(p.kind), 'lapseExponent'),
      withValue: (value) => {
        const d = baseDesign(p.kind);
        d.aircraft.propulsion = { ...d.aircraft.propulsion, lapseExponent: value };
        return d;
      },
    });
  }
  REQUIREMENT_DESCRIPTORS.forEach((kind, index) => {
    const own = [
      ...(kind.propeller ? [{ key: 'propellerEfficiency', field: 'propellerEfficiency', range: kind.propeller.typical }] : []),
      ...kind.typicalRanges.map((entry) => ({ key: entry.key, field: entry.field as string, range: entry.range })),
    ];
    for (const { key, field, range } of own) {
      out.push({
        name: `${key} (${kind.kind})`,
        field: `requirements[${index}].${key}`,
        range,
        mark: find(requirementFieldSpecs(kind.kind), key),
        withValue: (value) => {
          const d = baseDesign();
          d.requirements[index] = { ...d.requirements[index], [field]: value } as Design['requirements'][number];
          return d;
        },
      });
    }
  });
  return out;
}

/** The studies address a requirement by id and a configuration by name, the engine by index. */
function studyField(field: string, d: Design): string {
  const m = /^requirements\[(\d+)\]\.(\w+)$/.exec(field);
  return m ? `requirements.${d.requirements[Number(m[1])].id}.${m[2]}` : field;
}

describe('the typical-range table', () => {
  const all = assumptions();

  it('covers every assumption the window marks, the engine checks and the studies range', () => {
    // Every requirement kind that uses a propeller has a propeller-efficiency row; every own range of a kind has one.
    const propellerKinds = REQUIREMENT_DESCRIPTORS.filter((d) => d.propeller).length;
    expect(all.filter((a) => a.name.startsWith('propellerEfficiency')).length).toBe(propellerKinds);
    expect(all.length).toBeGreaterThan(20);
  });

  for (const a of all) {
    describe(a.name, () => {
      it('is marked in the window with the same bounds', () => {
        expect(a.mark, a.field).toBeDefined();
        expect([a.mark?.low, a.mark?.high]).toEqual([a.range.low, a.range.high]);
      });

      it('warns in the engine just outside the bounds and not inside', () => {
        const mid = (a.range.low + a.range.high) / 2;
        const fieldWarnings = (d: Design) => assumptionWarnings(d).filter((w) => w.field === a.field);
        expect(fieldWarnings(a.withValue(mid))).toEqual([]);
        if (a.warns === false) return;
        const above = fieldWarnings(a.withValue(a.range.high * 1.05 + 1e-6));
        const below = fieldWarnings(a.withValue(a.range.low * 0.95 - 1e-6));
        const above1 = above[0]?.message ?? '';
        expect(above1).toContain(a.range.text);
        // A value at or below zero is out of the schema for most fields; only check below when it stays positive.
        if (a.range.low * 0.95 - 1e-6 > 0) expect(below[0]?.message ?? '').toContain(a.range.text);
      });

      it('starts the studies from a published band inside the bounds', () => {
        const mid = (a.range.low + a.range.high) / 2;
        const d = a.withValue(mid);
        const range = typicalRange(studyField(a.field, d), d);
        if (a.range.bands.length === 0) return;
        expect(range, a.field).not.toBeNull();
        for (const band of a.range.bands) {
          expect(band.low).toBeGreaterThanOrEqual(a.range.low);
          expect(band.high).toBeLessThanOrEqual(a.range.high);
        }
        if (range && !range.widened) {
          expect(range.low).toBeGreaterThanOrEqual(a.range.low);
          expect(range.high).toBeLessThanOrEqual(a.range.high);
        }
      });
    });
  }

  it('uses the ranges the methods reference gives (section 9)', () => {
    // Aspect ratio 4-5 deltas up to 20+ sailplanes; clean CLmax 0.8 thin wing to 1.2-1.5 typical, up to 1.7;
    // take-off flaps 1.4-2.2 and landing flaps 1.6-2.8 (Roskam, Airplane Design I, Table 3.1, from memory).
    expect([ASPECT_RATIO.low, ASPECT_RATIO.high]).toEqual([4, 40]);
    expect([CLMAX.clean?.low, CLMAX.clean?.high]).toEqual([0.8, 1.7]);
    expect([CLMAX.takeoff?.low, CLMAX.takeoff?.high]).toEqual([1.4, 2.2]);
    expect([CLMAX.landing?.low, CLMAX.landing?.high]).toEqual([1.6, 2.8]);
    // An aspect ratio of 20 (a sailplane) and a clean CLmax of 1.65 are typical, in the window as in the engine.
    expect(assumptionWarnings(assumptions()[0].withValue(20)).filter((w) => w.field === 'aircraft.aero.aspectRatio')).toEqual([]);
  });
});

describe('configuration roles', () => {
  it('reads take-off and landing names the way the trade writes them, in one place', () => {
    expect(['takeoff', 'take-off', 'second-segment', 'climb-flaps'].map(configurationRole)).toEqual(['takeoff', 'takeoff', 'takeoff', 'takeoff']);
    expect(['landing', 'approach', 'Landing-full'].map(configurationRole)).toEqual(['landing', 'landing', 'landing']);
    expect(['clean', 'engine-out', 'cruise'].map(configurationRole)).toEqual(['clean', 'other', 'other']);
  });

  it('never prints "undefined" for a configuration named like an object property', () => {
    for (const name of ['toString', 'constructor', '__proto__', 'hasOwnProperty', 'valueOf']) {
      const d = baseDesign();
      d.aircraft.configurations = { ...d.aircraft.configurations };
      Object.defineProperty(d.aircraft.configurations, name, {
        value: { cd0: 0.04, oswaldEfficiency: 0.5, clMax: 9 },
        enumerable: true,
        configurable: true,
        writable: true,
      });
      const warnings = assumptionWarnings(d);
      for (const w of warnings) expect(w.message, `${name}: ${w.message}`).not.toMatch(/undefined|NaN|function/);
      // Its Oswald efficiency of 0.5 is outside 0.7-0.95 and is reported under its own name.
      expect(warnings.some((w) => w.field === `aircraft.aero.configurations.${name}.oswaldEfficiency`), name).toBe(true);
      const range = typicalRange(`aircraft.aero.configurations.${name}.oswaldEfficiency`, d);
      expect(range?.source ?? '').not.toMatch(/undefined/);
    }
  });

  it('reads, evaluates and reports a concept file with a configuration named "toString" like any other', () => {
    const concept = structuredClone(DEMO_CONCEPTS.find((d) => d.slug === 'trainer')!.concept) as unknown as {
      aircraft: { aero: { configurations: Record<string, unknown> } };
      requirements: Array<Record<string, unknown>>;
    };
    concept.aircraft.aero.configurations['toString'] = { cd0Increment: 0.01, clMax: 1.9, oswaldEfficiency: 0.6 } as unknown as () => string;
    concept.requirements.push({ id: 'odd', kind: 'cruise', speed: '90 kt', configuration: 'toString' });
    const parsed = parseConcept(concept);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const evaluation = evaluateDesign(parsed.design);
    expect(JSON.stringify(evaluation)).not.toMatch(/undefined|function/);
    expect(evaluation.speeds?.stallByConfiguration?.['toString']).toBeGreaterThan(0);
    // e 0.6 is below the typical 0.7-0.95 (common practice): warned under its own name, with the range.
    const warning = evaluation.warnings.find((w) => w.field === 'aircraft.aero.configurations.toString.oswaldEfficiency');
    expect(warning?.message).toContain('0.7-0.95');
  });
});
