/**
 * The mission block read from a concept file: its checks (one-line messages
 * naming the field), its resolution, the demos' closed masses, and that a
 * concept without a mission evaluates as before (no `mass`, the written mass).
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../../core';

const G0 = 9.80665; // exact (CGPM 1901)

function withMission(slug: string, change: (c: any) => void): ReturnType<typeof parseConcept> {
  const concept = structuredClone(DEMO_CONCEPTS.find((d) => d.slug === slug)!.concept) as any;
  change(concept);
  return parseConcept(concept);
}

function issue(parsed: ReturnType<typeof parseConcept>): { path: string; message: string } {
  expect(parsed.ok).toBe(false);
  if (parsed.ok) throw new Error('parsed');
  expect(parsed.issues).toHaveLength(1);
  return parsed.issues[0];
}

describe('the demos close their take-off mass from their missions', () => {
  for (const demo of DEMO_CONCEPTS) {
    it(`${demo.slug}: closes within 5 % of the mass its design intent states, and sizes at it`, () => {
      const parsed = parseConcept(demo.concept);
      expect(parsed.ok).toBe(true);
      if (!parsed.ok) return;
      const evaluation = evaluateDesign(parsed.design);
      const mass = evaluation.mass!;
      expect(mass).toBeDefined();
      const stated = Number.parseFloat(String(demo.concept.aircraft.takeoffMass));
      expect(Math.abs(mass.takeoff / stated - 1)).toBeLessThan(0.05);
      expect(evaluation.warnings.filter((w) => w.severity === 'error')).toEqual([]);
      // S = m g / (W/S) at the design point (methods reference, section 7).
      const w = evaluation.designPoint!.wingLoading;
      expect(evaluation.sizing!.wingArea).toBeCloseTo((mass.takeoff * G0) / w, 9);
    });
  }

  it('the survey drone flies on its battery: no fuel, every segment at mass fraction 1', () => {
    const drone = parseConcept(DEMO_CONCEPTS.find((d) => d.slug === 'survey-drone')!.concept);
    if (!drone.ok) throw new Error('demo');
    const mass = evaluateDesign(drone.design).mass!;
    expect(mass.fuel).toBe(0);
    expect(mass.battery).toBeGreaterThan(0);
    for (const s of mass.segments) expect(s.fuel).toBeNull();
    for (const s of mass.segments.filter((s) => s.massFraction !== null)) expect(s.massFraction).toBe(1);
  });
});

describe('a concept without a mission', () => {
  it('has no mass in its evaluation and sizes at the mass it writes', () => {
    const parsed = withMission('trainer', (c) => delete c.mission);
    if (!parsed.ok) throw new Error('trainer without mission');
    const evaluation = evaluateDesign(parsed.design);
    expect('mass' in evaluation).toBe(false);
    expect(evaluation.sizing!.takeoffWeight).toBeCloseTo(750 * G0, 9);
  });

  it('must then write its take-off mass', () => {
    const found = issue(withMission('trainer', (c) => { delete c.mission; delete c.aircraft.takeoffMass; }));
    expect(found.path).toBe('aircraft.takeoffMass');
  });

  it('may leave the take-off mass out when it has a mission', () => {
    const parsed = withMission('trainer', (c) => delete c.aircraft.takeoffMass);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(evaluateDesign(parsed.design).mass!.takeoff).toBeGreaterThan(0);
  });
});

describe('mission checks name the field', () => {
  it('a battery on a piston aircraft', () => {
    const found = issue(withMission('trainer', (c) => (c.mission.energy = { kind: 'battery', specificEnergy: '200 Wh/kg', usableFraction: 0.8, driveEfficiency: 0.8 })));
    expect(found.path).toBe('mission.energy.kind');
    expect(found.message).toMatch(/burns fuel; write kind "fuel" with bsfc/);
  });

  it('a jet without tsfc, and a propeller with tsfc', () => {
    expect(issue(withMission('business-jet', (c) => (c.mission.energy = { kind: 'fuel' }))).path).toBe('mission.energy.tsfc');
    expect(issue(withMission('trainer', (c) => (c.mission.energy = { kind: 'fuel', tsfc: '0.7 1/h' }))).path).toBe('mission.energy.tsfc');
  });

  it('a cruise with neither speed nor requirement, and one naming a requirement that is not a cruise', () => {
    expect(issue(withMission('trainer', (c) => (c.mission.segments[1] = { kind: 'cruise', range: '400 km' }))).path).toBe('mission.segments[1].speed');
    const found = issue(withMission('trainer', (c) => (c.mission.segments[1] = { kind: 'cruise', range: '400 km', requirement: 'stall' })));
    expect(found.path).toBe('mission.segments[1].requirement');
    expect(found.message).toBe('no cruise requirement "stall" (cruise requirements: "cruise")');
  });

  it('a reserve given two ways', () => {
    const found = issue(withMission('trainer', (c) => (c.mission.segments[4] = { kind: 'reserve', fraction: 0.05, endurance: '30 min', speed: '90 kt', altitude: '3000 ft' })));
    expect(found.path).toBe('mission.segments[4]');
    expect(found.message).toBe('a reserve gives one of endurance, range or fraction (got endurance and fraction)');
  });

  it('an unknown segment kind', () => {
    const found = issue(withMission('trainer', (c) => (c.mission.segments[1].kind = 'cruze')));
    expect(found.path).toBe('mission.segments[1].kind');
    expect(found.message).toMatch(/^unknown mission segment kind "cruze"; expected one of takeoff-climb, climb, cruise, loiter, descent-landing, reserve$/);
  });

  it('a specific fuel consumption without a unit', () => {
    const found = issue(withMission('trainer', (c) => (c.mission.energy.bsfc = 0.28)));
    expect(found.path).toBe('mission.energy.bsfc');
    expect(found.message).toMatch(/bare number.*kg\/kWh/);
  });

  it('a misspelt mission field, with a suggestion', () => {
    const parsed = withMission('trainer', (c) => {
      c.mission.paylod = c.mission.payload;
      delete c.mission.payload;
    });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.issues).toContainEqual({ path: 'mission.paylod', message: 'unknown field; did you mean "payload"?' });
  });

  it('nothing to carry', () => {
    expect(issue(withMission('trainer', (c) => { c.mission.payload = '0 kg'; c.mission.crew = '0 kg'; })).path).toBe('mission.payload');
  });
});

describe('a mission that cannot close', () => {
  it('evaluates with an error warning naming the fraction, no mass, and no sizing when no mass is written', () => {
    const parsed = withMission('trainer', (c) => {
      delete c.aircraft.takeoffMass;
      c.mission.segments[1].range = '9000 km';
      c.mission.emptyMassFraction = 0.62;
    });
    if (!parsed.ok) throw new Error('parse');
    const evaluation = evaluateDesign(parsed.design);
    expect(evaluation.mass).toBeUndefined();
    expect(evaluation.sizing).toBeNull();
    const error = evaluation.warnings.find((w) => w.code === 'mission-not-closed')!;
    expect(error.severity).toBe('error');
    expect(error.field).toBe('mission.emptyMassFraction');
    expect(error.message).toMatch(/^empty-mass fraction 0\.62 plus fuel fraction 0\.\d\d add to 1\.\d\d and leave nothing for payload and crew/);
  });
});
