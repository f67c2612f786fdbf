/**
 * A mission segment in one line, as the Mission panel lists it: "800 km at
 * 56.6 m/s, 1829 m"; values typed in another unit read as typed.
 */
import type { UnitSystem } from '../../../../core';
import type { Json } from './edit';
import type { FieldSpec } from './fields';
import { reserveBasis, segmentKind } from './mission';
import { segmentFieldSpecs } from './mission-fields';
import { displayText, fieldUnit, prettyUnit } from './values';

function valueText(raw: Json | undefined, spec: FieldSpec | undefined, system: UnitSystem): string {
  if (raw === undefined || !spec) return '';
  const text = displayText(raw, spec, system);
  if (text === '') return '';
  const unit = fieldUnit(spec, system);
  return unit && !/[a-zA-Z%]/.test(text) ? `${text} ${prettyUnit(unit)}` : text;
}

/** 0.05 -> "5 %"; anything else as written. */
function shareText(raw: Json | undefined): string {
  return typeof raw === 'number' && Number.isFinite(raw) ? `${Number((raw * 100).toPrecision(3))} %` : String(raw ?? '');
}

export function segmentSummary(segment: { [key: string]: Json }, system: UnitSystem, requirementName: (id: string) => string): string {
  const kind = segmentKind(segment);
  if (!kind) return 'a segment this version does not know';
  const basis = reserveBasis(segment);
  const specs = segmentFieldSpecs(kind, { basis });
  const spec = (key: string) => specs.find((entry) => entry.key === key);
  const value = (key: string) => valueText(segment[key], spec(key), system);
  const at = typeof segment.requirement === 'string' ? `at ${requirementName(segment.requirement)}’s speed and altitude` : [value('speed'), value('altitude')].filter(Boolean).join(', ');
  const flown = (first: string) => [first, at ? (at.startsWith('at ') ? at : `at ${at}`) : ''].filter(Boolean).join(' ');
  switch (kind) {
    case 'takeoff-climb':
    case 'climb':
    case 'descent-landing':
      return segment.fraction === undefined ? 'published mass fraction' : `mass fraction ${value('fraction')}`;
    case 'cruise':
      return flown(value('range'));
    case 'loiter':
      return flown(value('endurance'));
    case 'reserve':
      return basis === 'fraction' ? `${shareText(segment.fraction)} of the fuel or energy` : flown(value(basis));
  }
}
