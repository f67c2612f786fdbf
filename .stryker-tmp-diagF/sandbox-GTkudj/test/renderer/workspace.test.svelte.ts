// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { Workspace } from '../../app/renderer/lib/state/workspace.svelte';
import { setIn, type ConceptDocument, type Json } from '../../app/renderer/lib/concept/edit';
import { DEMO_CONCEPTS } from '../../core';

const trainer = () => structuredClone(DEMO_CONCEPTS.find((demo) => demo.slug === 'trainer')!.concept) as unknown as ConceptDocument;

describe('Workspace', () => {
  it('recomputes the diagram on every edit and undoes it', () => {
    const workspace = new Workspace(trainer());
    const before = workspace.current!.evaluation.optimum!.powerToWeight!;
    const index = (workspace.document.requirements as Array<{ id: string }>).findIndex((r) => r.id === 'cruise');
    workspace.edit(setIn(workspace.document, ['requirements', index, 'speed'], '140 kt'));
    const after = workspace.current!.evaluation.optimum!.powerToWeight!;
    // A faster cruise needs more power (master equation, core/methods.md section 6).
    expect(after).toBeGreaterThan(before);
    workspace.undo();
    expect(workspace.current!.evaluation.optimum!.powerToWeight).toBe(before);
  });

  it('keeps drawing the last good design while the document has a problem', () => {
    const workspace = new Workspace(trainer());
    const good = workspace.current;
    workspace.edit(setIn(workspace.document, ['aircraft', 'takeoffMass'], '-5 kg'));
    expect(workspace.issues[0].path).toBe('aircraft.takeoffMass');
    expect(workspace.current).toBe(good);
  });

  it('holds every problem at once, a misspelt field before the missing one it was meant to be', () => {
    const workspace = new Workspace(trainer());
    const aero = { ...(workspace.document.aircraft as { aero: Record<string, Json> }).aero };
    aero.aspectRatoi = aero.aspectRatio;
    delete aero.aspectRatio;
    workspace.edit(setIn(workspace.document, ['aircraft', 'aero'], aero));
    workspace.edit(setIn(workspace.document, ['aircraft', 'takeoffMass'], '-5 kg'));
    expect(workspace.issues.map((i) => i.path)).toEqual(['aircraft.takeoffMass', 'aircraft.aero.aspectRatoi', 'aircraft.aero.aspectRatio']);
    expect(workspace.issues[1].message).toMatch(/did you mean "aspectRatio"/);
  });

  it('moves the point while dragging without touching the document, and commits one step', () => {
    const workspace = new Workspace(trainer());
    const document = workspace.document;
    const margins = workspace.report!.margins;
    workspace.dragTo({ wingLoadingPa: 500, loading: 14 });
    workspace.dragTo({ wingLoadingPa: 520, loading: 15 });
    expect(workspace.document).toBe(document);
    expect(workspace.report!.wingLoadingPa).toBe(520);
    expect(workspace.report!.margins).not.toEqual(margins);
    workspace.commitDrag();
    expect(workspace.dragging).toBe(false);
    expect(workspace.current!.design.designPoint).toEqual({ wingLoadingPa: 520, loading: 15 });
    workspace.undo();
    expect(workspace.document).toBe(document);
  });

  it('snaps the point to the optimum, where the tightest margin is zero', () => {
    const workspace = new Workspace(trainer());
    workspace.snapToOptimum();
    expect(workspace.report!.margins[0].margin).toBeCloseTo(0, 5);
    expect(workspace.report!.margins[0].margin).toBeGreaterThanOrEqual(0);
    expect(workspace.report!.feasible).toBe(true);
  });

  it('refuses every change to a version opened read-only', () => {
    const workspace = new Workspace({});
    workspace.load(trainer(), true);
    const document = workspace.document;
    workspace.edit(setIn(document, ['name'], 'changed'));
    workspace.dragTo({ wingLoadingPa: 500, loading: 14 });
    workspace.commitDrag();
    workspace.snapToOptimum();
    expect(workspace.document).toBe(document);
    expect(workspace.canUndo).toBe(false);
  });
});
