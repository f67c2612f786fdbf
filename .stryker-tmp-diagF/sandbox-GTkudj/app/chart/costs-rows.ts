/**
 * What each requirement costs, as rows of display text: core
 * `requirementCosts` (the optimum with each requirement relaxed and
 * tightened by a step) with the stepped value and the changes of the
 * optimum's loading, wing area and installed power or thrust in display
 * units, absolute and relative.
 * Shared by the report's table and the window's.
 */
// @ts-nocheck

import type { LoadingAxis } from '../../core/model';
import type { CostCase, RequirementCost, RequirementCosts } from '../../core/studies/costs';
import { displayUnit, formatMargin, formatQuantity, toDisplay, type DisplayQuantity, type UnitSystem } from '../../core/units/display';
import { kindTitle } from './palette';
import { signedChange } from './change-text';

export interface CostCaseText {
  /** The stepped requirement value, e.g. "49.5 kt". */
  value: string;
  /** "+0.52 W/N (+4.9 %)"; "nothing feasible" when no point meets every requirement. */
  loading: string;
  wingArea: string;
  /** Installed sea-level power (or thrust, for jets) at the optimum, all engines. */
  installed: string;
  feasible: boolean;
}

export interface CostRow {
  id: string;
  kind: string;
  label: string;
  /** What is stepped, in words, and its nominal value: "speed 45.0 kt". */
  stepped: string;
  /** "up" when a larger value relaxes the requirement. */
  relaxedDirection: 'up' | 'down';
  relaxed: CostCaseText;
  tightened: CostCaseText;
  notes: string[];
}

const QUANTITY_OF_FIELD: Readonly<Record<string, DisplayQuantity | 'gradient' | 'loadFactor'>> = {
  speedMps: 'speed',
  distanceM: 'length',
  rateMps: 'climbRate',
  altitudeM: 'altitude',
  gradient: 'gradient',
  loadFactor: 'loadFactor',
};

const WORDS_OF_FIELD: Readonly<Record<string, string>> = {
  speedMps: 'speed',
  distanceM: 'distance',
  rateMps: 'rate',
  altitudeM: 'altitude',
  gradient: 'gradient',
  loadFactor: 'load factor',
};

/** A stepped requirement value in display units. */
export function steppedValueText(field: string, value: number, system: UnitSystem): string {
  const quantity = QUANTITY_OF_FIELD[field];
  if (!Number.isFinite(value)) return '—';
  if (quantity === 'gradient') return `${(value * 100).toFixed(2)} %`;
  if (quantity === 'loadFactor' || quantity === undefined) return `n ${value.toFixed(2)}`;
  return formatQuantity(value, quantity, system);
}

/** "+0.52 W/N (+4.9 %)": a change in display units with its unit, then relative. */
function changeText(value: number, relative: number, quantity: DisplayQuantity, system: UnitSystem): string {
  const absolute = signedChange(toDisplay(value, quantity, system), quantity, system);
  if (absolute === '—') return '—';
  const { unit } = displayUnit(quantity, system);
  return `${unit ? `${absolute} ${unit}` : absolute} (${formatMargin(relative)})`;
}

function caseText(cost: RequirementCost, entry: CostCase, axis: LoadingAxis, nominalInstalled: number, system: UnitSystem): CostCaseText {
  const value = steppedValueText(cost.steppedField, entry.value, system);
  if (!entry.optimum) return { value, loading: 'nothing feasible', wingArea: 'nothing feasible', installed: 'nothing feasible', feasible: false };
  const installedRelative = nominalInstalled > 0 ? entry.installedChange / nominalInstalled : NaN;
  return {
    value,
    loading: changeText(entry.loadingChange, entry.loadingChangeRelative, axis, system),
    wingArea: changeText(entry.wingAreaChangeM2, entry.wingAreaChangeRelative, 'area', system),
    installed: changeText(entry.installedChange, installedRelative, axis === 'thrustToWeight' ? 'thrust' : 'power', system),
    feasible: true,
  };
}

export function costRows(costs: RequirementCosts, system: UnitSystem): CostRow[] {
  const nominalInstalled = costs.nominal?.installed ?? NaN;
  return costs.costs.map((cost) => ({
    id: cost.id,
    kind: kindTitle(cost.kind),
    label: cost.label?.trim() || cost.id,
    stepped: `${WORDS_OF_FIELD[cost.steppedField] ?? cost.conceptField} ${steppedValueText(cost.steppedField, cost.nominalValue, system)}`,
    relaxedDirection: cost.relaxedDirection,
    relaxed: caseText(cost, cost.relaxed, costs.axis, nominalInstalled, system),
    tightened: caseText(cost, cost.tightened, costs.axis, nominalInstalled, system),
    notes: [...cost.notes],
  }));
}
