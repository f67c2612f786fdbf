/**
 * Breguet range and endurance fractions against values worked by hand in
 * this file, and the battery energy of level flight and climb.
 */
import { describe, expect, it } from 'vitest';
import {
  batteryMassFraction,
  climbEnergyPerWeight,
  jetCruiseFraction,
  jetLoiterFraction,
  levelFlightEnergyPerWeight,
  propellerCruiseFraction,
  propellerLoiterFraction,
} from '../../../core/mission';
import { parseQuantity } from '../../../core/units/quantity';

const G0 = 9.80665; // standard gravity, exact (CGPM 1901)

describe('Breguet fractions (Raymer, Aircraft Design: A Conceptual Approach, section 3.4; from memory)', () => {
  it('jet cruise: 1500 nmi at 596 ft/s, c 0.5 1/h, L/D 13.9 gives 0.8583', () => {
    // Raymer's chapter 3 sizing example cruise leg (inputs from memory). Hand: R c / (V L/D) =
    // 2,778,000 m x (0.5/3600 1/s) / (181.661 m/s x 13.9) = 385.83 / 2525.09 = 0.152800; exp(-0.152800) = 0.858301.
    expect(jetCruiseFraction(1500 * 1852, 596 * 0.3048, 0.5 / 3600, 13.9)).toBeCloseTo(0.858301, 5);
  });

  it('jet loiter: 3 h at c 0.4 1/h and L/D 16 gives exp(-0.075) = 0.927743', () => {
    // Hand: E c / (L/D) = 3 h x 0.4 1/h / 16 = 0.075.
    expect(jetLoiterFraction(3 * 3600, 0.4 / 3600, 16)).toBeCloseTo(0.927743, 6);
  });

  it('propeller cruise: 800 km, 0.26 kg/kWh, eta_p 0.8, L/D 11 gives 0.937642', () => {
    // Hand: R BSFC g / (eta L/D) = 800,000 m x 7.2222e-8 kg/J x 9.80665 / (0.8 x 11) = 0.566607 / 8.8 = 0.0643872;
    // exp(-0.0643872) = 0.937642.
    expect(propellerCruiseFraction(800e3, 0.26 / 3.6e6, 0.8, 11)).toBeCloseTo(0.937642, 6);
  });

  it('propeller loiter: 45 min at 80 kt, 0.26 kg/kWh, eta_p 0.8, L/D 12 gives 0.991835', () => {
    // Hand: E V BSFC g / (eta L/D) = 2700 s x 41.1556 m/s x 7.2222e-8 kg/J x 9.80665 / 9.6 = 0.0081979; exp(-) = 0.991835.
    expect(propellerLoiterFraction(2700, 80 * (1852 / 3600), 0.26 / 3.6e6, 0.8, 12)).toBeCloseTo(0.991835, 6);
  });

  it('the propeller range the fraction implies is the Breguet range back again', () => {
    // R = (eta / (BSFC g)) (L/D) ln(1/f) for f from a 1234 km leg: the equation read the other way (hand algebra).
    const f = propellerCruiseFraction(1_234_000, 0.3 / 3.6e6, 0.82, 9.5);
    expect(((0.82 / ((0.3 / 3.6e6) * G0)) * 9.5 * Math.log(1 / f)) / 1000).toBeCloseTo(1234, 6);
  });

  it('0.5 lb/(hp h) is 0.3041 kg/kWh (NIST SP 811 factors: 0.45359237 kg/lb, 745.700 W/hp)', () => {
    const parsed = parseQuantity('0.5 lb/(hp h)', 'brakeSpecificFuelConsumption');
    expect(parsed.ok && parsed.value * 3.6e6).toBeCloseTo(0.304141, 5);
  });

  it('TSFC in lb/(lbf h) is per hour, and 20 mg/(N s) is 0.7061 1/h (times g0, a mass flow per force)', () => {
    const perHour = parseQuantity('0.7 lb/(lbf h)', 'thrustSpecificFuelConsumption');
    expect(perHour.ok && perHour.value * 3600).toBeCloseTo(0.7, 12);
    const si = parseQuantity('20 mg/(N s)', 'thrustSpecificFuelConsumption');
    // Hand: 20e-6 kg/(N s) x 9.80665 N/kg x 3600 s/h = 0.706079 1/h.
    expect(si.ok && si.value * 3600).toBeCloseTo(0.706079, 6);
  });
});

describe('battery energy (work = force x distance, divided by the drive efficiency; common practice)', () => {
  it('level flight: 60 km at L/D 15 through 0.8 takes 5000 J per newton of take-off weight', () => {
    expect(levelFlightEnergyPerWeight(60_000, 15, 0.8)).toBeCloseTo(5000, 9);
  });

  it('a 500 m climb through 0.8 takes 625 J/N, and a descent nothing', () => {
    expect(climbEnergyPerWeight(500, 0.8)).toBeCloseTo(625, 9);
    expect(climbEnergyPerWeight(-300, 0.8)).toBe(0);
  });

  it('5000 J/N on a 200 Wh/kg pack with 80 % usable is 8.51 % of the take-off mass', () => {
    // Hand: 5000 x 9.80665 / (720,000 J/kg x 0.8) = 49,033.25 / 576,000 = 0.0851272.
    expect(batteryMassFraction(5000, G0, 200 * 3600, 0.8)).toBeCloseTo(0.0851272, 6);
  });
});
