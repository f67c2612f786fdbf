/**
 * compareVersions: requirements matched by id, assumptions field by field,
 * and the movement of the optimum, the design point, margins and sizing,
 * checked against the engine's own evaluation of each concept.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { evaluateDesign, parseConcept, type Evaluation } from '../../core';
import { PRELIMINARY_CAUTION, comparisonText } from '../../app/service';
import { demoConcept, serviceWithProject } from './helpers';

function evaluate(concept: unknown): Evaluation {
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(parsed.issues[0].message);
  return evaluateDesign(parsed.design);
}

function scenario() {
  const { service } = serviceWithProject();
  const before = demoConcept(0);
  const after = structuredClone(before);
  after.aircraft.aero.aspectRatio = before.aircraft.aero.aspectRatio + 1.5;
  after.requirements = after.requirements.filter((r: { id: string }) => r.id !== 'ceiling');
  after.requirements.find((r: { id: string }) => r.id === 'stall').speed = '48 kt';
  after.requirements.push({ id: 'climb-fast', kind: 'climb-rate', rate: '900 ft/min' });
  after.designPoint = { wingLoading: '700 N/m^2', powerToWeight: '11.5 W/N' };
  const a = service.saveVersion({ concept: before, note: 'before' }).version.number;
  const b = service.saveVersion({ concept: after, note: 'after' }).version.number;
  return { service, before, after, a, b };
}

describe('compareVersions', () => {
  it('lists requirements added, removed and changed field by field, with values as written', () => {
    const { service, a, b } = scenario();
    const comparison = service.compareVersions({ a, b });
    expect(comparison.requirements.added.map((r) => r.id)).toEqual(['climb-fast']);
    expect(comparison.requirements.removed.map((r) => r.id)).toEqual(['ceiling']);
    expect(comparison.requirements.changed.map((r) => [r.id, r.kind])).toEqual([['stall', 'stall']]);
    expect(comparison.requirements.changed[0].fields).toEqual([{ path: 'speed', before: '45 kt', after: '48 kt' }]);
    service.closeProject({});
  });

  it('lists assumption changes under aircraft and other fields separately, old and new values', () => {
    const { service, before, after, a, b } = scenario();
    const comparison = service.compareVersions({ a, b });
    expect(comparison.assumptions).toEqual([
      { path: 'aircraft.aero.aspectRatio', before: before.aircraft.aero.aspectRatio, after: after.aircraft.aero.aspectRatio },
    ]);
    expect(comparison.other).toEqual(
      expect.arrayContaining([
        { path: 'designPoint.wingLoading', before: before.designPoint.wingLoading, after: '700 N/m^2' },
        { path: 'designPoint.powerToWeight', before: before.designPoint.powerToWeight, after: '11.5 W/N' },
      ]),
    );
    service.closeProject({});
  });

  it("moves the optimum, design point, margins and sizing exactly as the engine's evaluations say", () => {
    const { service, before, after, a, b } = scenario();
    const evalA = evaluate(before);
    const evalB = evaluate(after);
    const comparison = service.compareVersions({ a, b });
    expect(comparison.optimum.before).toEqual({ wingLoading: evalA.optimum!.wingLoading, loading: evalA.optimum!.powerToWeight });
    expect(comparison.optimum.after).toEqual({ wingLoading: evalB.optimum!.wingLoading, loading: evalB.optimum!.powerToWeight });
    expect(comparison.optimum.delta!.wingLoading).toBeCloseTo(evalB.optimum!.wingLoading - evalA.optimum!.wingLoading, 9);
    expect(comparison.optimum.activeAfter).toEqual(evalB.optimum!.active);
    expect(comparison.designPoint.after).toEqual({ wingLoading: 700, loading: 11.5 });
    const marginOf = (evaluation: Evaluation, id: string) => evaluation.designPoint!.margins.find((m) => m.id === id)?.margin ?? null;
    const byId = new Map(comparison.margins.designPoint.map((m) => [m.id, m]));
    expect(byId.get('stall')).toMatchObject({ before: marginOf(evalA, 'stall'), after: marginOf(evalB, 'stall') });
    expect(byId.get('ceiling')).toMatchObject({ before: marginOf(evalA, 'ceiling'), after: null, delta: null });
    expect(byId.get('climb-fast')).toMatchObject({ before: null, after: marginOf(evalB, 'climb-fast') });
    expect(comparison.margins.optimum.length).toBeGreaterThan(0);
    expect(comparison.sizing.wingArea).toMatchObject({ before: evalA.sizing!.wingArea, after: evalB.sizing!.wingArea });
    expect(comparison.sizing.installed).toMatchObject({ id: 'power', before: evalA.sizing!.power, after: evalB.sizing!.power });
    service.closeProject({});
  });

  it('finds nothing changed between a version and itself, with zero movement', () => {
    const { service, a } = scenario();
    const comparison = service.compareVersions({ a, b: a });
    expect(comparison.requirements).toEqual({ added: [], removed: [], changed: [] });
    expect(comparison.assumptions).toEqual([]);
    expect(comparison.other).toEqual([]);
    expect(comparison.optimum.delta).toEqual({ wingLoading: 0, loading: 0 });
    expect(comparison.margins.designPoint.every((m) => m.delta === 0)).toBe(true);
    service.closeProject({});
  });

  it('gives no loading delta between a power-loaded and a thrust-loaded concept', () => {
    const { service } = serviceWithProject({ demo: true });
    const versions = service.listVersions({});
    const prop = versions.find((v) => v.summary.axis === 'powerToWeight')!;
    const jet = versions.find((v) => v.summary.axis === 'thrustToWeight')!;
    const comparison = service.compareVersions({ a: prop.number, b: jet.number });
    expect(comparison.axis).toEqual({ before: 'powerToWeight', after: 'thrustToWeight' });
    expect(comparison.optimum.delta).toBeNull();
    expect(comparison.sizing.installed.delta).toBeNull();
    const text = comparisonText(comparison, 'si');
    expect(text).toContain('axis changed');
    expect(text).not.toMatch(/NaN|undefined/);
    service.closeProject({});
  });

  it('reads as text in either unit system, never NaN, ending with the caution', () => {
    const { service, a, b } = scenario();
    const comparison = service.compareVersions({ a, b });
    for (const units of ['si', 'us'] as const) {
      const text = comparisonText(comparison, units);
      expect(text).toContain('~ stall (stall) changed');
      expect(text).toContain('speed: "45 kt" -> "48 kt"');
      expect(text).toContain('- ceiling (ceiling) removed');
      expect(text).toContain(units === 'si' ? 'N/m²' : 'lb/ft²');
      expect(text).not.toMatch(/NaN|undefined/);
      expect(text.trimEnd().endsWith(PRELIMINARY_CAUTION)).toBe(true);
    }
    service.closeProject({});
  });
});
