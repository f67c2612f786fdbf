/**
 * The results: the constraint diagram, the optimum and the design point,
 * every margin (tightest first), the sizing they mean at take-off mass, and
 * the characteristic speeds.
 */
// @ts-nocheck

import { formatMargin, formatQuantity, sizingAt, type SizingJson } from '../../core';
import { kindTitle } from '../chart/palette';
import { constraintDiagramSvg } from '../chart/svg';
import { loadingOf, marginValue, type ReportContext } from './context';
import { cell, facts, inlineSvg, paragraph, section, table } from './html';

export const DIAGRAM_SIZE = { width: 1040, height: 600 } as const;
/** The study diagram's legend has rows for the bands and contours too. */
export const STUDY_DIAGRAM_SIZE = { width: 1040, height: 700 } as const;

export function diagramSection(ctx: ReportContext): string {
  const svg = constraintDiagramSvg(ctx.evaluation, { title: ctx.design.name, system: ctx.system, ...DIAGRAM_SIZE });
  const body = [inlineSvg(svg, 'diagram', `Constraint diagram of ${ctx.design.name}`), optimumTable(ctx)].join('\n');
  return section('diagram', 'Constraint diagram, optimum and design point', body);
}

function optimumTable(ctx: ReportContext): string {
  const { evaluation } = ctx;
  const optimum = evaluation.optimum;
  const point = evaluation.designPoint;
  const rows = [
    ['Wing loading W/S', ctx.wingLoading(optimum?.wingLoading), ...(point ? [ctx.wingLoading(point.wingLoading)] : [])],
    [`${ctx.axisWords[0].toUpperCase()}${ctx.axisWords.slice(1)} ${ctx.axisSymbol}`, ctx.loading(loadingOf(optimum, evaluation)), ...(point ? [ctx.loading(loadingOf(point, evaluation))] : [])],
    ['Meets every requirement', optimum ? 'yes' : '—', ...(point ? [cell(point.feasible ? 'yes' : 'no', point.feasible ? undefined : 'bad')] : [])],
    ['Bound by', optimum ? optimum.active.join(', ') || '—' : '—', ...(point ? [''] : [])],
  ];
  const notes: string[] = [];
  if (!optimum) notes.push(paragraph('Nothing on the diagram meets every requirement: there is no optimum. Relax a requirement or revisit the assumptions.', 'notice'));
  if (optimum?.unbounded) notes.push(paragraph('The optimum sits at the right end of the plotted range: nothing caps the wing loading there. Widen the range or add a stall or landing requirement.', 'notice'));
  if (!point) notes.push(paragraph('The concept gives no design point; sizing and speeds are at the optimum.', 'small muted'));
  return [table(['', 'Optimum', ...(point ? ['Design point'] : [])], rows, { numeric: point ? [1, 2] : [1], className: 'points' }), ...notes].join('\n');
}

export function marginsSection(ctx: ReportContext): string {
  const { evaluation, design } = ctx;
  const point = evaluation.designPoint;
  const active = new Set(evaluation.optimum?.active ?? []);
  const byPoint = point !== undefined;
  const key = (id: string) => marginValue(byPoint ? point?.margins : evaluation.optimum?.margins, id);
  const enabled = design.requirements.filter((r) => r.enabled);
  const sorted = [...enabled].sort((a, b) => {
    const [ma, mb] = [key(a.id), key(b.id)];
    if (Number.isNaN(ma)) return Number.isNaN(mb) ? 0 : 1;
    return Number.isNaN(mb) ? -1 : ma - mb;
  });
  const rows = sorted.map((r) => {
    const atPoint = marginValue(point?.margins, r.id);
    const notes = [active.has(r.id) ? 'binds at the optimum' : '', atPoint < 0 ? 'missed at the design point' : ''].filter(Boolean).join('; ');
    return [
      cell(r.id, 'id'),
      kindTitle(r.kind),
      ...(byPoint ? [cell(formatMargin(atPoint), atPoint < 0 ? 'bad' : undefined)] : []),
      formatMargin(marginValue(evaluation.optimum?.margins, r.id)),
      notes,
    ];
  });
  const header = ['Id', 'Kind', ...(byPoint ? ['At design point'] : []), 'At optimum', 'Note'];
  const body = [
    table(header, rows, { numeric: byPoint ? [2, 3] : [2] }),
    paragraph(`Tightest first, by the margin at the ${byPoint ? 'design point' : 'optimum'}. A curve’s margin is the loading there over the loading it needs, less one; a limit’s is one less the wing loading over the limit.`, 'small muted'),
  ].join('\n');
  return section('margins', 'Margins', body);
}

