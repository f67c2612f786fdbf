/**
 * What reading a concept resolves and notes: the exact warning for each field
 * a kind of aircraft does not use, the defaults of compressibility and the
 * turbine lapse, a Mach number turned into true airspeed, and the mission in
 * SI. References, by value:
 * - ISA (ICAO Doc 7488/3, 1993): T = 288.15 K - 6.5 K/km x h, R = 287.05287 J/(kg K),
 *   gamma = 1.4, so a = sqrt(gamma R T); 30000 ft = 9144 m exactly (1 ft = 0.3048 m, 1959).
 * - 1 kt = 1852/3600 m/s (international nautical mile, 1929); 1 Wh = 3600 J; 1 h = 3600 s.
 * - Korn's technology factor about 0.87 for conventional sections (from memory).
 * - Historical segment fractions: climb 0.985, descent and landing 0.995, warm-up and
 *   take-off 0.970 (Raymer, Aircraft Design: A Conceptual Approach, section 3.4; from memory).
 * - Payload and crew about a third of take-off mass for a first guess (common practice).
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { conceptWith, exampleConcept, type Editable } from './fixture';

function read(concept: Editable) {
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed;
}

const KT = 1852 / 3600;
const cruise = (speed: string, altitude = '0 ft') => [{ id: 'c', kind: 'cruise', speed, altitude }];

describe('fields a kind of aircraft does not use', () => {
  it.each<[string, Editable, string, string]>([
    [
      'a critical altitude on a turbofan',
      conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan', criticalAltitude: '10000 ft' } }),
      'aircraft.propulsion.criticalAltitude',
      'ignored: criticalAltitude applies to a turbocharged-piston engine, not turbofan',
    ],
    [
      'a lapse exponent on a piston',
      conceptWith(cruise('100 kt'), { propulsion: { kind: 'piston', lapseExponent: 0.9 } }),
      'aircraft.propulsion.lapseExponent',
      'ignored: lapseExponent applies to turboprop and turbofan; a piston engine uses its own lapse model (Loftpoint methods reference, section 5)',
    ],
    [
      'a lapse exponent beside a Mach-aware lapse model',
      conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan', lapseExponent: 0.9, lapseModel: 'high-bypass' } }),
      'aircraft.propulsion.lapseExponent',
      'ignored: the high-bypass lapse model reads flight Mach and the air, not an exponent; write lapseModel "density" to use it',
    ],
    [
      'a throttle ratio with the density model',
      conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan', throttleRatio: 1.05, lapseModel: 'density' } }),
      'aircraft.propulsion.throttleRatio',
      'ignored: the throttle ratio belongs to a Mach-aware turbine lapse model, not the density model',
    ],
  ])('%s', (_what, concept, field, message) => {
    expect(read(concept).warnings).toEqual([{ code: 'field-ignored', field, message }]);
  });

  it('a propeller efficiency on a jet, named with its requirement', () => {
    const parsed = read(conceptWith([{ id: 'fast', kind: 'cruise', speed: '400 kt', propellerEfficiency: 0.8 }], { propulsion: { kind: 'turbofan' } }));
    expect(parsed.warnings).toEqual([
      { code: 'field-ignored', field: 'requirements[0].propellerEfficiency', message: 'ignored: a turbofan has no propeller (requirement "fast")' },
    ]);
  });

  it('a stall flown in landing by default where the concept has no landing configuration', () => {
    const parsed = read(conceptWith([{ id: 's', kind: 'stall', speed: '50 kt' }]));
    expect(parsed.warnings).toEqual([
      {
        code: 'configuration-fallback',
        field: 'requirements[0].configuration',
        message:
          'requirement "s" (stall) flies in the landing configuration by default, but the concept defines none; using clean. Define aircraft.aero.configurations.landing, or set configuration: "clean" to say so.',
      },
    ]);
    expect(parsed.design.requirements[0].configuration).toBe('clean');
  });

  it('nothing to note for a concept that uses every field it gives', () => {
    expect(read(exampleConcept()).warnings).toEqual([]);
    expect(read(conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan', lapseModel: 'low-bypass-mixed', throttleRatio: 1.05 } })).warnings).toEqual([]);
    expect(read(conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan', lapseExponent: 0.8 } })).warnings).toEqual([]);
  });
});

describe('the propulsion and aerodynamics as resolved', () => {
  it('a turbofan with nothing said takes the first Mach-aware lapse model with a throttle ratio of 1', () => {
    expect(read(conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan' } })).design.aircraft.propulsion).toEqual({
      kind: 'turbofan',
      engines: 1,
      lapseExponent: 1,
      lapseModel: 'high-bypass',
      throttleRatio: 1,
    });
  });

  it('a stated lapse exponent keeps the density model it was written for, with no lapse model in the design', () => {
    expect(read(conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan', engines: 2, lapseExponent: 0.8 } })).design.aircraft.propulsion).toEqual({
      kind: 'turbofan',
      engines: 2,
      lapseExponent: 0.8,
    });
  });

  it('a stated throttle ratio is kept with a Mach-aware model', () => {
    const propulsion = read(conceptWith(cruise('400 kt'), { propulsion: { kind: 'turbofan', lapseModel: 'turbojet', throttleRatio: 1.07 } })).design.aircraft.propulsion;
    expect(propulsion).toMatchObject({ lapseModel: 'turbojet', throttleRatio: 1.07 });
  });

  it('a thickness ratio alone brings compressibility with no sweep and Korn factor 0.87; the others are read as written', () => {
    const aero = (extra: Editable) => ({ aspectRatio: 8, configurations: { clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 } }, ...extra });
    expect(read(conceptWith(cruise('100 kt'), { aero: aero({ thicknessRatio: 0.12 }) })).design.aircraft.compressibility).toEqual({
      thicknessRatio: 0.12,
      quarterChordSweepRad: 0,
      kornFactor: 0.87,
    });
    const swept = read(conceptWith(cruise('100 kt'), { aero: aero({ thicknessRatio: 0.1, quarterChordSweep: '30 deg', kornFactor: 0.95 }) })).design.aircraft.compressibility;
    expect(swept?.thicknessRatio).toBe(0.1);
    expect(swept?.quarterChordSweepRad).toBeCloseTo(Math.PI / 6, 12);
    expect(swept?.kornFactor).toBe(0.95);
    expect(read(conceptWith(cruise('100 kt'), { aero: aero({}) })).design.aircraft).not.toHaveProperty('compressibility');
  });

  it('an empty or blank name reads as the default name; a name is trimmed', () => {
    const named = (name: string) => read({ ...exampleConcept(), name }).design.name;
    expect(named('')).toBe('Untitled concept');
    expect(named('   ')).toBe('Untitled concept');
    expect(named('  Trainer B ')).toBe('Trainer B');
  });
});

describe('a Mach number is true airspeed at the requirement\'s own altitude and temperature', () => {
  it('M0.6 at 30000 ft in ISA', () => {
    const a = Math.sqrt(1.4 * 287.05287 * (288.15 - 6.5 * 9.144));
    const r = read(conceptWith(cruise('M0.6', '30000 ft'), { propulsion: { kind: 'turbofan' } })).design.requirements[0] as { speedMps: number; altitudeM: number };
    expect(r.altitudeM).toBeCloseTo(9144, 9);
    expect(r.speedMps).toBeCloseTo(0.6 * a, 2);
  });

  it('M0.5 at sea level on an ISA+20 K day', () => {
    const a = Math.sqrt(1.4 * 287.05287 * (288.15 + 20));
    const r = read(conceptWith([{ id: 'c', kind: 'cruise', speed: 'M0.5', temperatureOffset: '20 K' }], { propulsion: { kind: 'turbofan' } })).design.requirements[0] as { speedMps: number };
    expect(r.speedMps).toBeCloseTo(0.5 * a, 2);
  });
});

describe('the mission in SI', () => {
  const electric = () => {
    const c = exampleConcept();
    c.aircraft.propulsion = { kind: 'electric' };
    for (const r of c.requirements) delete r.propellerEfficiency;
    return c;
  };

  it('a battery mission: the climb fraction is ignored with a warning, 200 Wh/kg is 720 kJ/kg, the cruise flies the named requirement', () => {
    const c = electric();
    c.mission = {
      payload: '100 kg',
      crew: '80 kg',
      segments: [{ kind: 'climb', fraction: 0.98 }, { kind: 'cruise', range: '100 km', requirement: 'cruise' }, { kind: 'reserve', fraction: 0.1 }],
      energy: { kind: 'battery', specificEnergy: '200 Wh/kg', usableFraction: 0.8, driveEfficiency: 0.85 },
    };
    const parsed = read(c);
    expect(parsed.warnings).toEqual([
      {
        code: 'field-ignored',
        field: 'mission.segments[0].fraction',
        message: 'ignored: a battery aircraft burns no fuel; its climb takes the energy to gain height, its descent none',
      },
    ]);
    const m = parsed.design.mission!;
    expect(m.payloadKg).toBe(100);
    expect(m.crewKg).toBe(80);
    expect(m.energy).toEqual({ kind: 'battery', specificEnergyJPerKg: 200 * 3600, usableFraction: 0.8, driveEfficiency: 0.85 });
    expect(m.segments[0]).toEqual({ kind: 'climb', fraction: 0.98 });
    // The example's cruise: 110 kt at 6000 ft = 1828.8 m, ISA.
    expect(m.segments[1]).toMatchObject({ kind: 'cruise', rangeM: 100000, temperatureOffsetK: 0 });
    expect((m.segments[1] as { speedMps: number }).speedMps).toBeCloseTo(110 * KT, 10);
    expect((m.segments[1] as { altitudeM: number }).altitudeM).toBeCloseTo(1828.8, 9);
    expect(m.segments[2]).toEqual({ kind: 'reserve', by: 'fraction', fraction: 0.1 });
    expect(m).toMatchObject({ aircraftClass: 'single-engine-general-aviation', technologyFactor: 1, liftToDragScale: 1, startingMassKg: 750, takeoffMassGiven: true });
    expect(m).not.toHaveProperty('emptyMassFraction');
  });

  it('a piston fuel mission: default fractions, propeller efficiency 0.8, its own speeds, a guessed mass of three times the useful load', () => {
    const c = exampleConcept();
    delete c.aircraft.takeoffMass;
    c.aircraft.propulsion.engines = 2;
    c.mission = {
      payload: '300 kg',
      crew: '100 kg',
      segments: [
        { kind: 'takeoff-climb' },
        { kind: 'climb' },
        { kind: 'cruise', range: '500 km', speed: '120 kt', altitude: '8000 ft' },
        { kind: 'loiter', endurance: '30 min', speed: '90 kt', altitude: '2000 ft' },
        { kind: 'descent-landing' },
        { kind: 'reserve', range: '100 km', speed: '100 kt', altitude: '3000 ft' },
      ],
      energy: { kind: 'fuel', bsfc: '0.3 kg/kWh' },
      technologyFactor: 0.9,
    };
    const parsed = read(c);
    expect(parsed.warnings).toEqual([]);
    const m = parsed.design.mission!;
    expect(m.crewKg).toBe(100);
    expect(m.startingMassKg).toBe(3 * 400);
    expect(m.takeoffMassGiven).toBe(false);
    expect(parsed.design.aircraft.takeoffMassKg).toBe(1200);
    expect(m.aircraftClass).toBe('twin-engine-general-aviation');
    expect(m.technologyFactor).toBe(0.9);
    expect(m.segments[0]).toEqual({ kind: 'takeoff-climb', fraction: expect.closeTo(0.97 * 0.985, 12) });
    expect(m.segments[1]).toEqual({ kind: 'climb', fraction: 0.985 });
    expect(m.segments[4]).toEqual({ kind: 'descent-landing', fraction: 0.995 });
    const seg = m.segments as Array<Record<string, number | string>>;
    expect(seg[2].rangeM).toBe(500000);
    expect(seg[2].speedMps).toBeCloseTo(120 * KT, 10);
    expect(seg[2].altitudeM).toBeCloseTo(8000 * 0.3048, 9);
    expect(seg[3].enduranceS).toBe(1800);
    expect(seg[3].speedMps).toBeCloseTo(90 * KT, 10);
    expect(seg[5]).toMatchObject({ kind: 'reserve', by: 'range', rangeM: 100000, temperatureOffsetK: 0 });
    expect(seg[5].altitudeM).toBeCloseTo(3000 * 0.3048, 9);
    // 0.3 kg/kWh = 0.3 / 3.6e6 kg/J.
    expect(m.energy).toEqual({ kind: 'fuel', engine: 'propeller', bsfcKgPerJ: expect.closeTo(0.3 / 3.6e6, 20), propellerEfficiency: 0.8 });
  });

  it('a jet fuel mission: tsfc per second, an endurance reserve at a Mach number, the empty-mass fraction over the technology factor', () => {
    const c = conceptWith(cruise('400 kt', '30000 ft'), { propulsion: { kind: 'turbofan' } });
    c.mission = {
      payload: '1000 kg',
      segments: [{ kind: 'cruise', range: '1000 km', requirement: 'c' }, { kind: 'reserve', endurance: '45 min', speed: 'M0.5', altitude: '10000 ft' }],
      energy: { kind: 'fuel', tsfc: '0.7 1/h', propellerEfficiency: 0.8 },
      emptyMassFraction: 0.5,
      technologyFactor: 0.9,
    };
    const parsed = read(c);
    expect(parsed.warnings).toEqual([
      { code: 'field-ignored', field: 'mission.energy.propellerEfficiency', message: 'ignored: a turbofan has no propeller' },
      { code: 'field-ignored', field: 'mission.technologyFactor', message: 'ignored: the technology factor scales the regression, and mission.emptyMassFraction replaces it' },
    ]);
    const m = parsed.design.mission!;
    expect(m.energy).toEqual({ kind: 'fuel', engine: 'jet', tsfcPerS: expect.closeTo(0.7 / 3600, 15) });
    expect(m.emptyMassFraction).toBe(0.5);
    expect(m.crewKg).toBe(0);
    expect(m.aircraftClass).toBe('jet-transport');
    expect(m.startingMassKg).toBe(1000);
    const [flown, reserve] = m.segments as Array<Record<string, number | string>>;
    expect(flown.speedMps).toBeCloseTo(400 * KT, 10);
    expect(flown.altitudeM).toBeCloseTo(9144, 9);
    expect(reserve).toMatchObject({ kind: 'reserve', by: 'endurance', enduranceS: 2700, temperatureOffsetK: 0 });
    // ISA at 10000 ft = 3048 m: T = 288.15 - 6.5 x 3.048 K.
    expect(reserve.speedMps).toBeCloseTo(0.5 * Math.sqrt(1.4 * 287.05287 * (288.15 - 6.5 * 3.048)), 2);
  });

  it('a turboprop mission takes the turboprop class', () => {
    const c = exampleConcept();
    c.aircraft.propulsion = { kind: 'turboprop', engines: 2 };
    c.mission = { payload: '500 kg', segments: [{ kind: 'climb' }], energy: { kind: 'fuel', bsfc: '0.3 kg/kWh', propellerEfficiency: 0.85 } };
    const m = read(c).design.mission!;
    expect(m.aircraftClass).toBe('twin-turboprop');
    expect(m.energy).toMatchObject({ engine: 'propeller', propellerEfficiency: 0.85 });
  });
});
