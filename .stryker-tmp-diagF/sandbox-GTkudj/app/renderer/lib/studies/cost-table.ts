/**
 * What each requirement costs, as the window's table: the report's rows
 * (app/chart/costs-rows: the stepped value and the changes of the optimum's
 * loading and wing area) with the change of installed power or thrust beside
 * them, sorted by the size of the effect, largest first. A case where no
 * point meets every requirement reads as a dash and says so.
 */
// @ts-nocheck

import type { CostCase, RequirementCosts } from '../../../../core/studies/costs';
import { displayUnit, formatMargin, toDisplay, type DisplayQuantity, type UnitSystem } from '../../../../core/units/display';
import { signedChange } from '../../../chart/change-text';
import { costRows, type CostCaseText } from '../../../chart/costs-rows';

export interface CostCell {
  /** "+0.52 W/N"; "—" when not defined. */
  change: string;
  /** "+4.9 %"; "—" when not defined; empty when the change rounds to nothing. */
  relative: string;
}

export interface CostTableCase {
  /** The stepped requirement value, e.g. "49.5 kt". */
  value: string;
  feasible: boolean;
  loading: CostCell;
  wingArea: CostCell;
  installed: CostCell;
}

export interface CostTableRow {
  id: string;
  kind: string;
  label: string;
  /** What is stepped and its nominal value: "speed 45.0 kt". */
  stepped: string;
  relaxed: CostTableCase;
  tightened: CostTableCase;
  notes: string[];
  /** The sort key: the largest relative change of any quantity in either case; Infinity when a case has no feasible point. */
  effect: number;
}

const DASH: CostCell = { change: '—', relative: '—' };

function cell(value: number, relative: number, quantity: DisplayQuantity, system: UnitSystem): CostCell {
  const shown = signedChange(toDisplay(value, quantity, system), quantity, system);
  if (shown === '—') return DASH;
  if (shown === '0') return { change: '0', relative: '' };
  const { unit } = displayUnit(quantity, system);
  return { change: unit ? `${shown} ${unit}` : shown, relative: formatMargin(relative) };
}

function caseOf(entry: CostCase, text: CostCaseText, installed: DisplayQuantity, axis: DisplayQuantity, nominalInstalled: number, system: UnitSystem): CostTableCase {
  if (!entry.optimum) return { value: text.value, feasible: false, loading: DASH, wingArea: DASH, installed: DASH };
  return {
    value: text.value,
    feasible: true,
    loading: cell(entry.loadingChange, entry.loadingChangeRelative, axis, system),
    wingArea: cell(entry.wingAreaChangeM2, entry.wingAreaChangeRelative, 'area', system),
    installed: cell(entry.installedChange, nominalInstalled > 0 ? entry.installedChange / nominalInstalled : NaN, installed, system),
  };
}

function effectOf(entry: CostCase, nominalInstalled: number): number {
  if (!entry.optimum) return Infinity;
  const sizes = [entry.loadingChangeRelative, entry.wingAreaChangeRelative, nominalInstalled > 0 ? entry.installedChange / nominalInstalled : NaN];
  return Math.max(0, ...sizes.filter(Number.isFinite).map(Math.abs));
}

export function costTable(costs: RequirementCosts, system: UnitSystem): CostTableRow[] {
  const texts = costRows(costs, system);
  const installed: DisplayQuantity = costs.axis === 'thrustToWeight' ? 'thrust' : 'power';
  const nominalInstalled = costs.nominal?.installed ?? NaN;
  const rows = costs.costs.map((cost, i): CostTableRow => {
    const text = texts[i];
    return {
      id: text.id,
      kind: text.kind,
      label: text.label,
      stepped: text.stepped,
      relaxed: caseOf(cost.relaxed, text.relaxed, installed, costs.axis, nominalInstalled, system),
      tightened: caseOf(cost.tightened, text.tightened, installed, costs.axis, nominalInstalled, system),
      notes: text.notes,
      effect: Math.max(effectOf(cost.relaxed, nominalInstalled), effectOf(cost.tightened, nominalInstalled)),
    };
  });
  // A stable sort keeps the concept's order among requirements that cost the same.
  return rows.sort((a, b) => (a.effect === b.effect ? 0 : b.effect - a.effect));
}

/**
 * The step field: a percentage such as "10", "10 %" or "2.5%". Returns the
 * fraction, or a message naming the field and what is wrong.
 */
export function readStep(text: string): { ok: true; step: number } | { ok: false; message: string } {
  const trimmed = text.trim().replace(/\s*%$/, '');
  if (trimmed === '') return { ok: false, message: 'Step: give a percentage between 0 and 100, e.g. 10' };
  const value = Number(trimmed);
  if (!Number.isFinite(value)) return { ok: false, message: `Step: "${text.trim()}" is not a number; give a percentage such as 10` };
  if (!(value > 0 && value < 100)) return { ok: false, message: `Step: ${value} % is outside the range; give more than 0 and less than 100 %` };
  return { ok: true, step: value / 100 };
}
