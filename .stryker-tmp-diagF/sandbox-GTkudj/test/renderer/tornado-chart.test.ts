/**
 * The window's tornado chart (app/renderer/lib/studies/tornado-chart.ts) and
 * the ranges it says it used (ranges.ts). Physical checks: a higher landing
 * CLmax raises a stall-limited wing loading (w = 1/2 rho0 V^2 CLmax,
 * Anderson, Introduction to Flight); more parasite drag needs more power at
 * the optimum (drag polar in the master equation, Mattingly, Aircraft Engine
 * Design). Unit factors from NIST SP 811: 1 lbf/ft^2 = 47.880258980335843 Pa,
 * 1 hp = 745.69987158227 W, 1 lbf = 4.4482216152605 N.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept, tornado, type Design, type Tornado } from '../../core';
import { studyRanges } from '../../app/renderer/lib/studies/ranges';
import { tornadoChart } from '../../app/renderer/lib/studies/tornado-chart';

const PSF_PA = 47.880258980335843; // NIST SP 811
const HP_PER_LB_IN_W_PER_N = 745.69987158227 / 4.4482216152605; // NIST SP 811

function demo(slug: string): { document: Record<string, unknown>; design: Design } {
  const document = structuredClone(DEMO_CONCEPTS.find((entry) => entry.slug === slug)!.concept) as unknown as Record<string, unknown>;
  const parsed = parseConcept(document);
  if (!parsed.ok) throw new Error(`demo ${slug} does not parse`);
  return { document, design: parsed.design };
}

function studied(slug: string): { moved: Tornado; design: Design; document: Record<string, unknown> } {
  const { document, design } = demo(slug);
  const ranges = studyRanges(document, design);
  if (!ranges.ok) throw new Error(ranges.message);
  return { moved: tornado(design, ranges.parameters), design, document };
}

/** "−148 N/m²" -> -148 */
const numberOf = (text: string) => Number(text.replace('−', '-').replace(/,/g, '').replace(/[^\d.+-]/g, ''));

describe('studyRanges', () => {
  it('uses the typical ranges, each with its published source, when the concept gives none', () => {
    const { document, design } = demo('trainer');
    const ranges = studyRanges(document, design);
    expect(ranges.ok).toBe(true);
    if (!ranges.ok) return;
    expect(ranges.whose).toBe('typical');
    expect(ranges.ranges.length).toBeGreaterThan(5);
    for (const range of ranges.ranges) {
      expect(range.source, range.field).toMatch(/methods reference, section \d/);
      expect(range.low).toBeLessThanOrEqual(range.nominal);
      expect(range.nominal).toBeLessThanOrEqual(range.high);
    }
  });

  it("uses the concept's own ranges when its uncertainty block ranges something, and names no source", () => {
    const { document, design } = demo('trainer');
    document.uncertainty = { parameters: [{ field: 'aircraft.aero.aspectRatio', low: 7, high: 8 }] };
    const ranges = studyRanges(document, design);
    expect(ranges).toMatchObject({ ok: true, whose: 'concept' });
    if (!ranges.ok) return;
    expect(ranges.ranges).toEqual([{ field: 'aircraft.aero.aspectRatio', label: 'Aspect ratio', low: 7, nominal: 7.4, high: 8 }]);
  });

  it('names the field of a range that cannot be used', () => {
    const { document, design } = demo('trainer');
    document.uncertainty = { parameters: [{ field: 'aircraft.aero.aspectRatio', low: 8, high: 9 }] };
    const ranges = studyRanges(document, design);
    expect(ranges.ok).toBe(false);
    if (ranges.ok) return;
    expect(ranges.path).toBe('uncertainty.parameters[0].low');
  });
});

