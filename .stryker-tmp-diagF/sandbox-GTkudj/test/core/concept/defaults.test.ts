// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { parseConcept, type ParsedConcept } from '../../../core/concept';
import type { Design, PropulsionKind, Requirement } from '../../../core/model';
import { conceptWith, type Editable } from './fixture';

// Defaults from DESIGN.md ("The concept file") and core/methods.md section 11.
const FT_PER_MIN = 0.00508; // NIST SP 811, exact

function design(parsed: ParsedConcept): Design {
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.design;
}

/** One requirement of every kind, each with only the fields it must have. */
const BARE: Editable[] = [
  { id: 'stall', kind: 'stall', speed: '50 kt' },
  { id: 'landing', kind: 'landing-ground-roll', distance: '400 m' },
  { id: 'takeoff', kind: 'takeoff-ground-roll', distance: '400 m' },
  { id: 'cruise', kind: 'cruise', speed: '120 kt' },
  { id: 'climb-rate', kind: 'climb-rate', rate: '800 ft/min' },
  { id: 'climb-gradient', kind: 'climb-gradient', gradient: 0.083 },
  { id: 'ceiling', kind: 'ceiling', altitude: '14000 ft' },
  { id: 'turn', kind: 'sustained-turn', speed: '100 kt', bankAngle: '60 deg' },
];

const FLAPS = {
  clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 },
  takeoff: {},
  landing: { cd0Increment: 0.05 },
};

function byId(d: Design, id: string): Requirement {
  const found = d.requirements.find((r) => r.id === id);
  if (!found) throw new Error(`no requirement ${id}`);
  return found;
}

