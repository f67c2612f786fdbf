/**
 * The plain-text report of `loftpoint evaluate`: what binds, by how much,
 * the optimum and the design point, the wing area and installed power or
 * thrust they mean, the characteristic speeds, the warnings and the caution.
 */
// @ts-nocheck

import {
  UNIT_SYSTEM_TITLES,
  formatMargin,
  formatQuantity,
  type Design,
  type Evaluation,
  type MarginJson,
  type UnitSystem,
  type WarningJson,
} from '../../core';
import { kindTitle } from '../chart/palette';
import { requirementValues, segmentsText } from '../report/requirement-values';
import { SIZING_CAUTION } from '../chart/caution';
import { wrapText } from '../chart/text';
import { oneLine } from './output-file';

export interface ReportInput {
  source: string;
  design: Design;
  evaluation: Evaluation;
  system: UnitSystem;
}

const WIDTH = 78;

export function evaluationReport(input: ReportInput): string {
  const { design, evaluation, system } = input;
  const name = design.name.trim() || 'Untitled concept';
  const sections = [
    [`${oneLine(name)} — constraint diagram evaluation`, `Source: ${oneLine(input.source)}`, SIZING_CAUTION],
    axisSection(design, evaluation, system),
    requirementSection(design, evaluation, system),
    optimumSection(evaluation, system),
    designPointSection(evaluation, system),
    sizingSection(design, evaluation, system),
    speedSection(evaluation, system),
    warningSection(evaluation.warnings),
    ['CAUTION', `  ${SIZING_CAUTION}`, ...wrap('Every number here follows from the assumptions in the concept (aerodynamics, propulsion, field and day); check them before relying on a result.', '  ')],
  ];
  return `${sections.map((lines) => lines.join('\n')).join('\n\n')}\n`;
}

function wrap(text: string, indent: string): string[] {
  return wrapText(oneLine(text), WIDTH - indent.length).map((line) => `${indent}${line}`);
}

function axisTitle(evaluation: Evaluation): string {
  return evaluation.axis === 'thrustToWeight' ? 'thrust-to-weight' : 'power-to-weight';
}

function loading(value: number | undefined, evaluation: Evaluation, system: UnitSystem): string {
  return formatQuantity(value, evaluation.axis, system);
}

function axisSection(design: Design, evaluation: Evaluation, system: UnitSystem): string[] {
  const { kind, engines } = design.aircraft.propulsion;
  const what =
    evaluation.axis === 'thrustToWeight'
      ? 'sea-level rated thrust of all engines over take-off weight'
      : 'sea-level rated shaft power of all engines over take-off weight';
  return [
    `Diagram    ${axisTitle(evaluation)} against wing loading`,
    `           (${what})`,
    `Aircraft   ${formatQuantity(design.aircraft.takeoffMassKg, 'mass', system)} take-off mass, ${kind}, ${engines} engine${engines === 1 ? '' : 's'}`,
    `Units      ${UNIT_SYSTEM_TITLES[system]}`,
  ];
}

function table(rows: string[][], indent = '  '): string[] {
  const widths = rows[0].map((_, column) => Math.max(...rows.map((row) => [...(row[column] ?? '')].length)));
  return rows.map((row) =>
    `${indent}${row.map((cell, column) => (column === row.length - 1 ? cell : cell.padEnd(widths[column] + 2 + (cell.length - [...cell].length)))).join('')}`.trimEnd(),
  );
}

/** "M0.75"; "—" where the requirement has no flight speed at the optimum. */
function machText(mach: number | undefined): string {
  return mach !== undefined && Number.isFinite(mach) ? `M${mach.toFixed(mach < 0.1 ? 3 : 2)}` : '—';
}

function marginFor(margins: readonly MarginJson[] | undefined, id: string): string {
  const found = margins?.find((margin) => margin.id === id);
  return found ? formatMargin(found.margin) : '—';
}

function requirementSection(design: Design, evaluation: Evaluation, system: UnitSystem): string[] {
  const active = new Set(evaluation.optimum?.active ?? []);
  const hasDesignPoint = evaluation.designPoint !== undefined;
  const header = ['id', 'kind', 'binds', 'margin at optimum', 'speed at optimum (TAS)', 'Mach at optimum', ...(hasDesignPoint ? ['margin at design point'] : [])];
  const rows = evaluation.boundaries.map((boundary) => [
    boundary.id,
    kindTitle(boundary.kind),
    active.has(boundary.id) ? 'yes' : '',
    evaluation.optimum ? marginFor(evaluation.optimum.margins, boundary.id) : '—',
    formatQuantity(boundary.speedAtOptimum, 'speed', system),
    machText(boundary.machAtOptimum),
    ...(hasDesignPoint ? [marginFor(evaluation.designPoint?.margins, boundary.id)] : []),
  ]);
  const lines = table([header, ...rows]);
  // Under each row: the requirement's values in one line (its kind's summary), then its label where it has one.
  const out = [`REQUIREMENTS (${evaluation.boundaries.length} on the diagram)`, lines[0]];
  evaluation.boundaries.forEach((boundary, i) => {
    out.push(lines[i + 1]);
    const requirement = design.requirements.find((r) => r.id === boundary.id);
    if (requirement) out.push(...wrap(requirementValues(requirement, design.aircraft.propulsion.kind, system), '      '));
    if (boundary.segmentsAtOptimum) out.push(...wrap(`At the optimum: ${segmentsText(boundary.segmentsAtOptimum, system)}`, '      '));
    if (boundary.label?.trim()) out.push(...wrap(boundary.label.trim(), '      '));
  });
  const disabled = design.requirements.filter((requirement) => !requirement.enabled).map((requirement) => requirement.id);
  if (disabled.length > 0) out.push(`  Switched off (not on the diagram): ${disabled.join(', ')}`);
  out.push(...wrap('Margins are relative loadings: positive means met with room to spare, negative means missed.', '  '));
  return out;
}

