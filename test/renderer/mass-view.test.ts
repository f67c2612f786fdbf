import { describe, expect, it } from 'vitest';
import { driverRows, energyText, massParts, plain3, shareText } from '../../app/renderer/lib/mission/mass-view';
import { missionProblem } from '../../app/renderer/lib/mission/mission-problem';
import type { MassJson } from '../../core';

/** An invented closed mass: 1,000 kg = 600 empty + 220 fuel + 90 payload + 90 crew (a hand sum). */
const fuelMass: MassJson = {
  takeoff: 1000,
  empty: 600,
  fuel: 220,
  battery: 0,
  payload: 90,
  crew: 90,
  emptyFraction: 0.6,
  growthFactor: 3.1,
  iterations: 9,
  segments: [],
  drivers: [],
};

describe('the closed mass as the window shows it', () => {
  it('stacks empty, fuel, payload and crew with their shares of the take-off mass', () => {
    const parts = massParts(fuelMass);
    expect(parts.map((part) => part.key)).toEqual(['empty', 'fuel', 'payload', 'crew']);
    expect(parts.map((part) => part.share)).toEqual([0.6, 0.22, 0.09, 0.09]);
    expect(parts.map((part) => shareText(part.share))).toEqual(['60 %', '22 %', '9 %', '9 %']);
  });

  it('shows a battery instead of fuel, and leaves out a part with no mass (no crew on an uncrewed aircraft)', () => {
    const parts = massParts({ ...fuelMass, fuel: 0, battery: 310, crew: 0, payload: 90 });
    expect(parts.map((part) => part.key)).toEqual(['empty', 'battery', 'payload']);
  });

  it('never gives NaN: a take-off mass that is not a number gives shares of 0 and dashes', () => {
    const parts = massParts({ ...fuelMass, takeoff: Number.NaN });
    expect(parts.every((part) => part.share === 0)).toBe(true);
    expect(shareText(Number.NaN)).toBe('—');
    expect(plain3(Number.POSITIVE_INFINITY)).toBe('—');
    expect(plain3(null)).toBe('—');
  });

  it('gives battery energy in kWh, or Wh below 1 kWh (1 Wh = 3,600 J, NIST SP 811)', () => {
    expect(energyText(3.6e6)).toBe('1 kWh');
    expect(energyText(1.8e7)).toBe('5 kWh');
    expect(energyText(142560)).toBe('39.6 Wh');
    expect(energyText(0)).toBe('0 kWh');
    expect(energyText(null)).toBe('—');
  });

  it('lists what moves the take-off mass largest effect first, either sign, in per cent per per cent', () => {
    const rows = driverRows([
      { field: 'mission.payload', name: 'payload', elasticity: 0.42 },
      { field: 'mission.energy.tsfc', name: 'fuel consumption', elasticity: 0.9 },
      { field: 'mission.liftToDrag', name: 'lift-to-drag ratio', elasticity: -1.1 },
      { field: 'mission.segments[1].range', name: 'cruise range', elasticity: Number.NaN },
    ]);
    expect(rows.map((row) => row.field)).toEqual(['mission.liftToDrag', 'mission.energy.tsfc', 'mission.payload']);
    expect(rows.map((row) => row.text)).toEqual(['−1.10 %', '+0.90 %', '+0.42 %']);
  });
});

describe('why a mission gives no mass', () => {
  it('is the engine’s own words, whether the closure stopped the evaluation or a mission field is wrong', () => {
    const words = 'empty-mass fraction 0.62 plus fuel fraction 0.41 add to 1.03 and leave nothing for payload and crew';
    expect(missionProblem([{ path: '', message: `the diagram could not be drawn: mission: ${words}` }], [])).toBe(`mission: ${words}`);
    expect(missionProblem([{ path: 'mission.payload', message: 'must be at least 0 kg' }], [])).toBe('mission.payload must be at least 0 kg');
    expect(missionProblem([{ path: 'requirements[0].speed', message: 'is required' }], [])).toBeNull();
    expect(missionProblem([], [])).toBeNull();
    expect(missionProblem([], [{ code: 'mission-not-closed', field: 'mission', message: words, severity: 'error' }])).toBe(`The mission does not close: ${words}`);
    expect(missionProblem([], [{ code: 'field-ignored', field: 'mission.energy.propellerEfficiency', message: 'ignored' }])).toBeNull();
  });
});
