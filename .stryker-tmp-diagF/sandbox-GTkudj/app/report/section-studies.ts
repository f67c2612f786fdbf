/**
 * The studies: each boundary as a band over the assumption ranges with the
 * contours of the chance of meeting every requirement, that chance at the
 * design point (overall and per requirement), the tornado of what moves the
 * optimum, and what each requirement costs.
 */
// @ts-nocheck

import { formatQuantity, type Design, type Evaluation, type UnitSystem } from '../../core';
import { costRows } from '../chart/costs-rows';
import { studyDiagramSvg } from '../chart/study-svg';
import { tornadoSvg } from '../chart/tornado-svg';
import { reportContext, type ReportContext } from './context';
import { cell, facts, inlineSvg, markup, paragraph, section, table, text } from './html';
import { STUDY_DIAGRAM_SIZE } from './section-results';
import type { ReportStudies } from './studies';

/** "24.2 %" for a probability; "—" when not finite. */
export function probabilityText(p: number): string {
  return Number.isFinite(p) ? `${(p * 100).toFixed(1)} %` : '—';
}

/** "10,000 samples, seed 1": the run, as the report and the diagram's legend state it. */
export function runText(studies: Pick<ReportStudies, 'samples' | 'seed'>): string {
  return `${studies.samples.toLocaleString('en-US')} samples, seed ${studies.seed}`;
}

/** The study diagram of a concept on its own, e.g. for `loftpoint report --out diagram.svg`. */
export function reportDiagramSvg(input: { design: Design; evaluation: Evaluation; system: UnitSystem; studies: ReportStudies }): string {
  return studyDiagram(reportContext(input.design, input.evaluation, input.system), input.studies);
}

function studyDiagram(ctx: ReportContext, studies: ReportStudies): string {
  return studyDiagramSvg(ctx.evaluation, {
    title: ctx.design.name,
    system: ctx.system,
    ...STUDY_DIAGRAM_SIZE,
    bands: studies.bands,
    ...(studies.map ? { map: studies.map, runNote: `Monte Carlo: ${runText(studies)}` } : {}),
  });
}

function introduction(studies: ReportStudies): string {
  const count = studies.rows.length;
  const whose =
    studies.ranges === 'typical'
      ? `The concept gives no ranges, so these studies use the typical ranges of the methods reference, section 9 (${count} assumption${count === 1 ? '' : 's'}; listed under Assumptions). They show what could move the design point, not the concept’s own uncertainty: give the concept an uncertainty block to study its own ranges.`
      : `${count} assumption${count === 1 ? '' : 's'} carry a range in the concept (listed under Assumptions).`;
  const run = studies.map
    ? ` The chance of meeting every requirement is a seeded Monte Carlo over those ranges (${runText(studies)}; the same seed and count give the same numbers).`
    : '';
  return paragraph(`${whose}${run}`, studies.ranges === 'typical' ? 'notice' : undefined);
}

function probabilityPart(ctx: ReportContext, studies: ReportStudies): string {
  const map = studies.map;
  if (!map) return paragraph('No assumption is ranged, so there is nothing to sample.', 'muted');
  const parts = ['<h3>Chance of meeting every requirement</h3>'];
  const point = map.designPoint;
  if (point) {
    const where = `${ctx.wingLoading(point.wingLoadingPa)}, ${ctx.loading(point.loading)}`;
    const who = point.source === 'design point' ? 'design point' : 'nominal optimum (the concept gives no design point)';
    parts.push(
      facts([
        [`At the ${who}`, where],
        ['Meets every requirement', markup(`<strong>${text(probabilityText(point.probability))}</strong> ± ${text(probabilityText(point.standardError))} (one standard error)`)],
      ]),
    );
    const rows = [...point.byRequirement]
      .sort((a, b) => a.probability - b.probability)
      .map((entry) => [cell(entry.id, 'id'), cell(probabilityText(entry.probability), entry.probability < 0.5 ? 'bad' : undefined)]);
    parts.push(table(['Requirement', 'Chance it is met there'], rows, { numeric: [1], className: 'narrow' }));
  }
  const spread = map.optimumSpread;
  if (spread) {
    const thrust = ctx.evaluation.axis === 'thrustToWeight';
    parts.push(
      table(
        ['Optimum over the samples', '5th percentile', 'Median', '95th percentile'],
        [
          ['Wing loading', ctx.wingLoading(spread.wingLoadingPa.p5), ctx.wingLoading(spread.wingLoadingPa.p50), ctx.wingLoading(spread.wingLoadingPa.p95)],
          [thrust ? 'Thrust-to-weight' : 'Power-to-weight', ctx.loading(spread.loading.p5), ctx.loading(spread.loading.p50), ctx.loading(spread.loading.p95)],
        ],
        { numeric: [1, 2, 3] },
      ),
      paragraph(
        `${spread.samplesOnGrid.toLocaleString('en-US')} of ${map.samples.toLocaleString('en-US')} samples have a feasible point on the diagram; their optimum is read on the grid, to ${formatQuantity(spread.resolutionPa, 'wingLoading', ctx.system)} in wing loading.`,
        'small muted',
      ),
    );
  }
  return parts.join('\n');
}

