// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { chartData, upperEnvelope } from '../../app/chart/data';
import { KIND_COLOURS } from '../../app/chart/palette';
import { jetEvaluation, trainerEvaluation } from './fixture';

// NIST SP 811 (2008), Appendix B: 1 lbf/ft^2 = 47.88026 Pa; 1 hp (550 ft.lbf/s) = 745.6999 W; 1 lbf = 4.448222 N.
const PSF_PA = 47.880258980335843;
const WN_TO_HP_PER_LBF = 4.4482216152605 / 745.69987158227022; // 0.0059652, as in core/methods.md section 7

describe('chartData', () => {
  it('keeps SI numbers for the si system', () => {
    const data = chartData(trainerEvaluation(), { title: 'Trainer' });
    const cruise = data.curves.find((curve) => curve.id === 'cruise')!;
    const source = trainerEvaluation().boundaries.find((b) => b.id === 'cruise')!;
    expect(cruise.points).toEqual((source as { points: Array<[number, number]> }).points);
    expect(data.units).toEqual({ wingLoading: 'N/m²', loading: 'W/N' });
    expect(data.title).toBe('Trainer');
  });

  it('converts wing loading to lb/ft² and power-to-weight to hp/lb for the us system', () => {
    const si = chartData(trainerEvaluation());
    const us = chartData(trainerEvaluation(), { system: 'us' });
    expect(us.units).toEqual({ wingLoading: 'lb/ft²', loading: 'hp/lb' });
    expect(us.limits[0].wingLoading).toBeCloseTo(1108 / PSF_PA, 9);
    const [w, y] = us.curves[1].points[10] as [number, number];
    const [wSi, ySi] = si.curves[1].points[10] as [number, number];
    expect(w).toBeCloseTo(wSi / PSF_PA, 9);
    expect(y).toBeCloseTo(ySi * WN_TO_HP_PER_LBF, 9);
    // 20 psf is 957.6 Pa (NIST SP 811 factor above), a plain cross-check of the direction of the conversion.
    expect(us.wingLoadingRange[1]).toBeCloseTo(1500 / 47.88, 2);
  });

  it('leaves thrust-to-weight dimensionless in both systems', () => {
    const si = chartData(jetEvaluation());
    const us = chartData(jetEvaluation(), { system: 'us' });
    expect(us.units.loading).toBe('');
    expect(us.optimum!.loading).toBe(si.optimum!.loading);
  });

  it('keeps gaps in curves as null', () => {
    const data = chartData(jetEvaluation());
    const cruise = data.curves.find((curve) => curve.id === 'cruise')!;
    expect(cruise.points.some(([, y]) => y === null)).toBe(true);
    expect(cruise.points.filter(([, y]) => y === null).every(([w]) => w > 6200)).toBe(true);
  });

  it('splits limits from curves, keeps the concept order and marks what binds', () => {
    const data = chartData(trainerEvaluation());
    expect(data.limits.map((l) => l.id)).toEqual(['stall']);
    expect(data.curves.map((c) => c.id)).toEqual(['takeoff', 'cruise', 'climb']);
    expect(data.boundaries.map((b) => b.id)).toEqual(['stall', 'takeoff', 'cruise', 'climb']);
    expect(data.boundaries.filter((b) => b.binding).map((b) => b.id)).toEqual(['stall', 'cruise']);
  });

  it('labels a boundary with its label, else its id, and colours it by kind', () => {
    const data = chartData(trainerEvaluation());
    expect(data.boundaries.map((b) => b.label)).toEqual(['Stall 45 kt', 'takeoff', 'Cruise 110 kt at 6000 ft', 'climb']);
    expect(data.limits[0].colour).toBe(KIND_COLOURS.stall);
    expect(data.curves[1].colour).toBe(KIND_COLOURS.cruise);
  });

  it('gives a second boundary of the same kind a dash pattern', () => {
    const evaluation = trainerEvaluation();
    evaluation.boundaries.push({ id: 'cruise-high', kind: 'cruise', points: [[200, 5], [1500, 9]] });
    const data = chartData(evaluation);
    const dashes = data.curves.filter((c) => c.kind === 'cruise').map((c) => c.dash);
    expect(dashes[0]).toBe('');
    expect(dashes[1]).not.toBe('');
  });

  it('takes the wing-loading range from the samples and the tightest limit within it', () => {
    const data = chartData(trainerEvaluation());
    expect(data.wingLoadingRange).toEqual([200, 1500]);
    expect(data.wingLoadingLimit).toBe(1108);
  });

  it('does not mutate the evaluation it reads', () => {
    const evaluation = trainerEvaluation();
    const before = JSON.stringify(evaluation);
    chartData(evaluation, { system: 'us', overlays: [{ name: 'v1', evaluation: trainerEvaluation() }] });
    expect(JSON.stringify(evaluation)).toBe(before);
  });

  it('draws overlays on the same axis and drops those on the other axis', () => {
    const data = chartData(trainerEvaluation(), {
      overlays: [
        { name: 'Version 1', evaluation: trainerEvaluation() },
        { name: 'A jet', evaluation: jetEvaluation() },
      ],
    });
    expect(data.overlays[0].curves).toHaveLength(3);
    expect(data.overlays[1].curves).toHaveLength(0);
  });
});

describe('upperEnvelope', () => {
  it('is the largest required loading at each sample, null where any curve is null', () => {
    const data = chartData(trainerEvaluation());
    data.envelope.forEach(([w, y], i) => {
      const values = data.curves.map((curve) => curve.points[i][1] as number);
      expect(w).toBe(data.curves[0].points[i][0]);
      expect(y).toBe(Math.max(...values));
    });
    const gaps = upperEnvelope(chartData(jetEvaluation()).curves, [1000, 7000]);
    expect(gaps.filter(([, y]) => y === null).every(([w]) => w > 6200)).toBe(true);
  });
});
