/**
 * The exact message for each rule that joins fields of a concept: unique ids,
 * configurations that exist, the engine's critical altitude and lapse model,
 * an ascending diagram range, the design point on the concept's own axis
 * (power-to-weight for propellers, thrust-to-weight for jets: common
 * practice in constraint diagrams), and the mission's energy, load, flight
 * condition and reserve (a propeller aircraft's fuel use is given by brake
 * specific fuel consumption, a jet's by thrust specific fuel consumption:
 * common practice, e.g. Breguet's range equation in either form).
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { exampleConcept, type Editable } from './fixture';

function issuesAfter(change: (c: Editable) => void) {
  const concept = exampleConcept();
  change(concept);
  const parsed = parseConcept(concept);
  return parsed.ok ? [] : parsed.issues;
}

const fuel = (m: Editable) => ({ payload: '100 kg', segments: [{ kind: 'climb' }], energy: { kind: 'fuel', bsfc: '0.3 kg/kWh' }, ...m });
const battery = { kind: 'battery', specificEnergy: '200 Wh/kg', usableFraction: 0.8, driveEfficiency: 0.8 };
/** The example made a twin turbofan (no propeller efficiency, no design point). */
function jet(c: Editable) {
  c.aircraft.propulsion = { kind: 'turbofan', engines: 2 };
  for (const r of c.requirements) delete r.propellerEfficiency;
  delete c.designPoint;
}
const flying = (...segments: Editable[]) => (c: Editable) => (c.mission = fuel({ segments: [{ kind: 'climb' }, ...segments] }));

describe('rules across the aircraft, requirements, diagram and design point', () => {
  it.each<[string, (c: Editable) => void, string, string]>([
    ['a duplicate id', (c) => (c.requirements[1].id = 'stall'), 'requirements[1].id', 'duplicate id "stall" (also requirements[0].id); give each requirement its own id'],
    ['an id used a third time points at the first', (c) => c.requirements.push({ id: 'stall', kind: 'stall', speed: '50 kt' }), 'requirements[2].id', 'duplicate id "stall" (also requirements[0].id); give each requirement its own id'],
    ['a configuration not defined', (c) => (c.requirements[1].configuration = 'x'), 'requirements[1].configuration', 'no configuration "x" in aircraft.aero.configurations (defined: clean, takeoff, landing) (requirement "cruise")'],
    ['a turbocharged piston without its critical altitude', (c) => (c.aircraft.propulsion.kind = 'turbocharged-piston'), 'aircraft.propulsion.criticalAltitude', 'is required for a turbocharged-piston engine, e.g. "12000 ft"'],
    ['a turbine lapse model on a piston', (c) => (c.aircraft.propulsion.lapseModel = 'turbojet'), 'aircraft.propulsion.lapseModel', 'a piston engine takes lapseModel "density", not "turbojet"'],
    ['a range whose ends are equal', (c) => (c.diagram.wingLoading = ['500 N/m^2', '500 N/m^2']), 'diagram.wingLoading', 'must be ascending, [low, high] (got ["500 N/m^2","500 N/m^2"])'],
    // 1 kg/m^2 of wing loading is 9.80665 N/m^2 (standard gravity, exact by definition: CGPM 1901).
    ['a range whose ends are equal in different units', (c) => (c.diagram.wingLoading = ['1 kg/m^2', '9.80665 Pa']), 'diagram.wingLoading', 'must be ascending, [low, high] (got ["1 kg/m^2","9.80665 Pa"])'],
    ['thrust-to-weight on a piston', (c) => (c.designPoint = { wingLoading: '600 N/m^2', thrustToWeight: 0.3 }), 'designPoint.thrustToWeight', 'a piston concept is drawn as power-to-weight; give designPoint.powerToWeight (e.g. "9 W/N") instead'],
    ['a piston design point without its loading', (c) => (c.designPoint = { wingLoading: '600 N/m^2' }), 'designPoint.powerToWeight', 'is required: a piston concept is drawn as power-to-weight, e.g. "9 W/N"'],
    ['a jet design point without its loading', (c) => { jet(c); c.designPoint = { wingLoading: '600 N/m^2' }; }, 'designPoint.thrustToWeight', 'is required: a turbofan concept is drawn as thrust-to-weight, e.g. 0.35'],
    ['power-to-weight on a jet', (c) => { jet(c); c.designPoint = { wingLoading: '600 N/m^2', powerToWeight: '9 W/N' }; }, 'designPoint.powerToWeight', 'a turbofan concept is drawn as thrust-to-weight; give designPoint.thrustToWeight (e.g. 0.35) instead'],
    ['no take-off mass and no mission', (c) => delete c.aircraft.takeoffMass, 'aircraft.takeoffMass', 'is required, e.g. "750 kg" (or give a mission, from which the take-off mass is closed)'],
  ])('%s', (_what, change, path, message) => {
    expect(issuesAfter(change)).toEqual([{ path, message }]);
  });

  it('accepts an ascending range and a design point on its own axis, for a propeller and for a jet', () => {
    expect(issuesAfter((c) => (c.diagram.wingLoading = ['9.8 Pa', '1 kg/m^2']))).toEqual([]);
    expect(issuesAfter((c) => { jet(c); c.designPoint = { wingLoading: '600 N/m^2', thrustToWeight: 0.3 }; })).toEqual([]);
    expect(issuesAfter((c) => { c.aircraft.propulsion = { kind: 'turbocharged-piston', criticalAltitude: '12000 ft' }; })).toEqual([]);
  });
});