function optimumSection(evaluation: Evaluation, system: UnitSystem): string[] {
  const optimum = evaluation.optimum;
  const title = `OPTIMUM (least ${axisTitle(evaluation)} that meets every requirement)`;
  if (!optimum) return [title, '  Nothing on the diagram meets every requirement.'];
  const out = [
    title,
    ...table([
      ['Wing loading', formatQuantity(optimum.wingLoading, 'wingLoading', system)],
      [capitalise(axisTitle(evaluation)), loading(optimum[evaluation.axis], evaluation, system)],
      ['Bound by', optimum.active.length > 0 ? optimum.active.join(', ') : '—'],
    ]),
  ];
  if (optimum.unbounded) out.push(...wrap('At the right end of the plotted range: nothing caps wing loading there, so widen the range or add a stall or landing requirement.', '  '));
  return out;
}

function designPointSection(evaluation: Evaluation, system: UnitSystem): string[] {
  const point = evaluation.designPoint;
  if (!point) return ['DESIGN POINT', '  None given in the concept; sizing and speeds below are at the optimum.'];
  const missed = point.margins.filter((margin) => Number.isFinite(margin.margin) && margin.margin < 0);
  return [
    'DESIGN POINT (from the concept)',
    ...table([
      ['Wing loading', formatQuantity(point.wingLoading, 'wingLoading', system)],
      [capitalise(axisTitle(evaluation)), loading(point[evaluation.axis] as number | undefined, evaluation, system)],
      ['Meets every requirement', point.feasible ? 'yes' : 'no'],
      ...(missed.length > 0 ? [['Misses', missed.map((margin) => `${margin.id} (${formatMargin(margin.margin)})`).join(', ')]] : []),
    ]),
  ];
}

function sizingSection(design: Design, evaluation: Evaluation, system: UnitSystem): string[] {
  const where = evaluation.designPoint ? 'design point' : 'optimum';
  const mass = formatQuantity(design.aircraft.takeoffMassKg, 'mass', system);
  const title = `SIZING at the ${where}, take-off mass ${mass}`;
  const sizing = evaluation.sizing;
  if (!sizing) return [title, '  No sizing: there is no feasible optimum and no design point.'];
  const engines = design.aircraft.propulsion.engines;
  const thrust = evaluation.axis === 'thrustToWeight';
  const total = thrust ? sizing.thrust : sizing.power;
  const perEngine = sizing.perEngine ?? (total !== undefined && engines > 0 ? total / engines : undefined);
  const quantity = thrust ? 'thrust' : 'power';
  const rows = [
    ['Wing area', formatQuantity(sizing.wingArea, 'area', system)],
    [thrust ? 'Installed thrust' : 'Installed power', `${formatQuantity(total, quantity, system)} sea-level rated, all engines`],
  ];
  if (engines > 1) rows.push(['Per engine', `${formatQuantity(perEngine, quantity, system)} (${engines} engines)`]);
  return [title, ...table(rows)];
}

function speedText(value: number | undefined, system: UnitSystem): string {
  const shown = formatQuantity(value, 'speed', system);
  if (system === 'us' || shown === '—' || value === undefined) return shown;
  return `${shown} (${Math.round(value * 3.6)} km/h)`;
}

function speedSection(evaluation: Evaluation, system: UnitSystem): string[] {
  const speeds = evaluation.speeds;
  const at = evaluation.designPoint?.wingLoading ?? evaluation.optimum?.wingLoading;
  const title = `CHARACTERISTIC SPEEDS at ${formatQuantity(at, 'wingLoading', system)}: sea level ISA, take-off mass, equivalent airspeed`;
  const stall = speeds.stall;
  const unflyable = (v: number) => (Number.isFinite(v) && Number.isFinite(stall) && v < stall ? '  below the clean stall speed: not flyable' : '');
  const rows = [
    ['Stall, clean', speedText(stall, system)],
    ...Object.entries(speeds.stallByConfiguration ?? {})
      .filter(([name]) => name !== 'clean')
      .map(([name, v]) => [`Stall, ${name}`, speedText(v, system)]),
    ['Minimum drag', `${speedText(speeds.minimumDrag, system)}${unflyable(speeds.minimumDrag)}`],
    ['Minimum power', `${speedText(speeds.minimumPower, system)}${unflyable(speeds.minimumPower)}`],
  ];
  if (speeds.approach !== undefined) rows.push(['Approach', speedText(speeds.approach, system)]);
  const basis = speeds.approach !== undefined ? wrap(`Approach speed: ${speeds.approachBasis ?? '1.3 × landing stall speed'}.`, '  ') : [];
  return [...wrap(title, ''), ...table(rows), ...basis];
}

function warningSection(warnings: readonly WarningJson[]): string[] {
  if (warnings.length === 0) return ['WARNINGS', '  None.'];
  return [`WARNINGS (${warnings.length})`, ...warnings.flatMap((warning) => wrap(`${warning.severity === 'error' ? 'ERROR ' : ''}${warning.field ? `${warning.field}: ` : ''}${warning.message}`, '  - ').map((line, i) => (i === 0 ? line : `    ${line.slice(4)}`)))];
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