describe('parseConcept: defaults', () => {
  const parsed = parseConcept(
    conceptWith(structuredClone(BARE), {
      aero: { aspectRatio: 8, configurations: FLAPS },
    }),
  );
  const d = design(parsed);

  it('fills the concept-level defaults', () => {
    expect(d.name).toBe('Untitled concept');
    expect(d.aircraft.cdLinear).toBe(0);
    expect(d.aircraft.propulsion).toEqual({ kind: 'piston', engines: 1, lapseExponent: 1 });
    expect(d.diagram).toEqual({ samples: 201 });
    expect(d).not.toHaveProperty('designPoint');
    expect(parsed.ok && parsed.warnings).toEqual([]);
  });

  it('gives every configuration clean cd0 plus its increment [0], and clean e and clMax', () => {
    expect(d.aircraft.configurations.takeoff).toEqual({ cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 });
    expect(d.aircraft.configurations.landing.cd0).toBeCloseTo(0.075, 15);
    expect(d.aircraft.configurations.landing).toMatchObject({ oswaldEfficiency: 0.8, clMax: 1.4 });
  });

  it('fills the defaults every requirement shares', () => {
    for (const r of d.requirements) {
      expect(r).toMatchObject({ enabled: true, temperatureOffsetK: 0, massFraction: 1, powerSetting: 1 });
      if (r.kind !== 'ceiling') expect(r.altitudeM).toBe(0);
      expect(r).not.toHaveProperty('label');
    }
    // The ceiling's altitude is its own, not the default.
    expect(byId(d, 'ceiling').altitudeM).toBeCloseTo(14000 * 0.3048, 9);
  });

  it('picks propeller efficiency by kind: take-off run 0.55, cruise and turn 0.8, others 0.75', () => {
    const expected: Record<string, number> = {
      stall: 0.75,
      landing: 0.75,
      takeoff: 0.55,
      cruise: 0.8,
      'climb-rate': 0.75,
      'climb-gradient': 0.75,
      ceiling: 0.75,
      turn: 0.8,
    };
    for (const [id, eta] of Object.entries(expected)) expect(byId(d, id).propellerEfficiency).toBe(eta);
  });

  it('picks the configuration by kind: landing for stall and landing, take-off for take-off run and gradient', () => {
    const expected: Record<string, string> = {
      stall: 'landing',
      landing: 'landing',
      takeoff: 'takeoff',
      cruise: 'clean',
      'climb-rate': 'clean',
      'climb-gradient': 'takeoff',
      ceiling: 'clean',
      turn: 'clean',
    };
    for (const [id, name] of Object.entries(expected)) expect(byId(d, id).configuration).toBe(name);
  });

  it('fills the defaults of each kind', () => {
    expect(byId(d, 'landing')).toMatchObject({ distanceM: 400, brakingFriction: 0.3, touchdownSpeedFactor: 1.15, freeRollTimeS: 0 });
    expect(byId(d, 'takeoff')).toMatchObject({ distanceM: 400, rollingFriction: 0.04, clGroundRun: 0.5, liftoffSpeedFactor: 1.1 });
    expect(byId(d, 'climb-rate')).toMatchObject({ minimumSpeedFactor: 1.2 });
    expect(byId(d, 'climb-rate')).not.toHaveProperty('speedMps');
    expect(byId(d, 'climb-rate')).toMatchObject({ rateMps: expect.closeTo(800 * FT_PER_MIN, 12) });
    expect(byId(d, 'climb-gradient')).toMatchObject({ gradient: 0.083, enginesInoperative: 0, speedFactor: 1.2 });
    // Service ceiling at 100 ft/min = 0.508 m/s (Anderson, Raymer; core/methods.md section 6).
    expect(byId(d, 'ceiling')).toMatchObject({ rateMps: expect.closeTo(0.508, 12), minimumSpeedFactor: 1.2 });
  });

  it('turns a bank angle into a load factor, n = 1/cos(phi)', () => {
    // Level coordinated turn: 60 deg gives n = 2, 45 deg gives sqrt 2 (trigonometry).
    expect((byId(d, 'turn') as { loadFactor: number }).loadFactor).toBeCloseTo(2, 12);
    const d45 = design(parseConcept(conceptWith([{ id: 't', kind: 'sustained-turn', speed: '90 kt', bankAngle: '45 deg' }])));
    expect((d45.requirements[0] as { loadFactor: number }).loadFactor).toBeCloseTo(Math.SQRT2, 12);
    const dn = design(parseConcept(conceptWith([{ id: 't', kind: 'sustained-turn', speed: '90 kt', loadFactor: 1.5 }])));
    expect((dn.requirements[0] as { loadFactor: number }).loadFactor).toBe(1.5);
  });

  it.each<[PropulsionKind, number]>([
    ['piston', 1],
    ['turboprop', 0.75],
    ['turbofan', 1],
    ['electric', 1],
  ])('sets the lapse exponent of a %s to %d (core/methods.md section 5)', (kind, m) => {
    const d = design(parseConcept(conceptWith([{ id: 'c', kind: 'cruise', speed: '200 kt' }], { propulsion: { kind } })));
    expect(d.aircraft.propulsion.lapseExponent).toBe(m);
  });

  it('keeps a turbocharged piston\'s critical altitude in metres', () => {
    const d = design(
      parseConcept(conceptWith([{ id: 'c', kind: 'cruise', speed: '150 kt' }], { propulsion: { kind: 'turbocharged-piston', criticalAltitude: '12000 ft' } })),
    );
    expect(d.aircraft.propulsion.criticalAltitudeM).toBeCloseTo(3657.6, 9);
    expect(d.aircraft.propulsion.lapseExponent).toBe(1);
  });

  it('uses what the file gives instead of the default', () => {
    const given = conceptWith(
      [
        {
          id: 'landing',
          kind: 'landing-ground-roll',
          label: 'Short strip',
          enabled: false,
          distance: '1200 ft',
          altitude: '2200 m',
          temperatureOffset: '45 degF',
          massFraction: 0.9,
          powerSetting: 0.5,
          propellerEfficiency: 0.7,
          configuration: 'clean',
          brakingFriction: 0.45,
          touchdownSpeedFactor: 1.3,
          freeRollTime: '3 s',
        },
      ],
      { propulsion: { kind: 'turboprop', engines: 2, lapseExponent: 0.8 } },
    );
    given.aircraft.aero.cdLinear = -0.01;
    given.name = 'Given';
    given.diagram = { wingLoading: ['20 lb/ft^2', '60 lb/ft^2'], samples: 11 };
    given.designPoint = { wingLoading: '40 lb/ft^2', powerToWeight: '0.1 hp/lb' };
    const d = design(parseConcept(given));
    expect(d.name).toBe('Given');
    expect(d.aircraft.cdLinear).toBe(-0.01);
    expect(d.aircraft.propulsion).toEqual({ kind: 'turboprop', engines: 2, lapseExponent: 0.8 });
    expect(d.requirements[0]).toEqual({
      id: 'landing',
      kind: 'landing-ground-roll',
      label: 'Short strip',
      enabled: false,
      distanceM: expect.closeTo(365.76, 9),
      altitudeM: 2200,
      // 45 degF difference = 25 K (NIST SP 811).
      temperatureOffsetK: expect.closeTo(25, 12),
      massFraction: 0.9,
      powerSetting: 0.5,
      propellerEfficiency: 0.7,
      configuration: 'clean',
      brakingFriction: 0.45,
      touchdownSpeedFactor: 1.3,
      freeRollTimeS: 3,
      // Not written: aerodynamic terms left out, as files without them always meant.
      clGround: null,
      liftDumping: false,
    });
    // 1 psf = 47.880258980335843 Pa; 1 hp/lbf = 745.69987158227022 / 4.4482216152605 W/N (NIST SP 811).
    const psf = 47.880258980335843;
    expect(d.diagram.wingLoadingRangePa?.[0]).toBeCloseTo(20 * psf, 9);
    expect(d.diagram.wingLoadingRangePa?.[1]).toBeCloseTo(60 * psf, 9);
    expect(d.diagram.samples).toBe(11);
    expect(d.designPoint?.wingLoadingPa).toBeCloseTo(40 * psf, 9);
    expect(d.designPoint?.loading).toBeCloseTo((0.1 * 745.69987158227022) / 4.4482216152605, 9);
  });

  it('reads a turbofan design point as thrust-to-weight, as a number or text', () => {
    const jet = conceptWith([{ id: 'c', kind: 'cruise', speed: '400 kt', altitude: '35000 ft' }], { propulsion: { kind: 'turbofan', engines: 2 } });
    jet.designPoint = { wingLoading: '3000 N/m^2', thrustToWeight: 0.32 };
    expect(design(parseConcept(jet)).designPoint).toEqual({ wingLoadingPa: 3000, loading: 0.32 });
    jet.designPoint.thrustToWeight = '0.32';
    expect(design(parseConcept(jet)).designPoint).toEqual({ wingLoadingPa: 3000, loading: 0.32 });
  });

  it('reads a gradient written as a percentage', () => {
    const d = design(parseConcept(conceptWith([{ id: 'g', kind: 'climb-gradient', gradient: '2.4 %', configuration: 'clean' }])));
    expect((d.requirements[0] as { gradient: number }).gradient).toBeCloseTo(0.024, 15);
  });
});

