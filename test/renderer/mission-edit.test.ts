import { describe, expect, it } from 'vitest';
import { getIn, type ConceptDocument } from '../../app/renderer/lib/concept/edit';
import {
  addMission,
  addSegment,
  energyChoice,
  missionOf,
  moveSegment,
  removeMission,
  removeSegment,
  reserveBasis,
  segmentsOf,
  setFlightCondition,
  setEnergy,
  setReserveBasis,
} from '../../app/renderer/lib/concept/mission';
import { DEMO_CONCEPTS } from '../../core';

/** A demo without its mission, if it has one: the window adds one from nothing. */
function demo(kind: string): ConceptDocument {
  const found = DEMO_CONCEPTS.find((entry) => (entry.concept as { aircraft: { propulsion: { kind: string } } }).aircraft.propulsion.kind === kind);
  if (!found) throw new Error(`no demo with ${kind} propulsion`);
  const document = structuredClone(found.concept) as unknown as ConceptDocument;
  delete document.mission;
  return document;
}

const kinds = (document: ConceptDocument) => segmentsOf(document).map((segment) => segment.kind);

describe('adding a mission', () => {
  it('starts each propulsion kind with its own energy source', () => {
    // Jets burn fuel at a thrust-specific rate, engines driving propellers at a power-specific rate, electric aircraft carry a battery (common practice).
    expect(energyChoice(missionOf(addMission(demo('turbofan'))))).toBe('fuel-tsfc');
    expect(energyChoice(missionOf(addMission(demo('piston'))))).toBe('fuel-bsfc');
    expect(energyChoice(missionOf(addMission(demo('turboprop'))))).toBe('fuel-bsfc');
    expect(energyChoice(missionOf(addMission(demo('electric'))))).toBe('battery');
    const battery = missionOf(addMission(demo('electric')))?.energy as Record<string, unknown>;
    expect(Object.keys(battery).sort()).toEqual(['driveEfficiency', 'kind', 'specificEnergy', 'usableFraction']);
    const propeller = missionOf(addMission(demo('piston')))?.energy as Record<string, unknown>;
    expect(Object.keys(propeller).sort()).toEqual(['bsfc', 'kind', 'propellerEfficiency']);
  });

  it('flies take-off, cruise, descent and a reserve, in that order, and leaves the concept otherwise as it was', () => {
    const before = demo('piston');
    const frozen = JSON.stringify(before);
    const after = addMission(before);
    expect(JSON.stringify(before)).toBe(frozen);
    expect(kinds(after)).toEqual(['takeoff-climb', 'cruise', 'descent-landing', 'reserve']);
    expect(after.aircraft).toBe(before.aircraft);
    expect(after.requirements).toBe(before.requirements);
    // A second add keeps the mission the concept has.
    expect(addMission(after)).toBe(after);
  });

  it('cruises at the concept’s own cruise requirement when it has one, else at a stated condition', () => {
    const jet = addMission(demo('turbofan'));
    const cruise = segmentsOf(jet).find((segment) => segment.kind === 'cruise');
    const requirementIds = (jet.requirements as Array<{ id: string; kind: string }>).filter((r) => r.kind === 'cruise').map((r) => r.id);
    expect(requirementIds.length).toBeGreaterThan(0);
    expect(cruise?.requirement).toBe(requirementIds[0]);
    const withoutCruise = demo('turbofan');
    withoutCruise.requirements = (withoutCruise.requirements as Array<{ kind: string }>).filter((r) => r.kind !== 'cruise');
    const stated = segmentsOf(addMission(withoutCruise)).find((segment) => segment.kind === 'cruise');
    expect(stated?.requirement).toBeUndefined();
    expect(typeof stated?.speed).toBe('string');
    expect(typeof stated?.altitude).toBe('string');
  });

  it('takes about a tenth of the take-off mass as the starting payload, in the take-off mass’s unit', () => {
    const document = demo('piston');
    document.aircraft = { ...(document.aircraft as object), takeoffMass: '750 kg' };
    expect(missionOf(addMission(document))?.payload).toBe('75 kg');
    document.aircraft = { ...(document.aircraft as object), takeoffMass: '12500 lb' };
    expect(missionOf(addMission(document))?.payload).toBe('1300 lb');
    delete (document.aircraft as Record<string, unknown>).takeoffMass;
    expect(missionOf(addMission(document))?.payload).toBe('200 kg');
  });
});

