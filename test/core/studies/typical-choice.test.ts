/**
 * Which published band starts a study, and the words that say why: the band
 * of the stated aircraft class, else the band holding the concept's value
 * (the propulsion's own class tried first), else the nearest band widened to
 * hold it. Bands from core/methods.md section 9 (common practice; Roskam,
 * Airplane Design I, Tables 3.1 and 3.6, from memory; Brandt et al.).
 */
import { describe, expect, it } from 'vitest';
import type { AircraftClass } from '../../../core/assumptions/study-case';
import type { Design, PropulsionKind } from '../../../core/model';
import { typicalRange, typicalUncertainty, DEFAULT_STUDY_SAMPLES, DEFAULT_STUDY_SEED } from '../../../core/studies';
import { demo, densityLapseJet } from './fixtures';

const trainer = demo('trainer').design;
const AR = 'aircraft.aero.aspectRatio';
const CD0 = 'aircraft.aero.configurations.clean.cd0';
const PREFIX = 'Loftpoint methods reference, section 9: ';

/** The trainer with its aspect ratio, clean CD0 or propulsion changed, and no aircraft class unless one is given. */
function trainerWith(o: { aspectRatio?: number; cd0?: number; cls?: AircraftClass; kind?: PropulsionKind }): Design {
  const { class: _stated, ...a } = trainer.aircraft;
  const clean = { ...a.configurations.clean, ...(o.cd0 === undefined ? {} : { cd0: o.cd0 }) };
  const aircraft = {
    ...a,
    ...(o.aspectRatio === undefined ? {} : { aspectRatio: o.aspectRatio }),
    ...(o.cls === undefined ? {} : { class: o.cls }),
    configurations: { ...a.configurations, clean },
    propulsion: { ...a.propulsion, ...(o.kind === undefined ? {} : { kind: o.kind }) },
  };
  return { ...trainer, aircraft } as Design;
}

const ends = (field: string, d: Design) => {
  const r = typicalRange(field, d);
  return r && [r.low, r.high, r.widened];
};

