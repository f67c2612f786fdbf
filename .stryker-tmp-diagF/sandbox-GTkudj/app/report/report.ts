/**
 * The design-review report: one self-contained HTML document (inline CSS and
 * SVG, no external resources) laid out for A4, in this order: title block,
 * caution, the job, requirements, assumptions, the diagram with the optimum
 * and the design point, margins, sizing, speeds, the studies, the version
 * note and what changed since the parent version, warnings, and the caution
 * again. Every user string is escaped; every number is formatted by core
 * (a value that is not defined reads "—").
 */
// @ts-nocheck

import type { ConceptUncertainty, Design, Evaluation, UnitSystem, WarningJson } from '../../core';
import type { VersionComparison } from '../shared/contract';
import { reportContext } from './context';
import { paragraph, section, text } from './html';
import { assumptionsSection } from './section-assumptions';
import { cautionBox, jobSection, titleBlock, type ReportVersion } from './section-overview';
import { requirementsSection } from './section-requirements';
import { diagramSection, marginsSection, sizingSection, speedsSection } from './section-results';
import { studiesSection } from './section-studies';
import { versionSection } from './section-version';
import { runStudies, type ReportStudies, type StudyOptions } from './studies';
import { reportCss } from './style';

export interface ReportInput {
  /** The concept document as written (for resolving ranges against what the user wrote). */
  concept: unknown;
  design: Design;
  evaluation: Evaluation;
  /** The concept's own ranges (parseConcept's `uncertainty`); absent: typical ranges. */
  uncertainty?: ConceptUncertainty;
  version?: ReportVersion & { changesSinceParent?: VersionComparison };
  studies?: StudyOptions;
  system: UnitSystem;
  /** Where the concept came from, e.g. "trainer.json" or "fleet.loftpoint, version 3". */
  source?: string;
  /** No version because the concept is an unsaved draft in the window (not a concept file). */
  unsavedDraft?: boolean;
  generatedAt?: Date;
  /** Studies already run (the command line reuses them for other outputs); run here when absent. */
  studyResults?: ReportStudies;
}

function warningsSection(warnings: readonly WarningJson[]): string {
  if (warnings.length === 0) return section('warnings', 'Warnings', paragraph('None.', 'muted'));
  const items = warnings.map((w) => `<li>${w.field ? `<code>${text(w.field)}</code>: ` : ''}${text(w.message)}</li>`).join('\n');
  return section('warnings', `Warnings (${warnings.length})`, `<ul class="plain">\n${items}\n</ul>`);
}

export function buildReport(input: ReportInput): string {
  const { design, evaluation, system } = input;
  const ctx = reportContext(design, evaluation, system);
  const studies =
    input.studyResults ??
    runStudies({ design, concept: input.concept, evaluation, system, ...(input.uncertainty ? { uncertainty: input.uncertainty } : {}), ...(input.studies ? { options: input.studies } : {}) });
  const name = design.name.trim() || 'Untitled concept';
  const running = input.version ? `${name} · version ${input.version.number}` : name;
  const body = [
    titleBlock(ctx, { ...(input.source ? { source: input.source } : {}), ...(input.version ? { version: input.version } : {}), generatedAt: input.generatedAt ?? new Date() }),
    cautionBox(),
    jobSection(ctx),
    requirementsSection(ctx),
    assumptionsSection(ctx, studies),
    diagramSection(ctx),
    marginsSection(ctx),
    `<div class="two-up">\n${sizingSection(ctx)}\n${speedsSection(ctx)}\n</div>`,
    studiesSection(ctx, studies),
    versionSection(input.version, input.version?.changesSinceParent, system, input.unsavedDraft === true && !input.version),
    warningsSection(evaluation.warnings),
    `<footer class="end">${cautionBox(true)}</footer>`,
  ];
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    // Self-contained by rule: nothing may be fetched and nothing may run.
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
    `<meta name="generator" content="Loftpoint">`,
    `<title>${text(`${running} — design review`)}</title>`,
    `<style>${reportCss(running)}</style>`,
    '</head>',
    '<body>',
    ...body,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
