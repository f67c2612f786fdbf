/**
 * What each requirement costs: the optimum's loading, wing area and installed
 * power (or thrust) at take-off mass with the requirement relaxed by a step,
 * and tightened by it, against the nominal optimum.
 */
// @ts-nocheck

import { loadingAxis, type Design, type LoadingAxis, type Requirement, type RequirementKind } from '../model';
import { requirementKind } from '../requirements';
import { STUDY_CAUTION } from './caution';
import { optimumOf, sizeOf, type StudyOptimum } from './study-optimum';

export interface CostCase {
  /** The stepped value, SI. */
  value: number;
  /** Null when no plotted wing loading meets every requirement. */
  optimum: StudyOptimum | null;
  wingAreaM2: number;
  /** Installed sea-level power [W] or thrust [N], all engines. */
  installed: number;
  loadingChange: number;
  loadingChangeRelative: number;
  wingAreaChangeM2: number;
  wingAreaChangeRelative: number;
  installedChange: number;
}

export interface RequirementCost {
  id: string;
  kind: RequirementKind;
  label?: string;
  /** The resolved field stepped (SI), and its concept-file name. */
  steppedField: string;
  conceptField: string;
  /** Which way relaxes the requirement. */
  relaxedDirection: 'up' | 'down';
  nominalValue: number;
  relaxed: CostCase;
  tightened: CostCase;
  /** Why a stepped value was held, e.g. a load factor kept at 1. */
  notes: string[];
}

export interface RequirementCosts {
  caution: string;
  axis: LoadingAxis;
  step: number;
  nominal: (StudyOptimum & { wingAreaM2: number; installed: number }) | null;
  costs: RequirementCost[];
}

function caseOf(design: Design, id: string, field: string, value: number, nominal: RequirementCosts['nominal']): CostCase {
  const varied: Design = {
    ...design,
    requirements: design.requirements.map((r) => (r.id === id ? ({ ...r, [field]: value } as Requirement) : r)),
  };
  const optimum = optimumOf(varied);
  const size = optimum ? sizeOf(varied, optimum) : { wingAreaM2: NaN, installed: NaN };
  const dy = optimum && nominal ? optimum.loading - nominal.loading : NaN;
  const ds = nominal ? size.wingAreaM2 - nominal.wingAreaM2 : NaN;
  return {
    value,
    optimum,
    ...size,
    loadingChange: dy,
    loadingChangeRelative: nominal && nominal.loading !== 0 ? dy / nominal.loading : NaN,
    wingAreaChangeM2: ds,
    wingAreaChangeRelative: nominal ? ds / nominal.wingAreaM2 : NaN,
    installedChange: nominal ? size.installed - nominal.installed : NaN,
  };
}

/**
 * For every enabled requirement: relaxed = value x (1 + step) where up
 * relaxes, x (1 - step) where down does; tightened the other way. The kind's
 * descriptor names the value and any floor (a turn's load factor stays at 1
 * or more).
 */
export function requirementCosts(design: Design, options: { step?: number } = {}): RequirementCosts {
  const step = options.step ?? 0.1;
  if (!(step > 0 && step < 1)) throw new RangeError(`step is ${step}; give a fraction between 0 and 1, e.g. 0.1 for 10 %`);
  const found = optimumOf(design);
  const nominal = found ? { ...found, ...sizeOf(design, found) } : null;
  const costs = design.requirements
    .filter((r) => r.enabled)
    .map((requirement): RequirementCost => {
      const { field, conceptField, relaxed: direction, least } = requirementKind(requirement.kind).costStep;
      const value = (requirement as unknown as Record<string, number>)[field];
      const notes: string[] = [];
      const [up, down] = [value * (1 + step), value * (1 - step)];
      let [relaxedValue, tightenedValue] = direction === 'up' ? [up, down] : [down, up];
      if (least && relaxedValue < least.value) {
        relaxedValue = least.value;
        notes.push(least.note);
      }
      if (value === 0) notes.push(`The ${conceptField} is 0, so a relative step leaves it unchanged.`);
      return {
        id: requirement.id,
        kind: requirement.kind,
        ...(requirement.label === undefined ? {} : { label: requirement.label }),
        steppedField: field,
        conceptField,
        relaxedDirection: direction,
        nominalValue: value,
        relaxed: caseOf(design, requirement.id, field, relaxedValue, nominal),
        tightened: caseOf(design, requirement.id, field, tightenedValue, nominal),
        notes,
      };
    });
  return { caution: STUDY_CAUTION, axis: loadingAxis(design.aircraft.propulsion.kind), step, nominal, costs };
}