function sizingRows(ctx: ReportContext, sizing: SizingJson | null): string[] {
  const thrust = ctx.evaluation.axis === 'thrustToWeight';
  const quantity = thrust ? 'thrust' : 'power';
  const total = sizing ? (thrust ? sizing.thrust : sizing.power) : undefined;
  const engines = ctx.design.aircraft.propulsion.engines;
  return [
    formatQuantity(sizing?.wingArea, 'area', ctx.system),
    formatQuantity(total, quantity, ctx.system),
    formatQuantity(sizing?.perEngine ?? (total !== undefined ? total / engines : undefined), quantity, ctx.system),
  ];
}

export function sizingSection(ctx: ReportContext): string {
  const { evaluation, design, system } = ctx;
  const thrust = evaluation.axis === 'thrustToWeight';
  const optimum = evaluation.optimum;
  const optimumLoading = loadingOf(optimum, evaluation);
  const atOptimum = optimum && optimumLoading !== undefined ? sizingAt(design.aircraft, evaluation.axis, optimum.wingLoading, optimumLoading) : null;
  const point = evaluation.designPoint;
  const atPoint = point ? evaluation.sizing : null;
  const names = ['Wing area S', `Installed ${thrust ? 'thrust' : 'power'} (sea level, all engines)`, `Per engine (${design.aircraft.propulsion.engines})`];
  const optimumValues = sizingRows(ctx, atOptimum);
  const pointValues = point ? sizingRows(ctx, atPoint) : [];
  const rows = names.map((name, i) => [name, ...(point ? [pointValues[i]] : []), optimumValues[i]]);
  const weight = formatQuantity(design.aircraft.takeoffMassKg, 'mass', system);
  const body = [
    table(['', ...(point ? ['Design point'] : []), 'Optimum'], rows, { numeric: point ? [1, 2] : [1] }),
    paragraph(`At take-off mass ${weight}: S = W / (W/S) and ${thrust ? 'T = (T/W) W' : 'P = (P/W) W'} (methods reference, section 7).`, 'small muted'),
  ].join('\n');
  return section('sizing', 'Sizing', body);
}

export function speedsSection(ctx: ReportContext): string {
  const { evaluation, system } = ctx;
  const speeds = evaluation.speeds;
  const speed = (v: number | undefined) => {
    const shown = formatQuantity(v, 'speed', system);
    // km/h beside m/s: 1 m/s = 3.6 km/h exactly.
    return system === 'si' && shown !== '—' && v !== undefined ? `${shown} (${Math.round(v * 3.6)} km/h)` : shown;
  };
  const stall = speeds.stall;
  const flag = (v: number) => (Number.isFinite(v) && Number.isFinite(stall) && v < stall ? ' — below the clean stall speed: not flyable' : '');
  const rows: Array<readonly [string, string]> = [
    ['Stall, clean', speed(stall)],
    ...Object.entries(speeds.stallByConfiguration ?? {})
      .filter(([name]) => name !== 'clean')
      .map(([name, v]) => [`Stall, ${name}`, speed(v)] as const),
    ['Minimum drag', `${speed(speeds.minimumDrag)}${flag(speeds.minimumDrag)}`],
    ['Minimum power', `${speed(speeds.minimumPower)}${flag(speeds.minimumPower)}`],
  ];
  if (speeds.approach !== undefined) rows.push([`Approach, ${speeds.approachBasis ?? '1.3 × landing stall speed (14 CFR 23.73)'}`, speed(speeds.approach)]);
  const at = evaluation.designPoint?.wingLoading ?? evaluation.optimum?.wingLoading;
  const body = [
    facts(rows),
    paragraph(`Equivalent airspeeds at ${ctx.wingLoading(at)}, sea level ISA, take-off mass (the approach speed at the mass it names).`, 'small muted'),
  ].join('\n');
  return section('speeds', 'Characteristic speeds', body);
}
