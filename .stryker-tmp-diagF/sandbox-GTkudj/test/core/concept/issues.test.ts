// @ts-nocheck
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatIssue, parseConcept } from '../../../core/concept';
import { exampleConcept, type Editable } from './fixture';

interface BadCase {
  what: string;
  change: (c: Editable) => void;
  path: string;
  message: RegExp;
}

const KINDS = 'stall, landing-ground-roll, takeoff-ground-roll, cruise, climb-rate, climb-gradient, ceiling, sustained-turn, takeoff-distance, balanced-field-length, landing-distance, approach-speed, maximum-speed';

// Each bad input must give exactly one issue, at the field, saying what to write.
const CASES: BadCase[] = [
  {
    what: 'a bare number for a speed',
    change: (c) => (c.requirements[1].speed = 45),
    path: 'requirements[1].speed',
    message: /^is a bare number \(45\); write it with a unit, e\.g\. "45 kt" \(units: m\/s, km\/h, kt, mph, ft\/s, ft\/min\) \(requirement "cruise"\)$/,
  },
  { what: 'a speed without its unit', change: (c) => (c.requirements[1].speed = '110'), path: 'requirements[1].speed', message: /"110" has no unit.*e\.g\. "45 kt"/ },
  { what: 'a mass in a speed field', change: (c) => (c.requirements[0].speed = '45 kg'), path: 'requirements[0].speed', message: /"kg" is a mass unit, but this field is a speed/ },
  { what: 'a bare number for the mass', change: (c) => (c.aircraft.takeoffMass = 750), path: 'aircraft.takeoffMass', message: /bare number \(750\).*"750 kg"/ },
  { what: 'a missing mass', change: (c) => delete c.aircraft.takeoffMass, path: 'aircraft.takeoffMass', message: /^is required, e\.g\. "750 kg"$/ },
  { what: 'an unknown top-level field', change: (c) => (c.notes = 'x'), path: 'notes', message: /^unknown field/ },
  { what: 'an unknown field in aircraft', change: (c) => (c.aircraft.foo = 1), path: 'aircraft.foo', message: /^unknown field; fields here: takeoffMass, aero, propulsion$/ },
  {
    what: 'a misspelt field',
    change: (c) => (c.aircraft.aero.configurations.clean.oswald = 0.8),
    path: 'aircraft.aero.configurations.clean.oswald',
    message: /^unknown field/,
  },
  {
    what: 'a slip of the keyboard in a field name',
    change: (c) => (c.aircraft.aero.aspectRaito = 7.5),
    path: 'aircraft.aero.aspectRaito',
    message: /^unknown field; did you mean "aspectRatio"\?$/,
  },
  {
    what: 'an absolute cd0 in a flap configuration',
    change: (c) => (c.aircraft.aero.configurations.landing.cd0 = 0.09),
    path: 'aircraft.aero.configurations.landing.cd0',
    message: /cd0Increment/,
  },
  {
    what: 'a field of another requirement kind',
    change: (c) => (c.requirements[1].distance = '300 m'),
    path: 'requirements[1].distance',
    message: /"distance" belongs to landing-ground-roll, takeoff-ground-roll, takeoff-distance, balanced-field-length, landing-distance \(requirement "cruise"\)/,
  },
  {
    what: 'an unknown requirement kind',
    change: (c) => (c.requirements[0].kind = 'stal'),
    path: 'requirements[0].kind',
    message: new RegExp(`^unknown requirement kind "stal"; expected one of ${KINDS} \\(did you mean "stall"\\?\\)`),
  },
  { what: 'a requirement without a kind', change: (c) => delete c.requirements[0].kind, path: 'requirements[0].kind', message: /^is required; one of stall,/ },
  { what: 'an unknown propulsion kind', change: (c) => (c.aircraft.propulsion.kind = 'jet'), path: 'aircraft.propulsion.kind', message: /^unknown propulsion kind "jet"; expected one of piston, turbocharged-piston, turboprop, turbofan, electric/ },
  { what: 'a negative mass', change: (c) => (c.aircraft.takeoffMass = '-750 kg'), path: 'aircraft.takeoffMass', message: /^must be greater than 0 \(got "-750 kg"\)$/ },
  { what: 'a zero mass', change: (c) => (c.aircraft.takeoffMass = '0 lb'), path: 'aircraft.takeoffMass', message: /must be greater than 0/ },
  {
    what: 'e above 1',
    change: (c) => (c.aircraft.aero.configurations.clean.oswaldEfficiency = 1.2),
    path: 'aircraft.aero.configurations.clean.oswaldEfficiency',
    message: /^must be at most 1 \(got 1\.2\)$/,
  },
  { what: 'e of 0', change: (c) => (c.aircraft.aero.configurations.takeoff.oswaldEfficiency = 0), path: 'aircraft.aero.configurations.takeoff.oswaldEfficiency', message: /greater than 0/ },
  { what: 'aspect ratio 0', change: (c) => (c.aircraft.aero.aspectRatio = 0), path: 'aircraft.aero.aspectRatio', message: /^must be greater than 0 \(got 0\)$/ },
  { what: 'clMax 0', change: (c) => (c.aircraft.aero.configurations.clean.clMax = 0), path: 'aircraft.aero.configurations.clean.clMax', message: /greater than 0/ },
  { what: 'cd0 negative', change: (c) => (c.aircraft.aero.configurations.clean.cd0 = -0.01), path: 'aircraft.aero.configurations.clean.cd0', message: /greater than 0/ },
  { what: 'a clean configuration missing', change: (c) => delete c.aircraft.aero.configurations.clean, path: 'aircraft.aero.configurations.clean', message: /^is required/ },
  { what: 'a number written as text', change: (c) => (c.aircraft.aero.aspectRatio = '7.5'), path: 'aircraft.aero.aspectRatio', message: /write 7\.5 without quotes/ },
  { what: 'no requirements', change: (c) => (c.requirements = []), path: 'requirements', message: /^must list at least one requirement$/ },
  { what: 'requirements not a list', change: (c) => (c.requirements = {}), path: 'requirements', message: /must be a list/ },
  { what: 'a duplicate id', change: (c) => (c.requirements[1].id = 'stall'), path: 'requirements[1].id', message: /^duplicate id "stall" \(also requirements\[0\]\.id\)/ },
  { what: 'an empty id', change: (c) => (c.requirements[1].id = ''), path: 'requirements[1].id', message: /must not be empty/ },
  {
    what: 'a configuration that does not exist',
    change: (c) => (c.requirements[1].configuration = 'cruise-flaps'),
    path: 'requirements[1].configuration',
    message: /^no configuration "cruise-flaps" in aircraft\.aero\.configurations \(defined: clean, takeoff, landing\)/,
  },
  {
    what: 'thrust-to-weight on a propeller concept',
    change: (c) => (c.designPoint = { wingLoading: '600 N/m^2', thrustToWeight: 0.3 }),
    path: 'designPoint.thrustToWeight',
    message: /piston concept is drawn as power-to-weight; give designPoint\.powerToWeight/,
  },
  {
    what: 'power-to-weight on a turbofan concept',
    change: (c) => {
      c.aircraft.propulsion = { kind: 'turbofan', engines: 2 };
      for (const r of c.requirements) delete r.propellerEfficiency;
    },
    path: 'designPoint.powerToWeight',
    message: /turbofan concept is drawn as thrust-to-weight; give designPoint\.thrustToWeight/,
  },
  { what: 'a design point without its loading', change: (c) => delete c.designPoint.powerToWeight, path: 'designPoint.powerToWeight', message: /^is required/ },
  { what: 'a missing format', change: (c) => delete c.format, path: 'format', message: /^is missing; this build reads loftpoint-concept\/1/ },
  { what: 'a newer format', change: (c) => (c.format = 'loftpoint-concept/2'), path: 'format', message: /newer than this build.*reads loftpoint-concept\/1/ },
  { what: 'an unknown format', change: (c) => (c.format = 'sizing-sheet/3'), path: 'format', message: /is not a concept format.*reads loftpoint-concept\/1/ },
  { what: 'a turbocharged piston without its critical altitude', change: (c) => (c.aircraft.propulsion.kind = 'turbocharged-piston'), path: 'aircraft.propulsion.criticalAltitude', message: /required for a turbocharged-piston/ },
  { what: 'half an engine', change: (c) => (c.aircraft.propulsion.engines = 1.5), path: 'aircraft.propulsion.engines', message: /whole number \(got 1\.5\)/ },
  { what: 'no engines', change: (c) => (c.aircraft.propulsion.engines = 0), path: 'aircraft.propulsion.engines', message: /at least 1/ },
  { what: 'mass fraction above 1', change: (c) => (c.requirements[1].massFraction = 1.05), path: 'requirements[1].massFraction', message: /at most 1 \(got 1\.05\)/ },
  { what: 'power setting 0', change: (c) => (c.requirements[1].powerSetting = 0), path: 'requirements[1].powerSetting', message: /greater than 0/ },
  { what: 'propeller efficiency above 1', change: (c) => (c.requirements[1].propellerEfficiency = 82), path: 'requirements[1].propellerEfficiency', message: /at most 1 \(got 82\)/ },
  { what: 'samples 1', change: (c) => (c.diagram.samples = 1), path: 'diagram.samples', message: /at least 2/ },
  { what: 'samples 40001', change: (c) => (c.diagram.samples = 40001), path: 'diagram.samples', message: /at most 40000/ },
  { what: 'samples 10.5', change: (c) => (c.diagram.samples = 10.5), path: 'diagram.samples', message: /whole number/ },
  { what: 'a descending range', change: (c) => (c.diagram.wingLoading = ['1500 N/m^2', '200 N/m^2']), path: 'diagram.wingLoading', message: /ascending/ },
  { what: 'a range with one end', change: (c) => (c.diagram.wingLoading = ['200 N/m^2']), path: 'diagram.wingLoading', message: /two values \[low, high\]/ },
  { what: 'a negative range end', change: (c) => (c.diagram.wingLoading = ['-200 N/m^2', '1500 N/m^2']), path: 'diagram.wingLoading[0]', message: /greater than 0/ },
  { what: 'an altitude above the model', change: (c) => (c.requirements[1].altitude = '131000 ft'), path: 'requirements[1].altitude', message: /at most 30000 m \(got "131000 ft" = 39928\.8 m\)/ },
  { what: 'a temperature offset out of range', change: (c) => (c.requirements[1].temperatureOffset = '150 degF'), path: 'requirements[1].temperatureOffset', message: /at most 60 K/ },
  { what: 'a requirement that is not an object', change: (c) => (c.requirements[0] = 'stall'), path: 'requirements[0]', message: /must be an object/ },
  { what: 'enabled as text', change: (c) => (c.requirements[0].enabled = 'yes'), path: 'requirements[0].enabled', message: /true or false/ },
  { what: 'a ceiling without its altitude', change: (c) => c.requirements.push({ id: 'ceiling', kind: 'ceiling' }), path: 'requirements[2].altitude', message: /^is required, e\.g\. "1500 ft"/ },
  { what: 'a turn with neither load factor nor bank', change: (c) => c.requirements.push({ id: 'turn', kind: 'sustained-turn', speed: '90 kt' }), path: 'requirements[2]', message: /needs loadFactor.*or bankAngle/ },
  {
    what: 'a turn with both load factor and bank',
    change: (c) => c.requirements.push({ id: 'turn', kind: 'sustained-turn', speed: '90 kt', loadFactor: 2, bankAngle: '60 deg' }),
    path: 'requirements[2]',
    message: /only one of loadFactor/,
  },
  { what: 'a bank of 90 degrees', change: (c) => c.requirements.push({ id: 'turn', kind: 'sustained-turn', speed: '90 kt', bankAngle: '90 deg' }), path: 'requirements[2].bankAngle', message: /less than 90 deg/ },
  { what: 'a load factor below 1', change: (c) => c.requirements.push({ id: 'turn', kind: 'sustained-turn', speed: '90 kt', loadFactor: 0.5 }), path: 'requirements[2].loadFactor', message: /at least 1/ },
  { what: 'a gradient written 2.4 for 2.4 %', change: (c) => c.requirements.push({ id: 'g', kind: 'climb-gradient', gradient: 2.4 }), path: 'requirements[2].gradient', message: /would mean 240 %; write 0\.024 or "2\.4 %"/ },
  { what: 'a gradient in the wrong unit', change: (c) => c.requirements.push({ id: 'g', kind: 'climb-gradient', gradient: '2.4 deg' }), path: 'requirements[2].gradient', message: /"2\.4 deg": "deg" is an angle unit, but this field is a fraction; use one of %/ },
  {
    what: 'an engine out on a single',
    change: (c) => c.requirements.push({ id: 'g', kind: 'climb-gradient', gradient: '1.5 %', enginesInoperative: 1 }),
    path: 'requirements[2].enginesInoperative',
    message: /below the number of engines \(aircraft\.propulsion\.engines is 1; got 1\)/,
  },
  { what: 'a speed factor below 1', change: (c) => c.requirements.push({ id: 'to', kind: 'takeoff-ground-roll', distance: '300 m', liftoffSpeedFactor: 0.9 }), path: 'requirements[2].liftoffSpeedFactor', message: /at least 1/ },
  { what: 'a negative distance', change: (c) => c.requirements.push({ id: 'ld', kind: 'landing-ground-roll', distance: '-300 m' }), path: 'requirements[2].distance', message: /greater than 0/ },
  { what: 'a name that is not text', change: (c) => (c.name = 5), path: 'name', message: /text/ },
  { what: 'a document that is a list', change: () => undefined, path: '', message: /must be a JSON object/ },
];

