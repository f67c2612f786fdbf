/**
 * Which fields the concept format allows at each place, as the messages about
 * unknown fields list them. The lists are the format's own, as README.md
 * documents it ("The concept file", "Take-off mass from the mission"):
 * propulsion kind, engines, lapseExponent, lapseModel, throttleRatio,
 * criticalAltitude; a configuration other than clean has cd0Increment,
 * oswaldEfficiency, clMax; a cruise segment flies by range with speed,
 * altitude or a named cruise requirement; a battery has specificEnergy,
 * usableFraction, driveEfficiency. A place that is not an object of the
 * format has no list.
 */
import { describe, expect, it } from 'vitest';
import { fieldsAt } from '../../../core/concept/fields';
import { issuesAfter, type Editable } from './fixture';

const CONFIGURATION = ['cd0Increment', 'oswaldEfficiency', 'clMax'];
const PROPULSION = ['kind', 'engines', 'lapseExponent', 'lapseModel', 'throttleRatio', 'criticalAltitude'];
const CRUISE_SEGMENT = ['kind', 'range', 'speed', 'altitude', 'requirement'];
const LOITER_SEGMENT = ['kind', 'endurance', 'speed', 'altitude', 'requirement'];
const BATTERY = ['kind', 'specificEnergy', 'usableFraction', 'driveEfficiency'];
/** Every requirement's common fields (README.md), then a stall requirement's own speed. */
const STALL = ['kind', 'id', 'label', 'source', 'note', 'enabled', 'altitude', 'temperatureOffset', 'massFraction', 'powerSetting', 'propellerEfficiency', 'configuration', 'speed'];


/** A battery mission whose second segment is a cruise, so the segment kind that picks the list is not the first one. */
function batteryMission(c: Editable): void {
  c.aircraft.propulsion.kind = 'electric';
  c.mission = {
    payload: '100 kg',
    segments: [{ kind: 'climb' }, { kind: 'cruise', range: '100 km', speed: '100 kt', altitude: '1000 ft' }],
    energy: { kind: 'battery', specificEnergy: '200 Wh/kg', usableFraction: 0.8, driveEfficiency: 0.85 },
  };
}

describe('the message for an unknown field lists the fields of that place', () => {
  it.each<[string, (c: Editable) => void, string, string]>([
    ['in the propulsion block', (c) => (c.aircraft.propulsion.zzzzzzz = 1), 'aircraft.propulsion.zzzzzzz', `unknown field; fields here: ${PROPULSION.join(', ')}`],
    [
      'in a cruise segment that follows a climb',
      (c) => {
        batteryMission(c);
        c.mission.segments[1].zzzzzzz = 1;
      },
      'mission.segments[1].zzzzzzz',
      `unknown field; fields here: ${CRUISE_SEGMENT.join(', ')}`,
    ],
    [
      'in a battery, the second kind of energy',
      (c) => {
        batteryMission(c);
        c.mission.energy.zzzzzzz = 1;
      },
      'mission.energy.zzzzzzz',
      `unknown field; fields here: ${BATTERY.join(', ')}`,
    ],
    [
      // The ranged values of the uncertainty block sit three deep, as a mission
      // segment does; they are told apart by where they are, not by depth.
      'in a ranged value of the uncertainty block, beside a mission',
      (c) => {
        batteryMission(c);
        c.uncertainty = { parameters: [{ field: 'aircraft.aero.aspectRatio', low: 7, high: 8, zzzzzzz: 1 }] };
      },
      'uncertainty.parameters[0].zzzzzzz',
      'unknown field',
    ],
  ])('%s', (_what, change, path, message) => {
    expect(issuesAfter(change)).toEqual([{ path, message }]);
  });
});

describe('fieldsAt: the places of the format', () => {
  const document = { requirements: [{ id: 'stall', kind: 'stall' }, { id: 'odd', kind: 'gliding' }], mission: { segments: [{ kind: 'climb' }, { kind: 'loiter' }], energy: { kind: 'battery' } } };

  it('knows a named configuration four deep, and only there', () => {
    expect(fieldsAt(['aircraft', 'aero', 'configurations', 'landing'], document)).toEqual(CONFIGURATION);
    // Four deep but not a configuration: no list.
    expect(fieldsAt(['uncertainty', 'parameters', 0, 'field'], document)).toBeUndefined();
    expect(fieldsAt(['mission', 'segments', 1, 'kind'], document)).toBeUndefined();
    // Under a configuration but deeper: a configuration holds no objects.
    expect(fieldsAt(['aircraft', 'aero', 'configurations', 'landing', 'clMax'], document)).toBeUndefined();
  });

  it('knows a mission segment three deep by its own kind, and only there', () => {
    expect(fieldsAt(['mission', 'segments', 1], document)).toEqual(LOITER_SEGMENT);
    expect(fieldsAt(['mission', 'segments', 0], document)).toEqual(['kind', 'fraction']);
    expect(fieldsAt(['mission', 'segments', 1, 'speed'], document)).toBeUndefined();
    expect(fieldsAt(['uncertainty', 'parameters', 1], document)).toBeUndefined();
  });

  it('knows a requirement two deep by its kind, and not a kind the format lacks', () => {
    expect(fieldsAt(['requirements', 0], document)).toEqual(STALL);
    expect(fieldsAt(['requirements', 1], document)).toBeUndefined();
    // Deeper than a requirement, or not an index into the list.
    expect(fieldsAt(['requirements', 0, 'speed'], document)).toBeUndefined();
    expect(fieldsAt(['requirements', 'stall'], document)).toBeUndefined();
    // Paths carry list positions as numbers; the text "0" names a field, which a list does not have.
    expect(fieldsAt(['requirements', '0'], document)).toBeUndefined();
    // An index into a list other than the requirements.
    expect(fieldsAt(['designPoint', 0], document)).toBeUndefined();
  });

  it('gives no list, and does not fail, where the document lacks the objects on the way', () => {
    for (const lacking of [{}, null, undefined, 5, 'text', { mission: null }, { mission: { energy: null } }, { mission: { segments: 'none' } }, { requirements: null }]) {
      expect(fieldsAt(['mission', 'energy'], lacking)).toBeUndefined();
      expect(fieldsAt(['mission', 'segments', 0], lacking)).toBeUndefined();
      expect(fieldsAt(['requirements', 0], lacking)).toBeUndefined();
    }
  });
});