describe('segments', () => {
  it('go where a flight has them: take-off first, cruise and loiter before the descent, a reserve last', () => {
    let document = addMission(demo('piston'));
    document = addSegment(document, 'loiter').document;
    expect(kinds(document)).toEqual(['takeoff-climb', 'cruise', 'loiter', 'descent-landing', 'reserve']);
    const added = addSegment(document, 'climb');
    expect(added.index).toBe(3);
    document = addSegment(added.document, 'reserve').document;
    expect(kinds(document)).toEqual(['takeoff-climb', 'cruise', 'loiter', 'climb', 'descent-landing', 'reserve', 'reserve']);
    document = removeSegment(document, 0);
    expect(addSegment(document, 'takeoff-climb').index).toBe(0);
    expect(addSegment(document, 'descent-landing').index).toBe(4);
  });

  it('move one place and stop at either end; remove by index', () => {
    const document = addMission(demo('piston'));
    expect(kinds(moveSegment(document, 1, 1))).toEqual(['takeoff-climb', 'descent-landing', 'cruise', 'reserve']);
    expect(kinds(moveSegment(document, 1, -1))).toEqual(['cruise', 'takeoff-climb', 'descent-landing', 'reserve']);
    expect(moveSegment(document, 0, -1)).toBe(document);
    expect(moveSegment(document, 3, 1)).toBe(document);
    expect(kinds(removeSegment(document, 2))).toEqual(['takeoff-climb', 'cruise', 'reserve']);
    expect(removeSegment(document, 9)).toBe(document);
  });

  it('keep study ranges on the segment they were set on, and drop those on a removed segment', () => {
    let document = addMission(demo('piston'));
    document.uncertainty = {
      parameters: [
        { field: 'mission.segments[1].range', low: '700 km', high: '900 km' },
        { field: 'mission.segments[3].endurance', low: '20 min', high: '40 min' },
        { field: 'mission.payload', low: '60 kg', high: '90 kg' },
        { field: 'aircraft.aero.aspectRatio', low: 7, high: 9 },
      ],
    };
    const fields = (d: ConceptDocument) => ((d.uncertainty as { parameters: Array<{ field: string }> }).parameters ?? []).map((p) => p.field);
    document = moveSegment(document, 1, 1);
    expect(fields(document)).toEqual(['mission.segments[2].range', 'mission.segments[3].endurance', 'mission.payload', 'aircraft.aero.aspectRatio']);
    document = addSegment(document, 'takeoff-climb').document;
    expect(fields(document)).toEqual(['mission.segments[3].range', 'mission.segments[4].endurance', 'mission.payload', 'aircraft.aero.aspectRatio']);
    document = removeSegment(document, 3);
    expect(fields(document)).toEqual(['mission.segments[3].endurance', 'mission.payload', 'aircraft.aero.aspectRatio']);
    expect(fields(removeMission(document))).toEqual(['aircraft.aero.aspectRatio']);
  });
});

