/**
 * The exact one-line message for real mistakes in a concept's fields: what
 * was written, named in plain words, and what the field takes. The limits
 * quoted are the concept format's own (the schema in core/concept): e in
 * (0, 1] (Oswald's span efficiency cannot exceed an elliptic wing's, common
 * practice), t/c below 0.3, Korn's factor 0.7 to 1, samples 2 to 40000, at
 * least one engine, whole numbers of engines.
 */
import { describe, expect, it } from 'vitest';
import { issuesAfter, type Editable } from './fixture';


const PROPULSION = 'piston, turbocharged-piston, turboprop, turbofan, electric';
const SEGMENTS = 'takeoff-climb, climb, cruise, loiter, descent-landing, reserve';
const REQUIREMENTS =
  'stall, landing-ground-roll, takeoff-ground-roll, cruise, climb-rate, climb-gradient, ceiling, sustained-turn, takeoff-distance, balanced-field-length, landing-distance, approach-speed, maximum-speed';

/** A small fuel mission for a piston concept, changed by each case. */
function withMission(change: (m: Editable) => void) {
  return (c: Editable) => {
    c.mission = { payload: '100 kg', segments: [{ kind: 'climb' }], energy: { kind: 'fuel', bsfc: '0.3 kg/kWh' } };
    change(c.mission);
  };
}

describe('a value of the wrong type, named in plain words', () => {
  it.each<[string, (c: Editable) => void, string, string]>([
    ['null', (c) => (c.aircraft.aero.aspectRatio = null), 'aircraft.aero.aspectRatio', 'must be a plain number (got null)'],
    ['a list', (c) => (c.aircraft.aero.aspectRatio = [7]), 'aircraft.aero.aspectRatio', 'must be a plain number (got a list)'],
    ['an object', (c) => (c.aircraft.aero.aspectRatio = {}), 'aircraft.aero.aspectRatio', 'must be a plain number (got an object)'],
    ['a word', (c) => (c.aircraft.aero.aspectRatio = 'seven'), 'aircraft.aero.aspectRatio', 'must be a plain number (got a string ("seven"))'],
    ['blank text', (c) => (c.aircraft.aero.aspectRatio = '  '), 'aircraft.aero.aspectRatio', 'must be a plain number (got a string ("  "))'],
    ['true', (c) => (c.aircraft.aero.aspectRatio = true), 'aircraft.aero.aspectRatio', 'must be a plain number (got true/false (true))'],
    ['a number in quotes with spaces', (c) => (c.aircraft.aero.aspectRatio = ' 7.5 '), 'aircraft.aero.aspectRatio', 'must be a plain number, not text; write 7.5 without quotes'],
    ['a number for a name', (c) => (c.name = 5), 'name', 'must be text in double quotes (got a number (5))'],
    ['a number for a label', (c) => (c.requirements[0].label = 5), 'requirements[0].label', 'must be text in double quotes (got a number (5)) (requirement "stall")'],
    ['text for the engine count', (c) => (c.aircraft.propulsion.engines = '2'), 'aircraft.propulsion.engines', 'must be a plain number, not text; write 2 without quotes'],
    ['half an engine', (c) => (c.aircraft.propulsion.engines = 1.5), 'aircraft.propulsion.engines', 'must be a whole number (got 1.5)'],
    ['an object for the list of requirements', (c) => (c.requirements = {}), 'requirements', 'must be a list [ ... ] (got an object)'],
    ['a list for the diagram', (c) => (c.diagram = []), 'diagram', 'must be an object { ... } (got a list)'],
    ['a missing aspect ratio', (c) => delete c.aircraft.aero.aspectRatio, 'aircraft.aero.aspectRatio', 'is required (a plain number)'],
    ['a bare number for a wing loading', (c) => (c.designPoint.wingLoading = 600), 'designPoint.wingLoading', 'is a bare number (600); write it with a unit, e.g. "2400 N/m^2" (units: N/m^2, Pa, kg/m^2, lb/ft^2, psf)'],
  ])('%s', (_what, change, path, message) => {
    expect(issuesAfter(change)).toEqual([{ path, message }]);
  });
});

