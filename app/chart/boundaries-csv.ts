/**
 * The boundaries CSV (`loftpoint evaluate --csv`, and Export > Boundaries in
 * the window): the sampled boundaries as a table, one row per sampled wing
 * loading and one column per curve requirement, in the chosen units.
 * Wing-loading limits, the optimum, the design point and the caution go in
 * `#` comment lines above the header. Units in the header use the concept
 * file's ASCII spelling (N/m^2), so any spreadsheet reads them.
 */
// The library's self-contained build: the same writer in Node and in the page (no Node Buffer needed).
import { stringify } from 'csv-stringify/browser/esm/sync';
import { displayUnit, toDisplay, type Evaluation, type UnitSystem } from '../../core';
import type { CurveBoundaryJson, LimitBoundaryJson } from '../../core';
import { columnsOf } from '../../core/diagram/curve-columns';
import { SIZING_CAUTION } from './caution';
import { kindTitle } from './palette';

export interface CsvInput {
  name: string;
  evaluation: Evaluation;
  system: UnitSystem;
}

function ascii(unit: string): string {
  return unit.replace(/²/g, '^2');
}

function comment(text: string): string {
  return `# ${text.replace(/\s*[\r\n]+\s*/g, ' ').replace(/—/g, '-')}`;
}

/** SI numbers exactly as evaluated; converted numbers to 12 significant digits. */
function number(value: number, system: UnitSystem): string {
  return String(system === 'si' ? value : Number(value.toPrecision(12)));
}

export function evaluationCsv({ name, evaluation, system }: CsvInput): string {
  const axis = evaluation.axis;
  const wUnit = ascii(displayUnit('wingLoading', system).unit);
  const yUnit = axis === 'thrustToWeight' ? 'T/W' : ascii(displayUnit('powerToWeight', system).unit);
  const w = (value: number) => number(toDisplay(value, 'wingLoading', system), system);
  const y = (value: number) => number(toDisplay(value, axis, system), system);
  const curves = evaluation.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
  const limits = evaluation.boundaries.filter((b): b is LimitBoundaryJson => 'wingLoadingMax' in b);
  const what = axis === 'thrustToWeight' ? 'thrust-to-weight (sea-level rated thrust of all engines over take-off weight)' : 'power-to-weight (sea-level rated power of all engines over take-off weight)';

  const lines = [
    comment(`${name.trim() || 'Untitled concept'}: constraint boundaries`),
    comment(SIZING_CAUTION),
    comment(`Required ${what} at each sampled wing loading; empty where no ${axis === 'thrustToWeight' ? 'thrust' : 'power'} meets the requirement.`),
    comment(`Units: wing loading ${wUnit}; ${axis === 'thrustToWeight' ? 'thrust-to-weight dimensionless' : `power-to-weight ${yUnit}`}.`),
    ...limits.map((limit) => comment(`Limit ${limit.id} (${kindTitle(limit.kind)}): wing loading at most ${w(limit.wingLoadingMax)} ${wUnit}`)),
  ];
  const optimum = evaluation.optimum;
  const optimumLoading = optimum?.[axis];
  lines.push(
    comment(
      optimum && typeof optimumLoading === 'number'
        ? `Optimum: wing loading ${w(optimum.wingLoading)} ${wUnit}, ${y(optimumLoading)} ${yUnit}; bound by ${optimum.active.join(', ') || 'nothing'}`
        : 'Optimum: nothing on the diagram meets every requirement',
    ),
  );
  const point = evaluation.designPoint;
  const pointLoading = point?.[axis];
  if (point && typeof pointLoading === 'number') {
    lines.push(comment(`Design point: wing loading ${w(point.wingLoading)} ${wUnit}, ${y(pointLoading)} ${yUnit}; ${point.feasible ? 'meets every requirement' : 'misses at least one requirement'}`));
  }

  if (curves.length === 0) lines.push(comment('No requirement gives a curve, so no wing loadings were sampled; only the limits above apply.'));
  const header = [`wing loading [${wUnit}]`, ...curves.map((curve) => `${curve.id} [${yUnit}]`)];
  // The engine's columns when this process evaluated it (one shared grid, NaN in the gaps); else the points.
  const known = columnsOf(evaluation);
  const columns = known && known.curves.length === curves.length ? known : undefined;
  const grid = columns ? Array.from(columns.wingLoadingsPa) : (curves[0]?.points.map(([x]) => x) ?? []);
  const rows = columns
    ? grid.map((x, i) => [w(x), ...columns.curves.map((column) => (column[i] === column[i] ? y(column[i]) : ''))])
    : grid.map((x, i) => [
        w(x),
        ...curves.map((curve) => {
          const own = curve.points[i]?.[0] === x ? curve.points[i] : curve.points.find(([at]) => at === x);
          const value = own ? own[1] : null;
          return value === null || !Number.isFinite(value) ? '' : y(value);
        }),
      ]);
  return `${lines.join('\n')}\n${stringify([header, ...rows])}`;
}
