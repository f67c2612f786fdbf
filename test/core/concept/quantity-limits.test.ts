/**
 * Limits on values written with a unit: the message gives the limit in the
 * field's SI unit (angles in degrees) and what was written, with its SI value
 * when the two differ. Limits are the concept format's: quarter-chord sweep
 * from 0 to below 60 deg, ISA temperature offset -60 K to +60 K, altitude at
 * most 30000 m (the standard atmosphere's layers used here end at 32 km:
 * ICAO Doc 7488/3), speeds and loadings above 0, payload at least 0.
 * Conversions: 1 rad = 180/pi deg, so 1.2 rad = 68.7549 deg; 1 kt = 1852/3600 m/s.
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { conceptWith, exampleConcept, type Editable } from './fixture';

const issues = (concept: Editable) => {
  const parsed = parseConcept(concept);
  return parsed.ok ? [] : parsed.issues;
};
const swept = (sweep: unknown) =>
  conceptWith([{ id: 'c', kind: 'cruise', speed: '100 kt' }], {
    aero: { aspectRatio: 8, thicknessRatio: 0.1, quarterChordSweep: sweep, configurations: { clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 } } },
  });
const flying = (fields: Editable) => conceptWith([{ id: 'c', kind: 'cruise', speed: '100 kt', ...fields }]);
const pointed = (designPoint: Editable) => ({ ...exampleConcept(), designPoint });

describe('limits of values with units', () => {
  it.each<[string, Editable, string, string]>([
    ['a sweep of 60 deg (the limit itself, excluded)', swept('60 deg'), 'aircraft.aero.quarterChordSweep', 'must be less than 60 deg (got "60 deg")'],
    ['a sweep of 1.2 rad', swept('1.2 rad'), 'aircraft.aero.quarterChordSweep', 'must be less than 60 deg (got "1.2 rad" = 68.7549 deg)'],
    ['a negative sweep', swept('-1 deg'), 'aircraft.aero.quarterChordSweep', 'must be at least 0 (got "-1 deg")'],
    ['a sweep without a unit', swept(30), 'aircraft.aero.quarterChordSweep', 'is a bare number (30); write it with a unit, e.g. "45 deg" (units: deg, rad)'],
    ['ISA -61 K', flying({ temperatureOffset: '-61 K' }), 'requirements[0].temperatureOffset', 'must be at least -60 K (got "-61 K") (requirement "c")'],
    ['ISA +61 K written with a space in front', flying({ temperatureOffset: ' 61 K' }), 'requirements[0].temperatureOffset', 'must be at most 60 K (got " 61 K") (requirement "c")'],
    ['an altitude of 30001 m', flying({ altitude: '30001 m' }), 'requirements[0].altitude', 'must be at most 30000 m (got "30001 m") (requirement "c")'],
    ['a speed of 0 kt', flying({ speed: '0 kt' }), 'requirements[0].speed', 'must be greater than 0 (got "0 kt" = 0 m/s) (requirement "c")'],
    ['a wing loading of 0 Pa', pointed({ wingLoading: '0 Pa', powerToWeight: '9 W/N' }), 'designPoint.wingLoading', 'must be greater than 0 (got "0 Pa" = 0 N/m^2)'],
    ['a negative power loading, shown to six figures', pointed({ wingLoading: '600 Pa', powerToWeight: '-1.234567891 W/N' }), 'designPoint.powerToWeight', 'must be greater than 0 (got "-1.234567891 W/N" = -1.23457 W/N)'],
    ['a Mach number of 0', flying({ speed: 'M0' }), 'requirements[0].speed', '"M0": write a Mach number above 0 and at most 10, e.g. "M0.78" (requirement "c")'],
  ])('%s', (_what, concept, path, message) => {
    expect(issues(concept)).toEqual([{ path, message }]);
  });

  it.each<[string, Editable, string, string]>([
    ['a negative payload', { payload: '-1 kg' }, 'mission.payload', 'must be at least 0 (got "-1 kg")'],
    ['no payload', { payload: undefined }, 'mission.payload', 'is required, e.g. "750 kg"'],
  ])('%s', (_what, fields, path, message) => {
    const c = exampleConcept();
    c.mission = { payload: '100 kg', segments: [{ kind: 'climb' }], energy: { kind: 'fuel', bsfc: '0.3 kg/kWh' }, ...fields };
    expect(issues(c)).toEqual([{ path, message }]);
  });

  it('a thrust-to-weight of 0 or in the wrong unit', () => {
    const jet = (thrustToWeight: unknown) => {
      const c = conceptWith([{ id: 'c', kind: 'cruise', speed: '400 kt' }], { propulsion: { kind: 'turbofan' } });
      c.designPoint = { wingLoading: '3000 Pa', thrustToWeight };
      return c;
    };
    expect(issues(jet(0))).toEqual([{ path: 'designPoint.thrustToWeight', message: 'must be greater than 0 (got 0)' }]);
    expect(issues(jet('3 kg'))).toEqual([{ path: 'designPoint.thrustToWeight', message: '"3 kg": "kg" is a mass unit, but this field is a thrust-to-weight; use one of N/N, lbf/lbf' }]);
    expect(issues(jet(0.3))).toEqual([]);
    expect(issues(jet('0.3 lbf/lbf'))).toEqual([]);
  });

  it('accepts the ends that are included: sweep 0, ISA -60 K and +60 K, 30000 m', () => {
    expect(issues(swept('0 deg'))).toEqual([]);
    expect(issues(swept('59.99 deg'))).toEqual([]);
    expect(issues(flying({ temperatureOffset: '-60 K' }))).toEqual([]);
    expect(issues(flying({ temperatureOffset: '60 K' }))).toEqual([]);
    expect(issues(flying({ altitude: '30000 m' }))).toEqual([]);
    expect(issues(flying({ speed: '0.1 kt' }))).toEqual([]);
  });
});
