/**
 * Edits of a concept's `mission` block (loftpoint-concept/1): add one with
 * starting values for the propulsion kind, add, move and remove segments,
 * change the energy source or a reserve's basis, remove the mission. Each
 * returns a new document, as every other edit does (edit.ts), so each step
 * can be undone.
 */
import { getIn, setIn, type ConceptDocument, type Json } from './edit';

type JsonRecord = { [key: string]: Json };

export const SEGMENT_KINDS = ['takeoff-climb', 'climb', 'cruise', 'loiter', 'descent-landing', 'reserve'] as const;
export type SegmentKind = (typeof SEGMENT_KINDS)[number];

export const SEGMENT_TITLES: Record<SegmentKind, string> = {
  'takeoff-climb': 'Take-off and climb',
  climb: 'Climb',
  cruise: 'Cruise',
  loiter: 'Loiter',
  'descent-landing': 'Descent and landing',
  reserve: 'Reserve',
};

/** How the energy is carried: fuel burnt by a jet (TSFC), fuel burnt by an engine driving a propeller (BSFC), or a battery. */
export type EnergyChoice = 'fuel-tsfc' | 'fuel-bsfc' | 'battery';

export const ENERGY_TITLES: Record<EnergyChoice, string> = {
  'fuel-tsfc': 'Fuel, jet (TSFC)',
  'fuel-bsfc': 'Fuel, propeller (BSFC)',
  battery: 'Battery',
};

/** A reserve is flown for a time, over a distance, or kept as a fraction of the mission's fuel or energy. */
export type ReserveBasis = 'endurance' | 'range' | 'fraction';