describe('parseConcept: a defaulted configuration the concept does not define', () => {
  it('falls back to clean, with one warning per requirement naming the field', () => {
    const parsed = parseConcept(conceptWith(structuredClone(BARE)));
    const d = design(parsed);
    for (const r of d.requirements) expect(r.configuration).toBe('clean');
    if (!parsed.ok) return;
    const fields = parsed.warnings.map((w) => w.field);
    // stall and landing want landing; take-off run and climb gradient want take-off.
    expect(fields).toEqual([
      'requirements[0].configuration',
      'requirements[1].configuration',
      'requirements[2].configuration',
      'requirements[5].configuration',
    ]);
    for (const w of parsed.warnings) {
      expect(w.code).toBe('configuration-fallback');
      expect(w.message).toMatch(/using clean/);
    }
    expect(parsed.warnings[0].message).toMatch(/aircraft\.aero\.configurations\.landing/);
    expect(parsed.warnings[2].message).toMatch(/aircraft\.aero\.configurations\.takeoff/);
    expect(d.warnings).toEqual(parsed.warnings);
  });
});

describe('parseConcept: fields a propulsion kind does not use', () => {
  it('warns that they are ignored, and still parses', () => {
    const parsed = parseConcept(
      conceptWith([{ id: 'c', kind: 'cruise', speed: '400 kt', propellerEfficiency: 0.8 }], {
        propulsion: { kind: 'turbofan', engines: 2, criticalAltitude: '10000 ft' },
      }),
    );
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.warnings.map((w) => [w.code, w.field])).toEqual([
      ['field-ignored', 'aircraft.propulsion.criticalAltitude'],
      ['field-ignored', 'requirements[0].propellerEfficiency'],
    ]);
    expect(parsed.design.aircraft.propulsion).not.toHaveProperty('criticalAltitudeM');
    const piston = parseConcept(conceptWith([{ id: 'c', kind: 'cruise', speed: '100 kt' }], { propulsion: { kind: 'piston', lapseExponent: 0.9 } }));
    expect(piston.ok && piston.warnings.map((w) => w.field)).toEqual(['aircraft.propulsion.lapseExponent']);
  });
});
