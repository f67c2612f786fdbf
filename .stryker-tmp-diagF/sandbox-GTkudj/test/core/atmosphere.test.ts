// @ts-nocheck
import { describe, expect, it } from 'vitest';
import {
  A0,
  RHO0,
  atmosphere,
  calibratedAirspeed,
  densityAltitude,
  equivalentAirspeed,
  geometricAltitude,
  geopotentialAltitude,
  isaDensity,
  isaPressure,
  isaTemperature,
  trueAirspeed,
  trueFromCalibrated,
} from '../../core/atmosphere';

const FT = 0.3048; // NIST SP 811, exact
const relative = (a: number, b: number) => Math.abs(a / b - 1);

describe('U.S. Standard Atmosphere 1976', () => {
  it('has the published sea-level values', () => {
    // USSA 1976 Table 1 (also core/methods.md section 1): rho0 = 1.2250 kg/m^3, a0 = 340.294 m/s.
    expect(RHO0).toBeCloseTo(1.225, 4);
    expect(A0).toBeCloseTo(340.294, 3);
    expect(isaTemperature(0)).toBe(288.15);
    expect(isaPressure(0)).toBe(101325);
  });

  it('chains the published layer base pressures from sea level', () => {
    // USSA 1976 Table 4 (also core/methods.md section 1), printed to 6 significant figures.
    const bases: Array<[number, number, number]> = [
      [11000, 216.65, 22632.1],
      [20000, 216.65, 5474.89],
      [32000, 228.65, 868.019],
      [47000, 270.65, 110.906],
    ];
    for (const [h, t, p] of bases) {
      expect(isaTemperature(h)).toBeCloseTo(t, 9);
      expect(relative(isaPressure(h), p)).toBeLessThan(1e-5);
    }
  });

  // USSA 1976 tables are printed against geometric altitude Z; the model takes
  // geopotential H, so each row goes through geopotentialAltitude first. Values
  // from the published tables, from memory (T to 0.001 K, p and rho to 5
  // figures); compared to one unit in the fifth figure.
  const TABLE: Array<[zM: number, tK: number, pPa: number, rho: number]> = [
    [0, 288.15, 101325, 1.225],
    [1000, 281.651, 89876, 1.1117],
    [2000, 275.154, 79501, 1.0066],
    [5000, 255.676, 54048, 0.73643],
    [10000, 223.252, 26500, 0.41351],
    [11000, 216.774, 22700, 0.3648],
    [15000, 216.65, 12111, 0.19476],
    [20000, 216.65, 5529.3, 0.08891],
    [25000, 221.552, 2549.2, 0.040084],
    [32000, 228.49, 889.06, 0.013555],
  ];
  it.each(TABLE)('matches the table at %i m geometric', (z, t, p, rho) => {
    const air = atmosphere(geopotentialAltitude(z));
    expect(air.temperatureK).toBeCloseTo(t, 2);
    expect(relative(air.pressurePa, p)).toBeLessThan(1e-4);
    expect(relative(air.densityKgM3, rho)).toBeLessThan(1e-4);
    expect(air.sigma).toBeCloseTo(air.densityKgM3 / 1.225, 4);
  });

  it('matches the ICAO table by geopotential altitude at 1000 m', () => {
    // ICAO Doc 7488 standard atmosphere at H = 1000 m: 898.746 hPa, 1.11164 kg/m^3 (from memory).
    expect(isaPressure(1000)).toBeCloseTo(89874.6, 0);
    expect(isaDensity(1000)).toBeCloseTo(1.11164, 5);
  });

  it('converts geometric and geopotential altitude both ways', () => {
    // H = r0 Z / (r0 + Z), r0 = 6356766 m (USSA 1976 eq. 18); the tables list
    // H = 10981 m at Z = 11 km and H = 19937 m at Z = 20 km (from memory).
    expect(geopotentialAltitude(11000)).toBeCloseTo(10981, 0);
    expect(geopotentialAltitude(20000)).toBeCloseTo(19937, 0);
    expect(geopotentialAltitude(0)).toBe(0);
    for (const z of [-500, 0, 1234.5, 11000, 32000, 50000]) {
      expect(geometricAltitude(geopotentialAltitude(z))).toBeCloseTo(z, 6);
    }
    // Geopotential is always a little lower than geometric above sea level.
    expect(geopotentialAltitude(10000)).toBeLessThan(10000);
  });
});