function isRecord(value: unknown): value is JsonRecord {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function missionOf(document: ConceptDocument): JsonRecord | null {
  return isRecord(document.mission) ? document.mission : null;
}

export function segmentsOf(document: ConceptDocument): JsonRecord[] {
  const list = missionOf(document)?.segments;
  return Array.isArray(list) ? list.filter(isRecord) : [];
}

export function segmentKind(segment: JsonRecord): SegmentKind | null {
  return (SEGMENT_KINDS as readonly string[]).includes(String(segment.kind)) ? (segment.kind as SegmentKind) : null;
}

export function energyChoice(mission: JsonRecord | null): EnergyChoice {
  const energy = mission?.energy;
  if (!isRecord(energy)) return 'fuel-tsfc';
  if (energy.kind === 'battery') return 'battery';
  return energy.bsfc !== undefined || energy.propellerEfficiency !== undefined ? 'fuel-bsfc' : 'fuel-tsfc';
}

export function reserveBasis(segment: JsonRecord): ReserveBasis {
  if (segment.fraction !== undefined) return 'fraction';
  if (segment.range !== undefined) return 'range';
  return 'endurance';
}

/**
 * The energy source a propulsion kind starts with. Typical values, common
 * practice: a turbofan's cruise TSFC about 0.6-0.8 1/h; a piston engine's
 * BSFC about 0.25-0.30 kg/kWh and a turboprop's about 0.28-0.35 kg/kWh, with
 * a cruise propeller efficiency about 0.8; a lithium-ion pack about
 * 150-250 Wh/kg, of which about 80 % is used, through a drive (motor,
 * controller) about 85-90 % efficient.
 */
export function defaultEnergy(choice: EnergyChoice, propulsionKind = ''): JsonRecord {
  if (choice === 'battery') return { kind: 'battery', specificEnergy: '200 Wh/kg', usableFraction: 0.8, driveEfficiency: 0.85 };
  if (choice === 'fuel-tsfc') return { kind: 'fuel', tsfc: '0.7 1/h' };
  return { kind: 'fuel', bsfc: propulsionKind === 'turboprop' ? '0.3 kg/kWh' : '0.26 kg/kWh', propellerEfficiency: 0.8 };
}

export function energyForPropulsion(propulsionKind: string): EnergyChoice {
  if (propulsionKind === 'electric') return 'battery';
  if (propulsionKind === 'turbofan') return 'fuel-tsfc';
  return 'fuel-bsfc';
}

/** The first cruise requirement's id: a new cruise segment flies at its condition. */
function cruiseRequirementId(document: ConceptDocument): string | null {
  const list = Array.isArray(document.requirements) ? document.requirements.filter(isRecord) : [];
  const cruise = list.find((requirement) => requirement.kind === 'cruise' && requirement.enabled !== false && typeof requirement.id === 'string');
  return cruise ? String(cruise.id) : null;
}

/** A stated flight condition when there is no cruise requirement to name: a jet higher and faster than a propeller aircraft. */
function statedCondition(propulsionKind: string): { speed: string; altitude: string } {
  if (propulsionKind === 'turbofan') return { speed: '420 kt', altitude: '35000 ft' };
  if (propulsionKind === 'electric') return { speed: '25 m/s', altitude: '300 m' };
  if (propulsionKind === 'turboprop') return { speed: '240 kt', altitude: '20000 ft' };
  return { speed: '110 kt', altitude: '6000 ft' };
}

/** A slower, lower condition for loiters and reserves. */
function holdingCondition(propulsionKind: string): { speed: string; altitude: string } {
  if (propulsionKind === 'turbofan') return { speed: '220 kt', altitude: '10000 ft' };
  if (propulsionKind === 'electric') return { speed: '18 m/s', altitude: '150 m' };
  if (propulsionKind === 'turboprop') return { speed: '160 kt', altitude: '10000 ft' };
  return { speed: '80 kt', altitude: '3000 ft' };
}

function propulsionOf(document: ConceptDocument): string {
  return String(getIn(document, ['aircraft', 'propulsion', 'kind']) ?? '');
}

/** What a new segment of a kind starts with, in the file's own words. */
export function newSegment(document: ConceptDocument, kind: SegmentKind): JsonRecord {
  const propulsion = propulsionOf(document);
  switch (kind) {
    case 'cruise': {
      const range = propulsion === 'turbofan' ? '2500 km' : propulsion === 'electric' ? '60 km' : propulsion === 'turboprop' ? '1200 km' : '800 km';
      const requirement = cruiseRequirementId(document);
      return requirement ? { kind, range, requirement } : { kind, range, ...statedCondition(propulsion) };
    }
    case 'loiter':
      return { kind, endurance: propulsion === 'electric' ? '20 min' : '45 min', ...holdingCondition(propulsion) };
    case 'reserve':
      return { kind, endurance: propulsion === 'electric' ? '10 min' : '30 min', ...holdingCondition(propulsion) };
    default:
      return { kind };
  }
}

/** Payload as a share of the take-off mass when there is one (about 10 %, rounded), else a round figure. */
function startingPayload(document: ConceptDocument): string {
  const written = getIn(document, ['aircraft', 'takeoffMass']);
  const match = typeof written === 'string' ? /^\s*([0-9.]+)\s*(kg|lb)\s*$/.exec(written) : null;
  const value = match ? Number(match[1]) : Number.NaN;
  if (!Number.isFinite(value) || value <= 0) return '200 kg';
  const tenth = value / 10;
  const step = 10 ** Math.max(0, Math.floor(Math.log10(tenth)) - 1);
  return `${Math.max(step, Math.round(tenth / step) * step)} ${match?.[2]}`;
}

/** A mission for a concept that has none, by its propulsion kind: take-off, cruise, descent, a reserve. */
export function newMission(document: ConceptDocument): JsonRecord {
  const propulsion = propulsionOf(document);
  const mission: JsonRecord = {
    payload: startingPayload(document),
    crew: propulsion === 'electric' ? '0 kg' : '90 kg',
    segments: [newSegment(document, 'takeoff-climb'), newSegment(document, 'cruise'), newSegment(document, 'descent-landing'), newSegment(document, 'reserve')],
    energy: defaultEnergy(energyForPropulsion(propulsion), propulsion),
  };
  return mission;
}

export function addMission(document: ConceptDocument): ConceptDocument {
  if (missionOf(document)) return document;
  return { ...document, mission: newMission(document) };
}

/** Study ranges on mission fields, as the uncertainty block names them. */
const MISSION_FIELD = /^mission(?:\.|\[|$)/;
const SEGMENT_FIELD = /^mission\.segments(?:\[(\d+)\]|\.(\d+))(.*)$/;

function uncertaintyParameters(document: ConceptDocument): JsonRecord[] | null {
  const uncertainty = document.uncertainty;
  return isRecord(uncertainty) && Array.isArray(uncertainty.parameters) ? uncertainty.parameters.filter(isRecord) : null;
}

/** Rewrites (or drops, when `map` returns null) the study ranges on mission fields, so none points at nothing. */
function mapMissionRanges(document: ConceptDocument, map: (field: string) => string | null): ConceptDocument {
  const parameters = uncertaintyParameters(document);
  const uncertainty = document.uncertainty;
  if (!parameters || !isRecord(uncertainty)) return document;
  let changed = false;
  const next: JsonRecord[] = [];
  for (const parameter of parameters) {
    const field = typeof parameter.field === 'string' ? parameter.field : null;
    if (field === null || !MISSION_FIELD.test(field)) {
      next.push(parameter);
      continue;
    }
    const mapped = map(field);
    if (mapped !== field) changed = true;
    if (mapped !== null) next.push(mapped === field ? parameter : { ...parameter, field: mapped });
  }
  return changed ? { ...document, uncertainty: { ...uncertainty, parameters: next } } : document;
}

/** Removes the mission and any study ranges on its fields. */
export function removeMission(document: ConceptDocument): ConceptDocument {
  if (document.mission === undefined) return document;
  const next = setIn(document, ['mission'], undefined);
  return mapMissionRanges(next, () => null);
}

function renumberSegments(document: ConceptDocument, indexMap: (index: number) => number | null): ConceptDocument {
  return mapMissionRanges(document, (field) => {
    const match = SEGMENT_FIELD.exec(field);
    if (!match) return field;
    const index = Number(match[1] ?? match[2]);
    const to = indexMap(index);
    if (to === null) return null;
    return to === index ? field : `mission.segments[${to}]${match[3]}`;
  });
}

function withSegments(document: ConceptDocument, segments: JsonRecord[]): ConceptDocument {
  return setIn(document, ['mission', 'segments'], segments);
}

/**
 * Adds a segment where a flight would have it: take-off first; a descent or a
 * reserve at the end; a climb, cruise or loiter before the first descent or
 * reserve. Returns the new document and the segment's index.
 */
export function addSegment(document: ConceptDocument, kind: SegmentKind): { document: ConceptDocument; index: number } {
  const segments = segmentsOf(document);
  let index = segments.length;
  if (kind === 'takeoff-climb') index = 0;
  else if (kind === 'descent-landing') {
    const reserve = segments.findIndex((segment) => segment.kind === 'reserve');
    index = reserve < 0 ? segments.length : reserve;
  } else if (kind !== 'reserve') {
    const end = segments.findIndex((segment) => segment.kind === 'descent-landing' || segment.kind === 'reserve');
    index = end < 0 ? segments.length : end;
  }
  const next = [...segments.slice(0, index), newSegment(document, kind), ...segments.slice(index)];
  const renumbered = renumberSegments(document, (i) => (i >= index ? i + 1 : i));
  return { document: withSegments(renumbered, next), index };
}

export function removeSegment(document: ConceptDocument, index: number): ConceptDocument {
  const segments = segmentsOf(document);
  if (index < 0 || index >= segments.length) return document;
  const renumbered = renumberSegments(document, (i) => (i === index ? null : i > index ? i - 1 : i));
  return withSegments(
    renumbered,
    segments.filter((_, i) => i !== index),
  );
}

/** Moves a segment one place earlier (-1) or later (+1); a move past either end changes nothing. */
export function moveSegment(document: ConceptDocument, index: number, step: -1 | 1): ConceptDocument {
  const segments = segmentsOf(document);
  const to = index + step;
  if (index < 0 || index >= segments.length || to < 0 || to >= segments.length) return document;
  const next = [...segments];
  [next[index], next[to]] = [next[to], next[index]];
  const renumbered = renumberSegments(document, (i) => (i === index ? to : i === to ? index : i));
  return withSegments(renumbered, next);
}

/** A new energy source with its starting values; the same source again changes nothing. */
export function setEnergy(document: ConceptDocument, choice: EnergyChoice): ConceptDocument {
  const mission = missionOf(document);
  if (!mission || energyChoice(mission) === choice) return document;
  const next = setIn(document, ['mission', 'energy'], defaultEnergy(choice, propulsionOf(document)));
  // Ranges on the old source's fields would point at nothing.
  return mapMissionRanges(next, (field) => (field.startsWith('mission.energy.') ? null : field));
}

/** A reserve's basis: the other bases' values go, the new one starts from a typical value. */
export function setReserveBasis(document: ConceptDocument, index: number, basis: ReserveBasis): ConceptDocument {
  const segment = segmentsOf(document)[index];
  if (!segment || segment.kind !== 'reserve' || reserveBasis(segment) === basis) return document;
  const propulsion = propulsionOf(document);
  const named = typeof segment.requirement === 'string' ? segment.requirement : null;
  const hold = segment.speed !== undefined || segment.altitude !== undefined ? { speed: segment.speed, altitude: segment.altitude } : holdingCondition(propulsion);
  const next: JsonRecord = { kind: 'reserve' };
  if (basis === 'fraction') next.fraction = 0.05;
  else {
    if (basis === 'range') next.range = propulsion === 'turbofan' ? '370 km' : propulsion === 'electric' ? '5 km' : '100 km';
    else next.endurance = propulsion === 'electric' ? '10 min' : '30 min';
    if (named !== null) next.requirement = named;
    else {
      if (hold.speed !== undefined) next.speed = hold.speed;
      if (hold.altitude !== undefined) next.altitude = hold.altitude;
    }
  }
  return setIn(document, ['mission', 'segments', index], next);
}

/** Segments flown at a speed and altitude, which may instead name a cruise requirement's condition. */
export function isFlown(segment: JsonRecord): boolean {
  return segment.kind === 'cruise' || segment.kind === 'loiter' || (segment.kind === 'reserve' && reserveBasis(segment) !== 'fraction');
}

/**
 * A flown segment's condition: a cruise requirement's (by id) or stated
 * speed and altitude (null). Switching to stated starts from the concept's
 * typical condition for the segment (cruise, or a slower, lower hold).
 */
export function setFlightCondition(document: ConceptDocument, index: number, requirement: string | null): ConceptDocument {
  const segment = segmentsOf(document)[index];
  if (!segment || !isFlown(segment)) return document;
  const next: JsonRecord = { ...segment };
  delete next.requirement;
  delete next.speed;
  delete next.altitude;
  if (requirement !== null) next.requirement = requirement;
  else {
    const propulsion = propulsionOf(document);
    const typical = segment.kind === 'cruise' ? statedCondition(propulsion) : holdingCondition(propulsion);
    next.speed = segment.speed ?? typical.speed;
    next.altitude = segment.altitude ?? typical.altitude;
  }
  return setIn(document, ['mission', 'segments', index], next);
}
