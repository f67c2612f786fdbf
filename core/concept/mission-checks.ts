/**
 * Rules of the `mission` block that join fields: speed and altitude or a
 * named cruise requirement, one way of giving a reserve, an energy source
 * that suits the propulsion, something to carry.
 */
import { propulsionKind } from '../propulsion/kinds';
import { parseQuantity } from '../units/quantity';
import type { ConceptIssue } from './format';
import type { MissionJson } from './mission-schema';
import type { ConceptJson } from './schema';

type Flown = { speed?: string; altitude?: string; requirement?: string };

function flightIssues(s: Flown, at: string, concept: ConceptJson): ConceptIssue[] {
  if (s.requirement !== undefined) {
    if (s.speed !== undefined || s.altitude !== undefined) {
      return [{ path: `${at}.requirement`, message: 'give speed and altitude, or a requirement whose condition is flown, not both' }];
    }
    const cruises = concept.requirements.filter((r) => r.kind === 'cruise').map((r) => `"${r.id}"`);
    if (!concept.requirements.some((r) => r.id === s.requirement && r.kind === 'cruise')) {
      return [
        {
          path: `${at}.requirement`,
          message: `no cruise requirement "${s.requirement}" (cruise requirements: ${cruises.length ? cruises.join(', ') : 'none'})`,
        },
      ];
    }
    return [];
  }
  if (s.speed === undefined) return [{ path: `${at}.speed`, message: 'is required, e.g. "110 kt" (or name a cruise requirement in requirement)' }];
  if (s.altitude === undefined) return [{ path: `${at}.altitude`, message: 'is required, e.g. "6000 ft" (or name a cruise requirement in requirement)' }];
  return [];
}

function segmentIssues(m: MissionJson, concept: ConceptJson): ConceptIssue[] {
  return m.segments.flatMap((s, i): ConceptIssue[] => {
    const at = `mission.segments[${i}]`;
    if (s.kind === 'cruise' || s.kind === 'loiter') return flightIssues(s, at, concept);
    if (s.kind !== 'reserve') return [];
    const ways = (['endurance', 'range', 'fraction'] as const).filter((k) => s[k] !== undefined);
    if (ways.length !== 1) {
      return [{ path: at, message: `a reserve gives one of endurance, range or fraction (got ${ways.length ? ways.join(' and ') : 'none'})` }];
    }
    if (ways[0] === 'fraction') {
      const extra = (['speed', 'altitude', 'requirement'] as const).find((k) => s[k] !== undefined);
      return extra ? [{ path: `${at}.${extra}`, message: 'a reserve given as a fraction of the fuel or energy is not flown; leave out speed, altitude and requirement' }] : [];
    }
    return flightIssues(s, at, concept);
  });
}

function energyIssues(energy: MissionJson['energy'], concept: ConceptJson): ConceptIssue[] {
  const kind = concept.aircraft.propulsion.kind;
  const electric = kind === 'electric';
  if (energy.kind === 'battery' && !electric) {
    return [{ path: 'mission.energy.kind', message: `a ${kind} aircraft burns fuel; write kind "fuel" with ${propulsionKind(kind).propeller ? 'bsfc' : 'tsfc'}` }];
  }
  if (energy.kind === 'battery') return [];
  if (electric) return [{ path: 'mission.energy.kind', message: 'an electric aircraft flies on a battery; write kind "battery" with specificEnergy, usableFraction and driveEfficiency' }];
  if (propulsionKind(kind).propeller) {
    if (energy.tsfc !== undefined) return [{ path: 'mission.energy.tsfc', message: `a ${kind} aircraft gives bsfc (e.g. "0.26 kg/kWh") with propellerEfficiency, not tsfc` }];
    if (energy.bsfc === undefined) return [{ path: 'mission.energy.bsfc', message: `is required for a ${kind} aircraft, e.g. "0.26 kg/kWh"` }];
    return [];
  }
  if (energy.bsfc !== undefined) return [{ path: 'mission.energy.bsfc', message: `a ${kind} aircraft gives tsfc (e.g. "0.7 1/h"), not bsfc` }];
  if (energy.tsfc === undefined) return [{ path: 'mission.energy.tsfc', message: `is required for a ${kind} aircraft, e.g. "0.7 1/h"` }];
  return [];
}

function loadIssues(m: MissionJson): ConceptIssue[] {
  const payload = parseQuantity(m.payload, 'mass');
  const crew = m.crew === undefined ? { ok: true as const, value: 0 } : parseQuantity(m.crew, 'mass');
  if (payload.ok && crew.ok && !(payload.value + crew.value > 0)) {
    return [{ path: 'mission.payload', message: 'payload and crew add to 0 kg; a mission carries something, e.g. "400 kg"' }];
  }
  return [];
}

/** Problems of the mission block read together with the rest; empty when there are none. */
export function missionIssues(concept: ConceptJson): ConceptIssue[] {
  const m = concept.mission;
  if (m === undefined) {
    return concept.aircraft.takeoffMass === undefined
      ? [{ path: 'aircraft.takeoffMass', message: 'is required, e.g. "750 kg" (or give a mission, from which the take-off mass is closed)' }]
      : [];
  }
  return [...loadIssues(m), ...energyIssues(m.energy, concept), ...segmentIssues(m, concept)];
}