describe('a value out of its range, with the limit and what was written', () => {
  it.each<[string, (c: Editable) => void, string, string]>([
    ['no engines', (c) => (c.aircraft.propulsion.engines = 0), 'aircraft.propulsion.engines', 'must be at least 1 (got 0)'],
    ['one sample', (c) => (c.diagram.samples = 1), 'diagram.samples', 'must be at least 2 (got 1)'],
    ['40001 samples', (c) => (c.diagram.samples = 40001), 'diagram.samples', 'must be at most 40000 (got 40001)'],
    ['t/c of 0.3', (c) => (c.aircraft.aero.thicknessRatio = 0.3), 'aircraft.aero.thicknessRatio', 'must be less than 0.3 (got 0.3)'],
    ["Korn's factor 0.5", (c) => (c.aircraft.aero.kornFactor = 0.5), 'aircraft.aero.kornFactor', 'must be at least 0.7 (got 0.5)'],
    ['e of 1.2', (c) => (c.aircraft.aero.configurations.clean.oswaldEfficiency = 1.2), 'aircraft.aero.configurations.clean.oswaldEfficiency', 'must be at most 1 (got 1.2)'],
    ['aspect ratio 0', (c) => (c.aircraft.aero.aspectRatio = 0), 'aircraft.aero.aspectRatio', 'must be greater than 0 (got 0)'],
    ['three wing-loading ends', (c) => (c.diagram.wingLoading = ['1 N/m^2', '2 N/m^2', '3 N/m^2']), 'diagram.wingLoading', 'must be two values [low, high], e.g. ["200 N/m^2", "1500 N/m^2"]'],
    ['no mission segments', withMission((m) => (m.segments = [])), 'mission.segments', 'must have at least 1 entry'],
    ['an empty id', (c) => (c.requirements[1].id = ''), 'requirements[1].id', 'must not be empty'],
  ])('%s', (_what, change, path, message) => {
    expect(issuesAfter(change)).toEqual([{ path, message }]);
  });
});

describe('a choice from a list', () => {
  it.each<[string, (c: Editable) => void, string, string]>([
    ['an unknown aircraft class', (c) => (c.aircraft.class = 'glider'), 'aircraft.class', 'must be one of light-aircraft, business-jet, transport, small-uav, sailplane (got "glider")'],
    ['an unknown lapse model', (c) => (c.aircraft.propulsion.lapseModel = 'x'), 'aircraft.propulsion.lapseModel', 'must be one of high-bypass, low-bypass-mixed, turbojet, density (got "x")'],
    ['no propulsion kind', (c) => delete c.aircraft.propulsion.kind, 'aircraft.propulsion.kind', `is missing; give the propulsion kind, one of ${PROPULSION}`],
    ['a slip in the propulsion kind', (c) => (c.aircraft.propulsion.kind = 'turbofun'), 'aircraft.propulsion.kind', `unknown propulsion kind "turbofun"; expected one of ${PROPULSION} (did you mean "turbofan"?)`],
    ['a number for the propulsion kind', (c) => (c.aircraft.propulsion.kind = 5), 'aircraft.propulsion.kind', `unknown propulsion kind 5; expected one of ${PROPULSION}`],
    ['a far-off propulsion kind', (c) => (c.aircraft.propulsion.kind = 'rocket motor'), 'aircraft.propulsion.kind', `unknown propulsion kind "rocket motor"; expected one of ${PROPULSION}`],
    ['a number for the requirement kind', (c) => (c.requirements[0].kind = 5), 'requirements[0].kind', `unknown requirement kind 5; expected one of ${REQUIREMENTS} (requirement "stall")`],
    ['a far-off requirement kind', (c) => (c.requirements[0].kind = 'zzzzzz'), 'requirements[0].kind', `unknown requirement kind "zzzzzz"; expected one of ${REQUIREMENTS} (requirement "stall")`],
    [
      'a slip in a segment kind',
      withMission((m) => (m.segments = [{ kind: 'cruse', range: '100 km', speed: '100 kt', altitude: '1000 ft' }])),
      'mission.segments[0].kind',
      `unknown mission segment kind "cruse"; expected one of ${SEGMENTS} (did you mean "cruise"?)`,
    ],
    ['a segment without a kind', withMission((m) => (m.segments = [{ range: '100 km' }])), 'mission.segments[0].kind', `is required; one of ${SEGMENTS}`],
    ['a slip in the energy kind', withMission((m) => (m.energy = { kind: 'batery' })), 'mission.energy.kind', 'unknown energy kind "batery"; expected one of fuel, battery (did you mean "battery"?)'],
  ])('%s', (_what, change, path, message) => {
    expect(issuesAfter(change)).toEqual([{ path, message }]);
  });
});