describe('parseConcept: bad input', () => {
  it.each(CASES)('$what gives one issue at $path', ({ what, change, path, message }) => {
    const concept = exampleConcept();
    change(concept);
    const parsed = parseConcept(what === 'a document that is a list' ? [concept] : concept);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.issues).toHaveLength(1);
    expect(parsed.issues[0].path).toBe(path);
    expect(parsed.issues[0].message).toMatch(message);
  });

  it('reports every bad field at once, each with its own path', () => {
    const concept = exampleConcept();
    concept.requirements[1].speed = 45;
    concept.aircraft.aero.aspectRatio = 0;
    concept.aircraft.foo = 1;
    const parsed = parseConcept(concept);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.issues.map((i) => i.path).sort()).toEqual(['aircraft.aero.aspectRatio', 'aircraft.foo', 'requirements[1].speed']);
  });

  it('formats an issue as one line, path first', () => {
    expect(formatIssue({ path: 'requirements[1].speed', message: 'is a bare number (45)' })).toBe('requirements[1].speed: is a bare number (45)');
    expect(formatIssue({ path: '', message: 'not valid JSON' })).toBe('not valid JSON');
  });

  it('never shows zod\'s own wording or JSON', () => {
    for (const { what, change } of CASES) {
      const concept = exampleConcept();
      change(concept);
      const parsed = parseConcept(what === 'a document that is a list' ? [concept] : concept);
      if (parsed.ok) continue;
      for (const issue of parsed.issues) {
        expect(issue.message).not.toMatch(/Invalid input|Too small|Too big|Unrecognized key|expected \w+, received|"code"|NaN/);
      }
    }
  });
});