describe('tornadoChart', () => {
  const trainer = studied('trainer');

  it('puts the largest swing of the chosen quantity first', () => {
    for (const measure of ['wingLoading', 'loading'] as const) {
      const chart = tornadoChart(trainer.moved, measure, 'si');
      expect(chart.rows.length).toBeGreaterThan(1);
      const swings = chart.rows.map((row) => row.swing);
      for (let i = 1; i < swings.length; i++) expect(swings[i], `${measure} row ${i}`).toBeLessThanOrEqual(swings[i - 1]);
      // The swing is |relative change at the high end - at the low end| of that quantity, from the core's ends.
      for (const row of chart.rows) {
        const bar = trainer.moved.bars.find((entry) => entry.field === row.field)!;
        const key = measure === 'wingLoading' ? 'wingLoadingChangeRelative' : 'loadingChangeRelative';
        expect(row.swing).toBeCloseTo(Math.abs(bar.high[key] - bar.low[key]), 12);
      }
    }
  });

  it('moves a stall-limited optimum wing loading up with a higher landing CLmax', () => {
    const chart = tornadoChart(trainer.moved, 'wingLoading', 'si');
    const clMax = chart.rows.find((row) => row.field === 'aircraft.aero.configurations.landing.clMax')!;
    expect(clMax.low.change).toBeLessThan(0);
    expect(clMax.high.change).toBeGreaterThan(0);
    expect(clMax.low.changeText).toMatch(/^−\d+ N\/m²$/);
    expect(clMax.high.changeText).toMatch(/^\+\d+ N\/m²$/);
  });

  it('needs more power at the optimum with more parasite drag', () => {
    const chart = tornadoChart(trainer.moved, 'loading', 'si');
    const cd0 = chart.rows.find((row) => row.field === 'aircraft.aero.configurations.clean.cd0')!;
    expect(cd0.low.change).toBeLessThan(0);
    expect(cd0.high.change).toBeGreaterThan(0);
    expect(cd0.high.changeText).toMatch(/^\+\d+\.\d\d W\/N$/);
  });

  it('gives the same changes in US customary units, converted with the NIST SP 811 factors', () => {
    for (const [measure, factor, unit] of [
      ['wingLoading', 1 / PSF_PA, 'lb/ft²'],
      ['loading', 1 / HP_PER_LB_IN_W_PER_N, 'hp/lb'],
    ] as const) {
      const si = tornadoChart(trainer.moved, measure, 'si');
      const us = tornadoChart(trainer.moved, measure, 'us');
      expect(us.unit).toBe(unit);
      expect(us.rows.map((row) => row.field)).toEqual(si.rows.map((row) => row.field));
      si.rows.forEach((row, i) => {
        expect(us.rows[i].high.change).toBeCloseTo(row.high.change * factor, 9);
        if (us.rows[i].high.changeText !== '0') expect(us.rows[i].high.changeText).toContain(unit);
      });
      const nominal = measure === 'wingLoading' ? trainer.moved.nominal!.wingLoadingPa : trainer.moved.nominal!.loading;
      expect(numberOf(us.nominalText)).toBeCloseTo(nominal * factor, measure === 'wingLoading' ? 1 : 4);
    }
  });

  it('shows the optimum at each end and the difference between the ends', () => {
    const chart = tornadoChart(trainer.moved, 'wingLoading', 'si');
    const row = chart.rows[0];
    const bar = trainer.moved.bars.find((entry) => entry.field === row.field)!;
    expect(numberOf(row.low.optimumText)).toBeCloseTo(bar.low.optimum!.wingLoadingPa, 0);
    expect(numberOf(row.high.optimumText)).toBeCloseTo(bar.high.optimum!.wingLoadingPa, 0);
    expect(numberOf(row.swingText)).toBeCloseTo(bar.high.wingLoadingChangePa - bar.low.wingLoadingChangePa, 0);
  });

  it('lists apart the assumptions that do not move the quantity, and draws only the others', () => {
    const chart = tornadoChart(trainer.moved, 'wingLoading', 'si');
    expect(chart.rows.length + chart.quiet.length).toBe(trainer.moved.bars.length);
    for (const row of chart.rows) expect([row.low.changeText, row.high.changeText]).not.toEqual(['0', '0']);
    expect(chart.extent).toBeGreaterThan(0);
  });

  it('marks an end with nothing feasible, sorts it first, and never writes NaN', () => {
    const bar = trainer.moved.bars[0];
    const broken: Tornado = {
      ...trainer.moved,
      bars: [
        ...trainer.moved.bars.slice(1),
        {
          ...bar,
          high: { ...bar.high, optimum: null, wingLoadingChangePa: NaN, loadingChange: NaN, wingLoadingChangeRelative: NaN, loadingChangeRelative: NaN },
          wingLoadingSwing: Infinity,
          loadingSwing: Infinity,
          swing: Infinity,
        },
      ],
    };
    const chart = tornadoChart(broken, 'loading', 'us');
    expect(chart.rows[0].field).toBe(bar.field);
    expect(chart.rows[0].high).toMatchObject({ feasible: false, changeText: 'nothing feasible', optimumText: '—' });
    expect(chart.rows[0].swingText).toBe('—');
    expect(JSON.stringify(chart)).not.toMatch(/NaN|Infinity"/);
  });

  it('says thrust-to-weight, without a unit, for a jet', () => {
    const jet = studied('business-jet');
    const chart = tornadoChart(jet.moved, 'loading', 'us');
    expect(chart.title).toBe('Optimum thrust-to-weight');
    expect(chart.unit).toBe('');
    expect(chart.rows[0].low.changeText).toMatch(/^[+−]\d\.\d{3}$|^0$/);
  });
});