describe('an unknown field', () => {
  it.each<[string, (c: Editable) => void, string, string]>([
    ['a slip in a segment field', withMission((m) => (m.segments = [{ kind: 'climb', fractoin: 0.9 }])), 'mission.segments[0].fractoin', 'unknown field; did you mean "fraction"?'],
    ['a slip in an energy field', withMission((m) => (m.energy = { kind: 'fuel', bsfcc: '0.3 kg/kWh' })), 'mission.energy.bsfcc', 'unknown field; did you mean "bsfc"?'],
    ['a slip in a mission field', withMission((m) => (m.payloda = 1)), 'mission.payloda', 'unknown field; did you mean "payload"?'],
    ['a slip at the top', (c) => (c.requirement = []), 'requirement', 'unknown field; did you mean "requirements"?'],
    ['a slip in clean', (c) => (c.aircraft.aero.configurations.clean.cd0x = 1), 'aircraft.aero.configurations.clean.cd0x', 'unknown field; did you mean "cd0"?'],
    [
      'a far-off field in a requirement',
      (c) => (c.requirements[0].zzzzzzzz = 1),
      'requirements[0].zzzzzzzz',
      'unknown field; fields here: kind, id, label, source, note, enabled, altitude, temperatureOffset, massFraction, powerSetting, propellerEfficiency, configuration, speed (requirement "stall")',
    ],
    ['a far-off field in a flap configuration', (c) => (c.aircraft.aero.configurations.landing.zzzzzz = 1), 'aircraft.aero.configurations.landing.zzzzzz', 'unknown field; fields here: cd0Increment, oswaldEfficiency, clMax'],
    [
      'a far-off field in a configuration whose name has a space',
      (c) => (c.aircraft.aero.configurations['flap 10'] = { zzzzzz: 1 }),
      'aircraft.aero.configurations["flap 10"].zzzzzz',
      'unknown field; fields here: cd0Increment, oswaldEfficiency, clMax',
    ],
    ['an absolute cd0 in a flap configuration', (c) => (c.aircraft.aero.configurations.landing.cd0 = 0.05), 'aircraft.aero.configurations.landing.cd0', "unknown field; a configuration other than clean gives cd0Increment, which is added to clean's cd0"],
    ['a far-off field in the design point', (c) => (c.designPoint.zzzzzzz = 1), 'designPoint.zzzzzzz', 'unknown field; fields here: wingLoading, powerToWeight, thrustToWeight'],
    ['a far-off field in the diagram', (c) => (c.diagram.zzzzzzz = 1), 'diagram.zzzzzzz', 'unknown field; fields here: wingLoading, samples'],
  ])('%s', (_what, change, path, message) => {
    expect(issuesAfter(change)).toEqual([{ path, message }]);
  });

  it('comes just before the missing field it was probably meant to be, and a far-off one keeps its place', () => {
    expect(
      issuesAfter((c) => {
        delete c.aircraft.aero.aspectRatio;
        c.aircraft.aero.aspectRatoi = 7.5;
        c.aircraft.aero.zzzzzzzzzz = 1;
      }),
    ).toEqual([
      { path: 'aircraft.aero.aspectRatoi', message: 'unknown field; did you mean "aspectRatio"?' },
      { path: 'aircraft.aero.aspectRatio', message: 'is required (a plain number)' },
      { path: 'aircraft.aero.zzzzzzzzzz', message: 'unknown field; fields here: aspectRatio, cdLinear, thicknessRatio, quarterChordSweep, kornFactor, configurations' },
    ]);
  });

  it('puts two slips for the same missing field both before it, in the order written', () => {
    expect(
      issuesAfter((c) => {
        delete c.aircraft.aero.aspectRatio;
        c.aircraft.aero.aspectRatoi = 7.5;
        c.aircraft.aero.aspectRatii = 7.5;
      }),
    ).toEqual([
      { path: 'aircraft.aero.aspectRatoi', message: 'unknown field; did you mean "aspectRatio"?' },
      { path: 'aircraft.aero.aspectRatii', message: 'unknown field; did you mean "aspectRatio"?' },
      { path: 'aircraft.aero.aspectRatio', message: 'is required (a plain number)' },
    ]);
  });
});

