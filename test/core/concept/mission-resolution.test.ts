/**
 * The mission block as the weight closure receives it: units turned to SI
 * (1 min = 60 s, 1 km = 1000 m, 1 kt = 1852/3600 m/s, 1 ft = 0.3048 m, NIST
 * SP 811), a flown segment's condition as written or copied from the named
 * cruise requirement, and a note for each field that has no effect
 * (README.md, "Take-off mass from the mission": a battery aircraft burns no
 * fuel, so its segment fractions are not used).
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { exampleConcept, type Editable } from './fixture';

const KT = 1852 / 3600;
const FT = 0.3048;

function parsed(change: (c: Editable) => void) {
  const concept = exampleConcept();
  change(concept);
  const result = parseConcept(concept);
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result;
}

const fuel = { kind: 'fuel', bsfc: '0.3 kg/kWh' };
const battery = { kind: 'battery', specificEnergy: '200 Wh/kg', usableFraction: 0.8, driveEfficiency: 0.85 };

describe('mission segments in SI', () => {
  it('a loiter by its endurance, at the speed and altitude written', () => {
    const { design } = parsed((c) => {
      c.mission = { payload: '100 kg', segments: [{ kind: 'loiter', endurance: '45 min', speed: '90 kt', altitude: '3000 ft' }], energy: fuel };
    });
    const [loiter] = design.mission!.segments;
    expect(loiter).toMatchObject({ kind: 'loiter', altitudeM: 3000 * FT, temperatureOffsetK: 0 });
    expect((loiter as { enduranceS: number }).enduranceS).toBeCloseTo(45 * 60, 9);
    expect((loiter as { speedMps: number }).speedMps).toBeCloseTo(90 * KT, 12);
  });

  it('a loiter and a cruise at the named cruise requirement\'s speed and altitude (110 kt at 6000 ft in the example)', () => {
    const { design } = parsed((c) => {
      c.mission = {
        payload: '100 kg',
        segments: [
          { kind: 'cruise', range: '500 km', requirement: 'cruise' },
          { kind: 'loiter', endurance: '30 min', requirement: 'cruise' },
        ],
        energy: fuel,
      };
    });
    const [cruise, loiter] = design.mission!.segments as Array<{ speedMps: number; altitudeM: number; rangeM?: number; enduranceS?: number }>;
    expect(cruise.rangeM).toBeCloseTo(500_000, 6);
    expect(loiter.enduranceS).toBeCloseTo(1800, 9);
    for (const s of [cruise, loiter]) {
      expect(s.speedMps).toBeCloseTo(110 * KT, 12);
      expect(s.altitudeM).toBeCloseTo(6000 * FT, 9);
    }
  });
});

describe('notes on mission fields that have no effect', () => {
  it('a fuel mission uses the fractions it is given, with no note', () => {
    const result = parsed((c) => {
      c.mission = { payload: '100 kg', segments: [{ kind: 'takeoff-climb', fraction: 0.97 }, { kind: 'climb', fraction: 0.98 }], energy: fuel };
    });
    expect(result.warnings).toEqual([]);
    expect(result.design.mission!.segments).toEqual([
      { kind: 'takeoff-climb', fraction: 0.97 },
      { kind: 'climb', fraction: 0.98 },
    ]);
  });

  it('a battery mission notes a climb fraction it ignores, but not a fraction left empty by the window', () => {
    const result = parsed((c) => {
      c.aircraft.propulsion.kind = 'electric';
      // An editor that clears a field may leave it present and undefined: nothing was given.
      c.mission = { payload: '5 kg', segments: [{ kind: 'climb', fraction: 0.98 }, { kind: 'descent-landing', fraction: undefined }], energy: battery };
    });
    expect(result.warnings.filter((w) => w.code === 'field-ignored')).toEqual([
      {
        code: 'field-ignored',
        field: 'mission.segments[0].fraction',
        message: 'ignored: a battery aircraft burns no fuel; its climb takes the energy to gain height, its descent none',
      },
    ]);
  });
});
