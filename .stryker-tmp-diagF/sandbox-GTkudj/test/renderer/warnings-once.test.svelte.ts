// @ts-nocheck
// @vitest-environment jsdom
/**
 * Each warning travels one route (the evaluation) and is shown once: in the
 * evaluation JSON, the window's checks, the CLI text report and the
 * design-review report. The concept is the trainer demo without its take-off
 * configuration (so its take-off run falls back to clean, a note from
 * reading) and with a sailplane-beyond aspect ratio of 45 (outside the
 * typical 4-40, a note from the engine: 20+ for sailplanes, common practice).
 */
import { describe, expect, it } from 'vitest';
import { evaluationReport } from '../../app/cli/evaluate-report';
import { buildReport } from '../../app/report/report';
import { Workspace } from '../../app/renderer/lib/state/workspace.svelte';
import type { ConceptDocument } from '../../app/renderer/lib/concept/edit';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept, type WarningJson } from '../../core';

function concept(): ConceptDocument {
  const c = structuredClone(DEMO_CONCEPTS.find((demo) => demo.slug === 'trainer')!.concept) as unknown as {
    aircraft: { aero: { aspectRatio: number; configurations: Record<string, unknown> } };
    requirements: Array<Record<string, unknown>>;
  };
  delete c.aircraft.aero.configurations.takeoff;
  for (const r of c.requirements) if (r.configuration === 'takeoff') delete r.configuration;
  c.aircraft.aero.aspectRatio = 45;
  return c as unknown as ConceptDocument;
}

const key = (w: WarningJson) => `${w.field} ${w.message}`;

function occurrences(haystack: string, needle: string): number {
  return haystack.split(needle).length - 1;
}

describe('warnings', () => {
  const parsed = parseConcept(concept());
  if (!parsed.ok) throw new Error(parsed.issues[0].message);
  const evaluation = evaluateDesign(parsed.design);
  const codes = evaluation.warnings.map((w) => w.code);

  it('are carried by the evaluation, each once, reading notes and engine notes alike', () => {
    expect(codes).toContain('configuration-fallback');
    expect(codes).toContain('assumption-outside-typical-range');
    expect(new Set(evaluation.warnings.map(key)).size).toBe(evaluation.warnings.length);
  });

  it('appear once in the window', () => {
    const workspace = new Workspace(concept());
    const shown = workspace.current!.warnings;
    expect(shown.map(key)).toEqual(evaluation.warnings.map(key));
  });

  it('appear once in the CLI text report', () => {
    const text = evaluationReport({ source: 'trainer.json', design: parsed.design, evaluation, system: 'si' });
    expect(text).toContain(`WARNINGS (${evaluation.warnings.length})`);
    expect(occurrences(text, '].configuration:')).toBe(codes.filter((c) => c === 'configuration-fallback').length);
    expect(occurrences(text, 'Aspect ratio 45 is outside')).toBe(1);
  });

  it('appear once in the design-review report', () => {
    const html = buildReport({ concept: parsed.concept, design: parsed.design, evaluation, system: 'si', studies: { samples: 200 }, generatedAt: new Date('2026-01-15T10:30:00Z') });
    expect(html).toContain(`Warnings (${evaluation.warnings.length})`);
    expect(occurrences(html, 'Aspect ratio 45 is outside')).toBe(1);
  });
});