describe('messages that depend on where the field stands', () => {
  it.each<[string, (c: Editable) => void, Array<{ path: string; message: string }>]>([
    [
      'cd0 under aero, not in a configuration',
      (c) => (c.aircraft.aero.cd0 = 0.03),
      [{ path: 'aircraft.aero.cd0', message: 'unknown field; fields here: aspectRatio, cdLinear, thicknessRatio, quarterChordSweep, kornFactor, configurations' }],
    ],
    [
      'a requirement field under aero',
      (c) => (c.aircraft.aero.distance = '300 m'),
      [{ path: 'aircraft.aero.distance', message: 'unknown field; fields here: aspectRatio, cdLinear, thicknessRatio, quarterChordSweep, kornFactor, configurations' }],
    ],
    ['a number in quotes where an object belongs', (c) => (c.diagram = '5'), [{ path: 'diagram', message: 'must be an object { ... } (got a string ("5"))' }]],
    ['an unknown field in the uncertainty block', (c) => (c.uncertainty = { zzzzz: 1 }), [{ path: 'uncertainty.zzzzz', message: 'unknown field' }]],
    ['half an engine below the least count: one issue, the first', (c) => (c.aircraft.propulsion.engines = 0.5), [{ path: 'aircraft.propulsion.engines', message: 'must be a whole number (got 0.5)' }]],
    [
      'a requirement whose id is a number names no requirement in its other messages',
      (c) => Object.assign(c.requirements[0], { id: 5, label: 5 }),
      [
        { path: 'requirements[0].id', message: 'must be text in double quotes (got a number (5))' },
        { path: 'requirements[0].label', message: 'must be text in double quotes (got a number (5))' },
      ],
    ],
    [
      'a requirement whose id is empty names no requirement in its other messages',
      (c) => Object.assign(c.requirements[0], { id: '', label: 5 }),
      [
        { path: 'requirements[0].id', message: 'must not be empty' },
        { path: 'requirements[0].label', message: 'must be text in double quotes (got a number (5))' },
      ],
    ],
    [
      'an object for the propulsion kind is shown as written',
      (c) => (c.aircraft.propulsion.kind = { name: 'piston' }),
      [{ path: 'aircraft.propulsion.kind', message: `unknown propulsion kind {"name":"piston"}; expected one of ${PROPULSION}` }],
    ],
    [
      'a list for a requirement kind is shown as written',
      (c) => (c.requirements[0].kind = ['stall']),
      [{ path: 'requirements[0].kind', message: `unknown requirement kind ["stall"]; expected one of ${REQUIREMENTS} (requirement "stall")` }],
    ],
    [
      'an object for an aircraft class is shown as written',
      (c) => (c.aircraft.class = {}),
      [{ path: 'aircraft.class', message: 'must be one of light-aircraft, business-jet, transport, small-uav, sailplane (got {})' }],
    ],
  ])('%s', (_what, change, expected) => {
    expect(issuesAfter(change)).toEqual(expected);
  });
});