describe('ISA temperature offset', () => {
  it('keeps pressure and scales density by T_std / T (core/methods.md section 1, common practice)', () => {
    for (const h of [0, 2200, 6000, 12000]) {
      for (const dT of [-30, 15, 25]) {
        const hot = atmosphere(h, dT);
        const std = atmosphere(h);
        expect(hot.pressurePa).toBe(std.pressurePa);
        expect(hot.temperatureK).toBeCloseTo(std.temperatureK + dT, 9);
        expect(hot.densityKgM3 / std.densityKgM3).toBeCloseTo(std.temperatureK / (std.temperatureK + dT), 12);
        expect(isaDensity(h, dT)).toBeCloseTo(hot.densityKgM3, 12);
      }
    }
  });

  it('raises density altitude by about 120 ft per degC (pilots\' rule of thumb, common practice)', () => {
    // 5000 ft pressure altitude on an ISA+20 day: about 5000 + 20 x 120 = 7400 ft.
    const da = densityAltitude(isaDensity(5000 * FT, 20)) / FT;
    expect(Math.abs(da - 7400)).toBeLessThan(0.025 * 7400);
    expect(da).toBeGreaterThan(5000);
  });
});

describe('density altitude', () => {
  it('is the altitude of the same standard-day density, below and above 11 km', () => {
    for (const h of [-300, 0, 1500, 4000, 10999, 11000, 15000, 25000, 40000]) {
      expect(densityAltitude(isaDensity(h))).toBeCloseTo(h, 2);
    }
  });

  it('of sea-level density is sea level', () => {
    expect(densityAltitude(RHO0)).toBeCloseTo(0, 6);
  });
});

describe('airspeeds', () => {
  it('EAS and TAS are related by the square root of sigma, both ways', () => {
    const sigma = atmosphere(3000).sigma;
    expect(equivalentAirspeed(100, sigma)).toBeCloseTo(100 * Math.sqrt(sigma), 12);
    expect(trueAirspeed(equivalentAirspeed(100, sigma), sigma)).toBeCloseTo(100, 12);
  });

  it('CAS equals TAS at sea level on a standard day (definition of calibrated airspeed)', () => {
    for (const v of [20, 60, 150, 300]) {
      expect(calibratedAirspeed(v, 0)).toBeCloseTo(v, 9);
      expect(trueFromCalibrated(v, 0)).toBeCloseTo(v, 9);
    }
  });

  it('CAS and TAS round-trip at altitude and on hot days', () => {
    for (const h of [0, 2200, 6000, 11000]) {
      for (const dT of [0, 25]) {
        for (const cas of [23, 60, 120, 200]) {
          expect(calibratedAirspeed(trueFromCalibrated(cas, h, dT), h, dT)).toBeCloseTo(cas, 8);
        }
      }
    }
  });

  it('CAS exceeds EAS by the compressibility correction (1 - delta) M^2 / 8', () => {
    // Series expansion of the subsonic pitot formula (Anderson, Introduction to
    // Flight, compressible airspeed measurement; from memory): V_C / V_E = 1 + (1 - p/p0) M^2 / 8.
    const mach = 0.2;
    for (const h of [2000, 5000, 10000]) {
      const air = atmosphere(h);
      const tas = mach * air.speedOfSoundMps;
      const excess = calibratedAirspeed(tas, h) / equivalentAirspeed(tas, air.sigma) - 1;
      const series = ((1 - air.pressurePa / 101325) * mach * mach) / 8;
      expect(relative(excess, series)).toBeLessThan(0.05);
    }
  });

  it('CAS and EAS agree to 0.1 % at stall speeds below 3000 m (M at most 0.15)', () => {
    // The approximation V_E = V_C for stall limits, core/methods.md section 2.
    for (const h of [0, 1000, 2200, 3000]) {
      const air = atmosphere(h, 25);
      const tas = 0.15 * air.speedOfSoundMps;
      expect(relative(calibratedAirspeed(tas, h, 25), equivalentAirspeed(tas, air.sigma))).toBeLessThan(1e-3);
    }
  });
});