describe('parseConcept: any input', () => {
  it('never throws, and either resolves or names at least one problem', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        const parsed = parseConcept(value);
        if (!parsed.ok) {
          expect(parsed.issues.length).toBeGreaterThan(0);
          for (const issue of parsed.issues) expect(issue.message.length).toBeGreaterThan(0);
        }
      }),
    );
  });

  it('never throws when any field of the example is replaced by any JSON value', () => {
    const paths: Array<Array<string | number>> = [];
    const walk = (value: unknown, path: Array<string | number>) => {
      if (path.length) paths.push(path);
      if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) walk(v, [...path, Array.isArray(value) ? Number(k) : k]);
    };
    walk(exampleConcept(), []);
    fc.assert(
      fc.property(fc.constantFrom(...paths), fc.jsonValue({ maxDepth: 2 }), (path, replacement) => {
        const concept = exampleConcept();
        let target = concept;
        for (const key of path.slice(0, -1)) target = target[key];
        target[path[path.length - 1]] = replacement;
        const parsed = parseConcept(concept);
        if (parsed.ok) {
          // Whatever was accepted resolves to finite numbers only.
          const numbers: number[] = [];
          const collect = (value: unknown): void => {
            if (typeof value === 'number') numbers.push(value);
            else if (value && typeof value === 'object') Object.values(value).forEach(collect);
          };
          collect(parsed.design);
          expect(numbers.every(Number.isFinite)).toBe(true);
        } else {
          expect(parsed.issues.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 400 },
    );
  });
});
