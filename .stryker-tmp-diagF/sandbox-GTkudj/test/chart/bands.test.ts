/**
 * Boundary bands as plot series (app/chart/bands.ts). Reference values: the
 * stall identity w = 1/2 rho0 V^2 CLmax (Anderson, Introduction to Flight,
 * stalling speed), rho0 = 1.225 kg/m^3 (U.S. Standard Atmosphere 1976),
 * 1 kt = 1852/3600 m/s and 1 lbf/ft^2 = 47.880258980335843 Pa (NIST SP 811).
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { boundaryBands, type BoundaryBand } from '../../core';
import { bandHasWidth, bandSeries, type CurveBandSeries, type LimitBandSeries } from '../../app/chart/bands';
import { kindColour } from '../../app/chart/palette';
import { stallAndCruise, studied } from './study-fixture';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976
const KT = 1852 / 3600; // m/s per knot, NIST SP 811
const PSF = 47.880258980335843; // Pa per lbf/ft^2, NIST SP 811

function trainerBands(low: number, high: number) {
  const s = studied(stallAndCruise(low, high));
  const ws = [300, 500, 700, 900, 1100];
  return { s, bands: boundaryBands(s.design, s.parameters, ws) };
}

describe('bandSeries', () => {
  it('draws a stall band from 1/2 rho0 V^2 CLmax at the low CLmax to the same at the high one', () => {
    const { bands } = trainerBands(1.8, 2.3);
    const [stall] = bandSeries(bands, 'powerToWeight', 'si').filter((b): b is LimitBandSeries => b.type === 'limit');
    const q = 0.5 * RHO0 * (45 * KT) ** 2; // trainer stall requirement: 45 kt CAS
    expect(stall.id).toBe('stall');
    expect(stall.range[0]).toBeCloseTo(q * 1.8, 1);
    expect(stall.range[1]).toBeCloseTo(q * 2.3, 1);
    expect(stall.colour).toBe(kindColour('stall'));
    expect(stall.fields).toEqual(['aircraft.aero.configurations.landing.clMax']);
    expect(bandHasWidth(stall)).toBe(true);
  });

  it('converts to US customary units: Pa over 47.880 for lb/ft²', () => {
    const { bands } = trainerBands(1.8, 2.3);
    const si = bandSeries(bands, 'powerToWeight', 'si').find((b) => b.id === 'stall') as LimitBandSeries;
    const us = bandSeries(bands, 'powerToWeight', 'us').find((b) => b.id === 'stall') as LimitBandSeries;
    expect(us.range[0]).toBeCloseTo(si.range[0] / PSF, 9);
    expect(us.range[1]).toBeCloseTo(si.range[1] / PSF, 9);
  });

  it('gives a cruise band no width when no ranged assumption moves the cruise boundary', () => {
    const { bands } = trainerBands(1.8, 2.3);
    const cruise = bandSeries(bands, 'powerToWeight', 'si').find((b) => b.id === 'cruise') as CurveBandSeries;
    expect(cruise.type).toBe('curve');
    expect(cruise.fields).toEqual([]);
    expect(bandHasWidth(cruise)).toBe(false);
    for (const [, lower, upper] of cruise.points) expect(lower).toBe(upper);
  });

  it('keeps undefined ends as null (never NaN) and leaves out a band with nothing defined', () => {
    const bands: BoundaryBand[] = [
      { id: 'c', kind: 'cruise', fields: ['x'], method: 'corners', evaluated: 2, type: 'curve', wingLoadings: [100, 200, 300], nominal: [NaN, 5, 6], lower: [NaN, 4, 5], upper: [NaN, NaN, 7] },
      { id: 'gone', kind: 'cruise', fields: [], method: 'corners', evaluated: 1, type: 'curve', wingLoadings: [100, 200], nominal: [NaN, NaN], lower: [NaN, NaN], upper: [NaN, NaN] },
      { id: 'l', kind: 'stall', fields: [], method: 'corners', evaluated: 1, type: 'limit', nominal: NaN, limits: [NaN, NaN] },
    ];
    const series = bandSeries(bands, 'powerToWeight', 'si');
    expect(series.map((b) => b.id)).toEqual(['c']);
    expect((series[0] as CurveBandSeries).points).toEqual([
      [100, null, null],
      [200, 4, null],
      [300, 5, 7],
    ]);
    expect(bandHasWidth(series[0])).toBe(true);
  });
});