describe('energy, reserves and the cruise condition', () => {
  it('switch the energy source with its own starting values, dropping ranges on the old one', () => {
    let document = addMission(demo('turboprop'));
    document.uncertainty = { parameters: [{ field: 'mission.energy.bsfc', low: '0.28 kg/kWh', high: '0.34 kg/kWh' }] };
    document = setEnergy(document, 'battery');
    expect(getIn(document, ['mission', 'energy', 'kind'])).toBe('battery');
    expect(getIn(document, ['mission', 'energy', 'bsfc'])).toBeUndefined();
    expect((document.uncertainty as { parameters: unknown[] }).parameters).toEqual([]);
    expect(setEnergy(document, 'battery')).toBe(document);
    expect(getIn(setEnergy(document, 'fuel-tsfc'), ['mission', 'energy'])).toEqual({ kind: 'fuel', tsfc: '0.7 1/h' });
  });

  it('give a reserve one basis at a time, keeping its speed and altitude', () => {
    const document = addMission(demo('piston'));
    const reserve = segmentsOf(document).findIndex((segment) => segment.kind === 'reserve');
    const byRange = setReserveBasis(document, reserve, 'range');
    const segment = segmentsOf(byRange)[reserve];
    expect(reserveBasis(segment)).toBe('range');
    expect(segment.endurance).toBeUndefined();
    expect(segment.speed).toBe(segmentsOf(document)[reserve].speed);
    const byFraction = segmentsOf(setReserveBasis(byRange, reserve, 'fraction'))[reserve];
    expect(Object.keys(byFraction).sort()).toEqual(['fraction', 'kind']);
    // A segment that is not a reserve is left alone.
    expect(setReserveBasis(document, 0, 'range')).toBe(document);
  });

  it('fly a cruise at a requirement’s condition or at a stated one, keeping its range', () => {
    const document = addMission(demo('turbofan'));
    const index = segmentsOf(document).findIndex((segment) => segment.kind === 'cruise');
    const stated = segmentsOf(setFlightCondition(document, index, null))[index];
    expect(stated.requirement).toBeUndefined();
    expect(stated.range).toBe(segmentsOf(document)[index].range);
    expect(typeof stated.speed).toBe('string');
    const named = segmentsOf(setFlightCondition(document, index, 'cruise'))[index];
    expect(named).toEqual({ kind: 'cruise', range: stated.range, requirement: 'cruise' });
  });

  it('let a loiter or a flown reserve name a cruise requirement’s condition too, and a reserve kept as a share not', () => {
    let document = addSegment(addMission(demo('turbofan')), 'loiter').document;
    const loiter = segmentsOf(document).findIndex((segment) => segment.kind === 'loiter');
    document = setFlightCondition(document, loiter, 'cruise');
    expect(segmentsOf(document)[loiter]).toEqual({ kind: 'loiter', endurance: '45 min', requirement: 'cruise' });
    const reserve = segmentsOf(document).findIndex((segment) => segment.kind === 'reserve');
    document = setFlightCondition(document, reserve, 'cruise');
    // The basis changes, the named condition stays.
    expect(segmentsOf(setReserveBasis(document, reserve, 'range'))[reserve]).toEqual({ kind: 'reserve', range: '370 km', requirement: 'cruise' });
    const share = setReserveBasis(document, reserve, 'fraction');
    expect(setFlightCondition(share, reserve, 'cruise')).toBe(share);
  });

  it('remove the mission and nothing else', () => {
    const before = demo('piston');
    const after = removeMission(addMission(before));
    expect(after.mission).toBeUndefined();
    expect(JSON.stringify(after)).toBe(JSON.stringify(before));
    expect(removeMission(before)).toBe(before);
  });
});

describe('removing a cruise requirement a segment flies at', () => {
  it('keeps the segment flying at that condition, written out, so the concept still reads', async () => {
    const { removeRequirement } = await import('../../app/renderer/lib/concept/edit');
    const { parseConcept } = await import('../../core');
    const document = addMission(demo('turbofan'));
    const index = segmentsOf(document).findIndex((segment) => segment.kind === 'cruise');
    const id = segmentsOf(document)[index].requirement;
    const requirements = document.requirements as Array<{ id: string; speed?: string; altitude?: string }>;
    const at = requirements.findIndex((requirement) => requirement.id === id);
    expect(parseConcept(document).ok).toBe(true);
    const after = removeRequirement(document, at);
    const segment = segmentsOf(after)[index];
    expect(segment.requirement).toBeUndefined();
    expect(segment.speed).toBe(requirements[at].speed);
    expect(segment.altitude).toBe(requirements[at].altitude ?? '0 m');
    expect(parseConcept(after).ok).toBe(true);
  });
});

describe('every starting mission reads as a concept file', () => {
  it('for each propulsion kind, with each segment kind added and each reserve basis', async () => {
    const { parseConcept } = await import('../../core');
    for (const kind of ['piston', 'turboprop', 'turbofan', 'electric']) {
      let document = addMission(demo(kind));
      for (const segment of ['climb', 'loiter', 'cruise', 'takeoff-climb', 'descent-landing', 'reserve'] as const) document = addSegment(document, segment).document;
      const reserve = segmentsOf(document).findIndex((segment) => segment.kind === 'reserve');
      for (const basis of ['range', 'fraction', 'endurance'] as const) {
        document = setReserveBasis(document, reserve, basis);
        const parsed = parseConcept(document);
        expect(parsed.ok ? [] : parsed.issues, `${kind}, reserve by ${basis}`).toEqual([]);
      }
      const cruise = segmentsOf(document).findIndex((segment) => segment.kind === 'cruise');
      const stated = setFlightCondition(document, cruise, null);
      const parsed = parseConcept(stated);
      expect(parsed.ok ? [] : parsed.issues, `${kind}, cruise at a stated condition`).toEqual([]);
    }
  });
});