describe('rules of the mission', () => {
  it.each<[string, (c: Editable) => void, string, string]>([
    ['a battery on a piston', (c) => (c.mission = fuel({ energy: battery })), 'mission.energy.kind', 'a piston aircraft burns fuel; write kind "fuel" with bsfc'],
    ['a battery on a jet', (c) => { jet(c); c.mission = fuel({ energy: battery }); }, 'mission.energy.kind', 'a turbofan aircraft burns fuel; write kind "fuel" with tsfc'],
    ['fuel on an electric aircraft', (c) => { c.aircraft.propulsion = { kind: 'electric' }; c.mission = fuel({}); }, 'mission.energy.kind', 'an electric aircraft flies on a battery; write kind "battery" with specificEnergy, usableFraction and driveEfficiency'],
    ['tsfc on a piston', (c) => (c.mission = fuel({ energy: { kind: 'fuel', tsfc: '0.7 1/h' } })), 'mission.energy.tsfc', 'a piston aircraft gives bsfc (e.g. "0.26 kg/kWh") with propellerEfficiency, not tsfc'],
    ['no bsfc on a piston', (c) => (c.mission = fuel({ energy: { kind: 'fuel' } })), 'mission.energy.bsfc', 'is required for a piston aircraft, e.g. "0.26 kg/kWh"'],
    ['bsfc on a jet', (c) => { jet(c); c.mission = fuel({}); }, 'mission.energy.bsfc', 'a turbofan aircraft gives tsfc (e.g. "0.7 1/h"), not bsfc'],
    ['no tsfc on a jet', (c) => { jet(c); c.mission = fuel({ energy: { kind: 'fuel' } }); }, 'mission.energy.tsfc', 'is required for a turbofan aircraft, e.g. "0.7 1/h"'],
    ['nothing carried', (c) => (c.mission = fuel({ payload: '0 kg' })), 'mission.payload', 'payload and crew add to 0 kg; a mission carries something, e.g. "400 kg"'],
    ['nothing carried, crew written as 0', (c) => (c.mission = fuel({ payload: '0 kg', crew: '0 kg' })), 'mission.payload', 'payload and crew add to 0 kg; a mission carries something, e.g. "400 kg"'],
    ['a speed beside a named requirement', flying({ kind: 'cruise', range: '100 km', requirement: 'cruise', speed: '100 kt' }), 'mission.segments[1].requirement', 'give speed and altitude, or a requirement whose condition is flown, not both'],
    ['an altitude beside a named requirement', flying({ kind: 'loiter', endurance: '1 h', requirement: 'cruise', altitude: '100 ft' }), 'mission.segments[1].requirement', 'give speed and altitude, or a requirement whose condition is flown, not both'],
    ['a named requirement that is not a cruise', flying({ kind: 'cruise', range: '100 km', requirement: 'stall' }), 'mission.segments[1].requirement', 'no cruise requirement "stall" (cruise requirements: "cruise")'],
    ['a named requirement when there is no cruise', (c) => { c.requirements.pop(); flying({ kind: 'cruise', range: '100 km', requirement: 'x' })(c); }, 'mission.segments[1].requirement', 'no cruise requirement "x" (cruise requirements: none)'],
    ['a cruise without its speed', flying({ kind: 'cruise', range: '100 km', altitude: '100 ft' }), 'mission.segments[1].speed', 'is required, e.g. "110 kt" (or name a cruise requirement in requirement)'],
    ['a loiter without its altitude', flying({ kind: 'loiter', endurance: '1 h', speed: '100 kt' }), 'mission.segments[1].altitude', 'is required, e.g. "6000 ft" (or name a cruise requirement in requirement)'],
    ['a reserve of nothing', flying({ kind: 'reserve' }), 'mission.segments[1]', 'a reserve gives one of endurance, range or fraction (got none)'],
    ['a reserve given two ways', flying({ kind: 'reserve', range: '10 km', fraction: 0.05 }), 'mission.segments[1]', 'a reserve gives one of endurance, range or fraction (got range and fraction)'],
    ['a reserve given three ways', flying({ kind: 'reserve', endurance: '1 h', range: '10 km', fraction: 0.05 }), 'mission.segments[1]', 'a reserve gives one of endurance, range or fraction (got endurance and range and fraction)'],
    ['a fraction reserve with a speed', flying({ kind: 'reserve', fraction: 0.05, speed: '90 kt' }), 'mission.segments[1].speed', 'a reserve given as a fraction of the fuel or energy is not flown; leave out speed, altitude and requirement'],
    ['a fraction reserve with an altitude', flying({ kind: 'reserve', fraction: 0.05, altitude: '100 ft' }), 'mission.segments[1].altitude', 'a reserve given as a fraction of the fuel or energy is not flown; leave out speed, altitude and requirement'],
    ['a fraction reserve with a requirement', flying({ kind: 'reserve', fraction: 0.05, requirement: 'cruise' }), 'mission.segments[1].requirement', 'a reserve given as a fraction of the fuel or energy is not flown; leave out speed, altitude and requirement'],
    ['a range reserve without its speed', flying({ kind: 'reserve', range: '10 km' }), 'mission.segments[1].speed', 'is required, e.g. "110 kt" (or name a cruise requirement in requirement)'],
    ['an endurance reserve without its altitude', flying({ kind: 'reserve', endurance: '30 min', speed: '90 kt' }), 'mission.segments[1].altitude', 'is required, e.g. "6000 ft" (or name a cruise requirement in requirement)'],
  ])('%s', (_what, change, path, message) => {
    expect(issuesAfter(change)).toEqual([{ path, message }]);
  });

  it('accepts a crew without payload, a named cruise, a flown reserve, a jet on tsfc and an electric aircraft on a battery', () => {
    expect(issuesAfter((c) => (c.mission = fuel({ payload: '0 kg', crew: '80 kg' })))).toEqual([]);
    expect(issuesAfter(flying({ kind: 'cruise', range: '100 km', requirement: 'cruise' }, { kind: 'reserve', endurance: '30 min', requirement: 'cruise' }))).toEqual([]);
    expect(issuesAfter(flying({ kind: 'reserve', range: '50 km', speed: '90 kt', altitude: '2000 ft' }))).toEqual([]);
    expect(issuesAfter((c) => { jet(c); c.mission = fuel({ energy: { kind: 'fuel', tsfc: '0.7 1/h' } }); })).toEqual([]);
  });
});

