/**
 * The design-review report of the concept in the window, built exactly as
 * `loftpoint report` builds it for the same concept: the same reading of the
 * concept, its own uncertainty block (seed, samples) or the typical ranges,
 * the same 10 % requirement step, and the version particulars when the
 * window shows a saved version. Pure: runs in a Web Worker or in the page.
 */
// @ts-nocheck

import { evaluateDesign, parseConcept, type UnitSystem } from '../../../../core';
import { buildReport } from '../../../report/report';
import type { ReportVersion } from '../../../report/section-overview';
import type { VersionComparison } from '../../../shared/contract';

/** The command line's default step for the requirement costs (`--step 10%`). */
const REPORT_STEP = 0.1;

/** Everything the report needs, as plain data that can be posted to a worker. */
export interface WindowReportRequest {
  /** The concept document as the window holds it. */
  concept: unknown;
  system: UnitSystem;
  /** The saved version shown (or the one the draft still equals); absent for an unsaved draft. */
  version?: ReportVersion & { changesSinceParent?: VersionComparison };
  /** "trainer.loftpoint, version 3", or what the unsaved draft is. */
  source: string;
  /** ISO 8601. */
  generatedAt: string;
}

/** The report's HTML; throws an Error naming the first field when the concept cannot be read. */
export function windowReportHtml(request: WindowReportRequest): string {
  const parsed = parseConcept(request.concept);
  if (!parsed.ok) {
    const first = parsed.issues[0];
    const more = parsed.issues.length > 1 ? ` (and ${parsed.issues.length - 1} more)` : '';
    throw new Error(first ? `the concept has a problem to fix first: ${first.path || 'concept'}: ${first.message}${more}` : 'the concept cannot be read');
  }
  const { concept, design, uncertainty } = parsed;
  const evaluation = evaluateDesign(design);
  return buildReport({
    concept,
    design,
    evaluation,
    ...(uncertainty ? { uncertainty } : {}),
    ...(request.version ? { version: request.version } : {}),
    studies: { step: REPORT_STEP },
    system: request.system,
    source: request.source,
    unsavedDraft: !request.version,
    generatedAt: new Date(request.generatedAt),
  });
}