/** A change of the optimum; one that rounds to nothing reads "no change", one with no feasible point is marked. */
function changeCell(value: string, feasible: boolean) {
  if (!feasible) return cell(value, 'bad');
  return /^0 .*\((0\.0 %|—)\)$/.test(value) ? cell('no change', 'muted') : cell(value);
}

function stepText(step: number): string {
  return `${Number((step * 100).toFixed(2))} %`;
}

function costsPart(ctx: ReportContext, studies: ReportStudies): string {
  const step = stepText(studies.step);
  const rows = costRows(studies.costs, ctx.system).flatMap((row) => {
    const name = markup(`<span class="id">${text(row.id)}</span><span class="label">${text(row.kind)}: ${text(row.stepped)}</span>`);
    const notes = row.notes.length > 0 ? markup(`<span class="label">${text(row.notes.join(' '))}</span>`) : '';
    return [
      [name, 'relaxed', row.relaxed.value, changeCell(row.relaxed.loading, row.relaxed.feasible), changeCell(row.relaxed.wingArea, row.relaxed.feasible), changeCell(row.relaxed.installed, row.relaxed.feasible)],
      [notes, 'tightened', row.tightened.value, changeCell(row.tightened.loading, row.tightened.feasible), changeCell(row.tightened.wingArea, row.tightened.feasible), changeCell(row.tightened.installed, row.tightened.feasible)],
    ];
  });
  return [
    table(['Requirement', 'Case', 'Stepped to', `Optimum ${ctx.axisSymbol}: change`, 'Wing area at optimum: change', `${ctx.evaluation.axis === 'thrustToWeight' ? 'Installed thrust' : 'Installed power'}: change`], rows, {
      numeric: [2, 3, 4, 5],
      className: 'costs',
    }),
    paragraph(
      `Each requirement in turn relaxed and tightened by ${step} of its main value, the others as they are; the optimum is found again and compared with today’s. Wing area and installed power or thrust (sea-level rated, all engines) are at the optimum, at take-off mass. A requirement that does not bind usually costs nothing until the step makes it bind.`,
      'small muted',
    ),
  ].join('\n');
}

export function studiesSection(ctx: ReportContext, studies: ReportStudies): string {
  const title = studies.ranges === 'typical' ? 'Studies on typical ranges' : 'Studies over the concept’s ranges';
  const body = [
    introduction(studies),
    inlineSvg(studyDiagram(ctx, studies), 'study', `Boundary bands and probability contours of ${ctx.design.name}`),
    probabilityPart(ctx, studies),
  ].join('\n');
  const tornado = inlineSvg(
    tornadoSvg(studies.tornado, { system: ctx.system, title: ctx.design.name, width: 880, hideNoEffect: true }),
    'tornado',
    `What moves the optimum of ${ctx.design.name}`,
  );
  return [
    section('studies', title, body, { newPage: true }),
    section('sensitivity', 'What moves the optimum', tornado),
    section('costs', `What each requirement costs (step ${stepText(studies.step)})`, costsPart(ctx, studies), { keep: true }),
  ].join('\n');
}
