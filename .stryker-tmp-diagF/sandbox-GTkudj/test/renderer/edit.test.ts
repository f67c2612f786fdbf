// @ts-nocheck
import { describe, expect, it } from 'vitest';
import {
  addRequirement,
  freshRequirementId,
  getIn,
  removeRequirement,
  setDesignPoint,
  setIn,
  setRequirementEnabled,
  roundSignificant,
  type ConceptDocument,
} from '../../app/renderer/lib/concept/edit';
import { pathId, pathText } from '../../app/renderer/lib/concept/paths';
import { DEMO_CONCEPTS, parseConcept } from '../../core';

const demo = () => structuredClone(DEMO_CONCEPTS[0].concept) as unknown as ConceptDocument;

describe('concept edits', () => {
  it('return a new document and leave the old one untouched', () => {
    const before = demo();
    const frozen = JSON.stringify(before);
    const after = setIn(before, ['requirements', 0, 'speed'], '50 kt');
    expect(JSON.stringify(before)).toBe(frozen);
    expect(getIn(after, ['requirements', 0, 'speed'])).toBe('50 kt');
    // Untouched branches are shared, not copied.
    expect(after.aircraft).toBe(before.aircraft);
  });

  it('remove a key when given undefined, and create missing objects on the way', () => {
    const doc = demo();
    expect(getIn(setIn(doc, ['designPoint'], undefined), ['designPoint'])).toBeUndefined();
    expect(getIn(setIn(doc, ['diagram', 'samples'], 101), ['diagram', 'samples'])).toBe(101);
  });

  it('add requirements with fresh ids that the concept file accepts', () => {
    let doc = demo();
    for (const kind of ['sustained-turn', 'sustained-turn', 'cruise'] as const) doc = addRequirement(doc, kind).document;
    const ids = (doc.requirements as Array<{ id: string }>).map((r) => r.id);
    expect(ids).toContain('sustained-turn');
    expect(ids).toContain('sustained-turn-2');
    expect(ids).toContain('cruise-2');
    expect(new Set(ids).size).toBe(ids.length);
    expect(parseConcept(doc).ok).toBe(true);
    expect(freshRequirementId(doc, 'stall')).toBe('stall-2');
  });

  it('remove the ranges on a removed requirement, so the concept still reads', () => {
    const base = demo();
    const takeoff = (base.requirements as Array<{ id: string; kind: string }>).findIndex((r) => r.kind === 'takeoff-ground-roll');
    const id = (base.requirements as Array<{ id: string }>)[takeoff].id;
    const doc: ConceptDocument = {
      ...base,
      uncertainty: {
        seed: 7,
        samples: 1000,
        parameters: [
          { field: `requirements.${id}.rollingFriction`, low: 0.02, high: 0.1 },
          { field: 'aircraft.aero.aspectRatio', low: 6, high: 8 },
        ],
      },
    };
    expect(parseConcept(doc).ok).toBe(true);
    const removed = removeRequirement(doc, takeoff);
    expect(removed.uncertainty).toEqual({ seed: 7, samples: 1000, parameters: [{ field: 'aircraft.aero.aspectRatio', low: 6, high: 8 }] });
    expect(parseConcept(removed).ok).toBe(true);
    // The old document is untouched.
    expect((doc.uncertainty as { parameters: unknown[] }).parameters).toHaveLength(2);
  });

  it('switch off, remove and place the design point in SI', () => {
    let doc = setRequirementEnabled(demo(), 0, false);
    expect(getIn(doc, ['requirements', 0, 'enabled'])).toBe(false);
    doc = setRequirementEnabled(doc, 0, true);
    expect(getIn(doc, ['requirements', 0, 'enabled'])).toBeUndefined();
    const count = (doc.requirements as unknown[]).length;
    expect((removeRequirement(doc, 1).requirements as unknown[]).length).toBe(count - 1);
    const placed = setDesignPoint(doc, { wingLoadingPa: 612.3456789, loading: 9.87654321 }, 'powerToWeight');
    expect(placed.designPoint).toEqual({ wingLoading: '612.346 N/m^2', powerToWeight: '9.8765 W/N' });
    const parsed = parseConcept(placed);
    expect(parsed.ok && parsed.design.designPoint?.wingLoadingPa).toBeCloseTo(612.346, 9);
    expect(setDesignPoint(doc, { wingLoadingPa: 3400, loading: 0.31 }, 'thrustToWeight').designPoint).toEqual({ wingLoading: '3400 N/m^2', thrustToWeight: 0.31 });
    // Snapped onto a boundary, the rounding keeps the point on the feasible side.
    expect(setDesignPoint(doc, { wingLoadingPa: 672.81239999, loading: 10.5212345 }, 'powerToWeight', true).designPoint).toEqual({
      wingLoading: '672.8123 N/m^2',
      powerToWeight: '10.5213 W/N',
    });
  });

  it('round to significant digits in a chosen direction', () => {
    expect(roundSignificant(123.456, 4)).toBe(123.5);
    expect(roundSignificant(123.456, 4, -1)).toBe(123.4);
    expect(roundSignificant(0.0012341, 3, 1)).toBe(0.00124);
    expect(roundSignificant(0, 3, 1)).toBe(0);
  });

  it('name fields the way concept issues do', () => {
    expect(pathText(['requirements', 2, 'speed'])).toBe('requirements[2].speed');
    expect(pathText(['aircraft', 'aero', 'configurations', 'clean', 'cd0'])).toBe('aircraft.aero.configurations.clean.cd0');
    expect(pathId(['aircraft', 'aero', 'configurations', 'second-segment', 'clMax'])).toBe('aircraft-aero-configurations-second-segment-clMax');
  });
});