describe('joined rules: what each rule leaves alone', () => {
  it('an engine out is allowed on a twin (one of two engines), refused on a single', () => {
    const climb = { id: 'oei', kind: 'climb-gradient', gradient: '2.4 %', enginesInoperative: 1, configuration: 'takeoff' };
    expect(issuesAfter((c) => { c.aircraft.propulsion.engines = 2; c.requirements.push(climb); })).toEqual([]);
    expect(issuesAfter((c) => c.requirements.push(climb))[0].path).toBe('requirements[2].enginesInoperative');
  });

  it('lists every cruise requirement when a segment names another', () => {
    expect(
      issuesAfter((c) => {
        c.requirements.push({ id: 'cruise-high', kind: 'cruise', speed: '120 kt', altitude: '9000 ft' });
        flying({ kind: 'cruise', range: '100 km', requirement: 'x' })(c);
      }),
    ).toEqual([{ path: 'mission.segments[1].requirement', message: 'no cruise requirement "x" (cruise requirements: "cruise", "cruise-high")' }]);
  });

  it('accepts an electric aircraft on a battery, a reserve given as a fraction alone, and a concept with no diagram block', () => {
    expect(issuesAfter((c) => {
      c.aircraft.propulsion = { kind: 'electric' };
      for (const r of c.requirements) delete r.propellerEfficiency;
      c.mission = fuel({ energy: battery });
    })).toEqual([]);
    expect(issuesAfter(flying({ kind: 'reserve', fraction: 0.05 }))).toEqual([]);
    expect(issuesAfter((c) => delete c.diagram)).toEqual([]);
    expect(issuesAfter((c) => delete c.diagram.wingLoading)).toEqual([]);
  });
});