describe('typicalRange: the aspect-ratio bands (light aircraft 6-8, deltas 4-5, transports 9-11)', () => {
  it('takes the band of a stated transport class, and says so with its source', () => {
    const r = typicalRange(AR, trainerWith({ aspectRatio: 10, cls: 'transport' }));
    expect(r).toEqual({
      field: AR,
      low: 9,
      high: 11,
      source: `${PREFIX}aspect ratio about 10 for transports, taken as 9-11 (common practice)`,
      widened: false,
      distribution: 'triangular',
      basis: "aircraft class transport: aspect ratio about 10 for transports, taken as 9-11 (common practice); triangular, peaking at the concept's 10",
    });
  });

  it('falls back on the value where the class has no band of its own (a business jet)', () => {
    const r = typicalRange(AR, trainerWith({ aspectRatio: 4.5, cls: 'business-jet' }));
    expect(r && [r.low, r.high]).toEqual([4, 5]);
    expect(r?.basis).toBe("the band holding the concept's value: aspect ratio 4-5 for deltas (common practice); triangular, peaking at the concept's 4.5");
  });

  it('widens the nearest band to a value outside every band, in four figures', () => {
    // 8.63729: 0.637 above 6-8, 0.363 below 9-11: the transport band, widened down.
    const r = typicalRange(AR, trainerWith({ aspectRatio: 8.63729 }));
    expect(r && [r.low, r.high, r.widened]).toEqual([8.63729, 11, true]);
    expect(r?.basis).toBe(
      "no band holds the concept's value; nearest: aspect ratio about 10 for transports, taken as 9-11 (common practice), widened to 8.637-11 to contain the concept's value; triangular, peaking at the concept's 8.637",
    );
    // 30: 19 above 9-11, 22 above 6-8, 25 above 4-5.
    expect(ends(AR, trainerWith({ aspectRatio: 30 }))).toEqual([9, 30, true]);
    // 3: 1 below 4-5, 3 below 6-8.
    expect(ends(AR, trainerWith({ aspectRatio: 3 }))).toEqual([3, 5, true]);
  });

  it('takes the first-listed (most likely) band when two are equally near', () => {
    // 8.5 is 0.5 from 6-8 and from 9-11: 6-8 is listed first.
    expect(ends(AR, trainerWith({ aspectRatio: 8.5 }))).toEqual([6, 8.5, true]);
  });

  it('counts a value on a band\'s edge as inside it', () => {
    expect(ends(AR, trainerWith({ aspectRatio: 8 }))).toEqual([6, 8, false]);
    expect(ends(AR, trainerWith({ aspectRatio: 6 }))).toEqual([6, 8, false]);
    expect(ends(AR, trainerWith({ aspectRatio: 9 }))).toEqual([9, 11, false]);
    expect(typicalRange(AR, trainerWith({ aspectRatio: 6 }))?.basis).toMatch(/^the band holding the concept's value: aspect ratio 6-8 /);
    expect(typicalRange(AR, trainerWith({ aspectRatio: 11 }))?.basis).toMatch(/^the band holding the concept's value: aspect ratio about 10 /);
  });
});

describe('typicalRange: clean CD0 by class and by propulsion', () => {
  it('takes the band of each stated class', () => {
    // light aircraft 0.025-0.035, business jets 0.018-0.025, transports 0.015-0.020, small UAVs 0.03-0.05,
    // sailplanes 0.006-0.012; a concept value of 0.02 widens the bands that do not hold it.
    const at = (cls: AircraftClass) => ends(CD0, trainerWith({ cd0: 0.02, cls }));
    expect(at('light-aircraft')).toEqual([0.02, 0.035, true]);
    expect(at('business-jet')).toEqual([0.018, 0.025, false]);
    expect(at('transport')).toEqual([0.015, 0.02, false]);
    expect(at('small-uav')).toEqual([0.02, 0.05, true]);
    expect(at('sailplane')).toEqual([0.006, 0.02, true]);
    expect(typicalRange(CD0, trainerWith({ cd0: 0.02, cls: 'small-uav' }))?.basis).toMatch(/^aircraft class small UAV: CD0 of small UAVs 0\.03-0\.05/);
  });

  it('tries the class the propulsion suggests first: 0.032 is a light aircraft\'s CD0 for a piston, a small UAV\'s for an electric motor', () => {
    expect(ends(CD0, trainerWith({ cd0: 0.032 }))).toEqual([0.025, 0.035, false]);
    expect(ends(CD0, trainerWith({ cd0: 0.032, kind: 'electric' }))).toEqual([0.03, 0.05, false]);
    // 0.02 is in neither the small-UAV nor the light-aircraft band: the business-jet band, next in the list.
    expect(ends(CD0, trainerWith({ cd0: 0.02, kind: 'electric' }))).toEqual([0.018, 0.025, false]);
    expect(ends(CD0, trainerWith({ cd0: 0.02 }))).toEqual([0.018, 0.025, false]);
  });
});

describe('typicalRange: the other published bands', () => {
  it('offers the turbofan lapse exponent 0.6-1', () => {
    const jet = densityLapseJet().design;
    expect(typicalRange('aircraft.propulsion.lapseExponent', jet)?.source).toBe(`${PREFIX}turbofan lapse exponent 0.6-1 (common range)`);
    expect(ends('aircraft.propulsion.lapseExponent', jet)).toEqual([0.6, 1, false]);
  });

  it('offers each configuration role its own bands, and a configuration of no known role the clean CLmax bands', () => {
    const a = trainer.aircraft;
    const clean = a.configurations.clean;
    // Take-off flaps e 0.75-0.80 and flap CD0 0.010-0.020 (Roskam, Table 3.6, from memory); engine-out windmilling
    // and trim 0.003-0.005 (common practice); clean CLmax 0.8-1.2 for thin wings (common practice).
    const withConfigurations: Design = {
      ...trainer,
      aircraft: {
        ...a,
        configurations: {
          ...a.configurations,
          'climb-flaps': { cd0: clean.cd0 + 0.015, oswaldEfficiency: 0.78, clMax: 1.8 },
          ferry: { cd0: clean.cd0 + 0.004, oswaldEfficiency: 0.8, clMax: 1 },
        },
      },
    };
    const of = (name: string, key: string) => ends(`aircraft.aero.configurations.${name}.${key}`, withConfigurations);
    expect(of('climb-flaps', 'oswaldEfficiency')).toEqual([0.75, 0.8, false]);
    expect(of('climb-flaps', 'clMax')).toEqual([1.4, 2.2, false]);
    const increment = typicalRange('aircraft.aero.configurations.climb-flaps.cd0Increment', withConfigurations);
    expect(increment?.source).toBe(`${PREFIX}take-off flaps 0.010-0.020 (Roskam, Airplane Design I, Table 3.6, from memory)`);
    expect(typicalRange('aircraft.aero.configurations.ferry.cd0Increment', withConfigurations)?.source).toBe(
      `${PREFIX}engine-out windmilling and trim 0.003-0.005 (common practice)`,
    );
    expect(of('ferry', 'oswaldEfficiency')).toEqual([0.7, 0.95, false]);
    expect(of('ferry', 'clMax')).toEqual([0.8, 1.2, false]);
  });

  it('offers a requirement its propeller efficiency and its own friction bands', () => {
    // The trainer's cruise, climb and grass take-off; eta_p 0.75-0.85 in cruise, 0.7-0.8 in climb, 0.5-0.6 in the
    // take-off run (common practice).
    const ids = trainer.requirements.map((r) => `${r.id}:${r.kind}`);
    const idOf = (kind: string) => (ids.find((s) => s.endsWith(`:${kind}`)) ?? '').split(':')[0];
    const source = (field: string) => typicalRange(field, trainer)?.source.slice(PREFIX.length);
    expect(source(`requirements.${idOf('cruise')}.propellerEfficiency`)).toBe('cruise eta_p about 0.8, taken as 0.75-0.85 (common practice)');
    expect(source(`requirements.${idOf('takeoff-ground-roll')}.propellerEfficiency`)).toBe('take-off run eta_p 0.5-0.6 (common practice)');
    expect(source(`requirements.${idOf('takeoff-ground-roll')}.clGroundRun`)).toBe('ground-run CL 0.3-0.8 (common practice)');
  });
});

describe('typicalRange: rolling friction by the stated runway surface', () => {
  // Brandt et al. (common practice), core/methods.md section 9: dry paved 0.02-0.05, grass 0.05-0.1, soft ground to 0.3.
  const RF = 'requirements.takeoff-grass.rollingFriction';
  const roll = trainer.requirements.find((r) => r.id === 'takeoff-grass') as Record<string, unknown> & Design['requirements'][number];
  const withRolls = (...rolls: Record<string, unknown>[]): Design => ({ ...trainer, requirements: rolls as unknown as Design['requirements'] });

  it('takes the band of the surface each requirement states, by its own id', () => {
    const { runwaySurface: _grass, ...unstated } = roll;
    // The trainer's grass strip at 0.05, and a second take-off run on soft ground listed before it.
    const d = withRolls({ ...roll, id: 'soft-strip', runwaySurface: 'soft', rollingFriction: 0.2 }, roll);
    const grass = typicalRange(RF, d);
    expect(grass && [grass.low, grass.high, grass.widened]).toEqual([0.05, 0.1, false]);
    expect(grass?.basis).toBe(
      "runway surface grass strip: short to long or wet grass 0.05-0.1 (Brandt et al.; common practice); triangular, peaking at the concept's 0.05",
    );
    expect(ends('requirements.soft-strip.rollingFriction', d)).toEqual([0.1, 0.3, false]);
    // Without a stated surface, 0.05 sits on the top edge of the paved band, listed first.
    const none = typicalRange(RF, withRolls({ ...unstated, id: 'soft-strip', runwaySurface: 'soft' }, unstated));
    expect(none && [none.low, none.high]).toEqual([0.02, 0.05]);
    expect(none?.basis).toMatch(/^the band holding the concept's value: dry concrete or asphalt/);
  });
});

describe('typicalUncertainty', () => {
  it('uses the study defaults unless given a seed and a sample count', () => {
    const block = typicalUncertainty(trainer);
    expect([block.seed, block.samples]).toEqual([DEFAULT_STUDY_SEED, DEFAULT_STUDY_SAMPLES]);
    const given = typicalUncertainty(trainer, { seed: 7, samples: 500 });
    expect([given.seed, given.samples]).toEqual([7, 500]);
    // One range per published field, none for cdLinear (no published range).
    const fields = given.parameters.map((p) => p.field);
    expect(fields).toContain(AR);
    expect(fields).not.toContain('aircraft.aero.cdLinear');
    const ar = given.parameters.find((p) => p.field === AR);
    const expected = typicalRange(AR, trainer);
    expect(ar).toEqual({ field: AR, low: expected?.low, high: expected?.high, distribution: 'triangular' });
  });
});
