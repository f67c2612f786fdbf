/**
 * U.S. Standard Atmosphere 1976 (identical to ICAO ISA up to 32 km), with an
 * ISA temperature offset that keeps pressure and changes density.
 * Altitude is geopotential (pressure) altitude in metres.
 */
// @ts-nocheck

import { G0 } from './units/factors';

/** Specific gas constant of air, J/(kg K) (USSA 1976). */
export const R_AIR = 287.05287;
const GAMMA = 1.4;
export const T0 = 288.15;
export const P0 = 101325;
export const RHO0 = P0 / (R_AIR * T0); // 1.2250 kg/m^3
export const A0 = Math.sqrt(GAMMA * R_AIR * T0); // 340.294 m/s
/** Effective Earth radius for geopotential altitude (USSA 1976), m. */
const EARTH_RADIUS_M = 6356766;

interface Layer {
  baseM: number;
  baseK: number;
  lapseKPerM: number;
  basePa: number;
}

// USSA 1976 Table 4 layer bases and lapse rates; base pressures chained from
// sea level rather than hard-coded.
const LAYERS: Layer[] = (() => {
  const spec: Array<[number, number]> = [
    [0, -0.0065],
    [11000, 0],
    [20000, 0.001],
    [32000, 0.0028],
    [47000, 0],
  ];
  const layers: Layer[] = [];
  let baseK = T0;
  let basePa = P0;
  for (let i = 0; i < spec.length; i++) {
    const [baseM, lapseKPerM] = spec[i];
    layers.push({ baseM, baseK, lapseKPerM, basePa });
    if (i + 1 < spec.length) {
      const top = spec[i + 1][0];
      const topK = baseK + lapseKPerM * (top - baseM);
      basePa = layerPressure(basePa, baseK, lapseKPerM, top - baseM);
      baseK = topK;
    }
  }
  return layers;
})();

/** Highest altitude the model covers [m]. */
const ATMOSPHERE_TOP_M = 51000;

function layerPressure(basePa: number, baseK: number, lapse: number, dh: number): number {
  if (lapse === 0) return basePa * Math.exp((-G0 * dh) / (R_AIR * baseK));
  return basePa * Math.pow((baseK + lapse * dh) / baseK, -G0 / (R_AIR * lapse));
}

function layerAt(altitudeM: number): Layer {
  let layer = LAYERS[0];
  for (const candidate of LAYERS) if (altitudeM >= candidate.baseM) layer = candidate;
  return layer;
}

export interface AtmosphereState {
  temperatureK: number;
  pressurePa: number;
  densityKgM3: number;
  speedOfSoundMps: number;
  /** Density ratio rho / rho0. */
  sigma: number;
}

/** Standard-day temperature at a geopotential altitude [K]. */
export function isaTemperature(altitudeM: number): number {
  const layer = layerAt(altitudeM);
  return layer.baseK + layer.lapseKPerM * (altitudeM - layer.baseM);
}

/** Pressure at a geopotential altitude [Pa]; unchanged by a temperature offset. */
export function isaPressure(altitudeM: number): number {
  const layer = layerAt(altitudeM);
  return layerPressure(layer.basePa, layer.baseK, layer.lapseKPerM, altitudeM - layer.baseM);
}

/** The state of the air at a pressure altitude on a day offset from ISA by dT. */
export function atmosphere(altitudeM: number, temperatureOffsetK = 0): AtmosphereState {
  const temperatureK = isaTemperature(altitudeM) + temperatureOffsetK;
  const pressurePa = isaPressure(altitudeM);
  const densityKgM3 = pressurePa / (R_AIR * temperatureK);
  return {
    temperatureK,
    pressurePa,
    densityKgM3,
    speedOfSoundMps: Math.sqrt(GAMMA * R_AIR * temperatureK),
    sigma: densityKgM3 / RHO0,
  };
}

/** Density [kg/m^3] at a pressure altitude and ISA offset. */
export function isaDensity(altitudeM: number, temperatureOffsetK = 0): number {
  return isaPressure(altitudeM) / (R_AIR * (isaTemperature(altitudeM) + temperatureOffsetK));
}

/** Geopotential altitude from geometric height (USSA 1976 eq. 18). */
export function geopotentialAltitude(geometricM: number): number {
  return (EARTH_RADIUS_M * geometricM) / (EARTH_RADIUS_M + geometricM);
}

/** Geometric height from geopotential altitude. */
export function geometricAltitude(geopotentialM: number): number {
  return (EARTH_RADIUS_M * geopotentialM) / (EARTH_RADIUS_M - geopotentialM);
}

/** The standard-atmosphere altitude with this density [m]. */
export function densityAltitude(densityKgM3: number): number {
  const sigma = densityKgM3 / RHO0;
  // Troposphere closed form: sigma = (T/T0)^(g0/(R L) - 1).
  const exponent = G0 / (R_AIR * 0.0065) - 1;
  const troposphere = (T0 / 0.0065) * (1 - Math.pow(sigma, 1 / exponent));
  if (troposphere <= 11000) return troposphere;
  let lo = 11000;
  let hi = ATMOSPHERE_TOP_M;
  for (let i = 0; i < 80; i++) {
    const mid = (lo + hi) / 2;
    if (isaDensity(mid) > densityKgM3) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** Equivalent airspeed from true airspeed at density ratio sigma. */
export function equivalentAirspeed(trueMps: number, sigma: number): number {
  return trueMps * Math.sqrt(sigma);
}

/** True airspeed from equivalent airspeed at density ratio sigma. */
export function trueAirspeed(equivalentMps: number, sigma: number): number {
  return equivalentMps / Math.sqrt(sigma);
}

/**
 * Calibrated airspeed from true airspeed, subsonic compressible pitot relation
 * (Anderson, Introduction to Flight, isentropic impact pressure).
 */
export function calibratedAirspeed(trueMps: number, altitudeM: number, temperatureOffsetK = 0): number {
  const air = atmosphere(altitudeM, temperatureOffsetK);
  const mach = trueMps / air.speedOfSoundMps;
  const impactPa = air.pressurePa * (Math.pow(1 + 0.2 * mach * mach, 3.5) - 1);
  return A0 * Math.sqrt(5 * (Math.pow(impactPa / P0 + 1, 2 / 7) - 1));
}

/** True airspeed from calibrated airspeed: the same steps backwards. */
export function trueFromCalibrated(calibratedMps: number, altitudeM: number, temperatureOffsetK = 0): number {
  const air = atmosphere(altitudeM, temperatureOffsetK);
  const ratio = calibratedMps / A0;
  const impactPa = P0 * (Math.pow(1 + 0.2 * ratio * ratio, 3.5) - 1);
  const mach = Math.sqrt(5 * (Math.pow(impactPa / air.pressurePa + 1, 2 / 7) - 1));
  return mach * air.speedOfSoundMps;
}
