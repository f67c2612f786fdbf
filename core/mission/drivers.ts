/**
 * What moves the take-off mass: the growth factor d m_0 / d m_payload and the
 * elasticities (% change of m_0 per % change of an input), both by central
 * differences of the closure, each input stepped by 1 % either way.
 */
import type { Aircraft } from '../aircraft';
import type { MassDriverJson } from '../evaluation';
import { closeMass } from './closure';
import type { Mission, MissionSegment } from './mission';

/** The relative step of each central difference. */
export const DRIVER_STEP = 0.01;

interface Input {
  field: string;
  name: string;
  /** The mission with this input scaled by a factor. */
  scaled: (factor: number) => Mission;
}

function withSegment(mission: Mission, index: number, segment: MissionSegment): Mission {
  return { ...mission, segments: mission.segments.map((s, i) => (i === index ? segment : s)) };
}

function energyInput(mission: Mission): Input {
  const e = mission.energy;
  if (e.kind === 'battery') {
    return { field: 'mission.energy.specificEnergy', name: 'pack specific energy', scaled: (f) => ({ ...mission, energy: { ...e, specificEnergyJPerKg: e.specificEnergyJPerKg * f } }) };
  }
  if (e.engine === 'jet') {
    return { field: 'mission.energy.tsfc', name: 'thrust specific fuel consumption', scaled: (f) => ({ ...mission, energy: { ...e, tsfcPerS: e.tsfcPerS * f } }) };
  }
  return { field: 'mission.energy.bsfc', name: 'brake specific fuel consumption', scaled: (f) => ({ ...mission, energy: { ...e, bsfcKgPerJ: e.bsfcKgPerJ * f } }) };
}

function segmentInputs(mission: Mission): Input[] {
  return mission.segments.flatMap((s, i): Input[] => {
    const at = `mission.segments[${i}]`;
    if ('rangeM' in s) {
      return [{ field: `${at}.range`, name: `${s.kind} range`, scaled: (f) => withSegment(mission, i, { ...s, rangeM: s.rangeM * f }) }];
    }
    if ('enduranceS' in s) {
      return [{ field: `${at}.endurance`, name: `${s.kind} endurance`, scaled: (f) => withSegment(mission, i, { ...s, enduranceS: s.enduranceS * f }) }];
    }
    return [];
  });
}

/** The inputs whose elasticities are reported, in the order a reader looks for them. */
function inputs(mission: Mission): Input[] {
  const list: Input[] = [];
  if (mission.payloadKg > 0) list.push({ field: 'mission.payload', name: 'payload', scaled: (f) => ({ ...mission, payloadKg: mission.payloadKg * f }) });
  list.push(...segmentInputs(mission), energyInput(mission));
  list.push({
    field: 'mission.liftToDrag',
    name: 'lift-to-drag ratio, every segment',
    scaled: (f) => ({ ...mission, liftToDragScale: mission.liftToDragScale * f }),
  });
  const given = mission.emptyMassFraction;
  list.push(
    given !== undefined
      ? { field: 'mission.emptyMassFraction', name: 'empty-mass fraction', scaled: (f) => ({ ...mission, emptyMassFraction: given * f }) }
      : { field: 'mission.technologyFactor', name: 'empty-mass fraction (technology factor)', scaled: (f) => ({ ...mission, technologyFactor: mission.technologyFactor * f }) },
  );
  return list;
}

/** Take-off mass of a mission, NaN where it does not close. */
function closedMass(mission: Mission, aircraft: Aircraft, wingLoadingPa: number): number {
  const closed = closeMass(mission, aircraft, wingLoadingPa);
  return closed.ok ? closed.takeoffKg : NaN;
}

/** d m_0 / d m_payload; NaN where a stepped mission does not close. */
export function growthFactor(mission: Mission, aircraft: Aircraft, wingLoadingPa: number): number {
  const step = DRIVER_STEP * (mission.payloadKg + mission.crewKg);
  const up = closedMass({ ...mission, payloadKg: mission.payloadKg + step }, aircraft, wingLoadingPa);
  const down = closedMass({ ...mission, payloadKg: mission.payloadKg - step }, aircraft, wingLoadingPa);
  return (up - down) / (2 * step);
}

/** Elasticity of the take-off mass [kg] to each input; inputs whose steps do not close are left out. */
export function massDrivers(mission: Mission, aircraft: Aircraft, wingLoadingPa: number, takeoffKg: number): MassDriverJson[] {
  return inputs(mission).flatMap(({ field, name, scaled }) => {
    const up = closedMass(scaled(1 + DRIVER_STEP), aircraft, wingLoadingPa);
    const down = closedMass(scaled(1 - DRIVER_STEP), aircraft, wingLoadingPa);
    const elasticity = (up - down) / (2 * DRIVER_STEP * takeoffKg);
    return Number.isFinite(elasticity) ? [{ field, name, elasticity }] : [];
  });
}
