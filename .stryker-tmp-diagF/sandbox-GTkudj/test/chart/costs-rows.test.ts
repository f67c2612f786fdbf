/**
 * What each requirement costs, as rows of display text
 * (app/chart/costs-rows.ts). Checks: a 10 % step of a 45 kt stall speed is
 * 49.5 kt relaxed and 40.5 kt tightened (arithmetic); relaxing a requirement
 * never needs more power at the optimum (a larger feasible set has a least
 * value no greater: common practice); the numbers are core's, in display
 * units (1 m^2 = 10.763910 ft^2, NIST SP 811).
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { requirementCosts } from '../../core';
import { costRows, steppedValueText } from '../../app/chart/costs-rows';
import { demoConcept, studied } from './study-fixture';

const FT2_PER_M2 = 1 / (0.3048 * 0.3048); // NIST SP 811: 1 ft = 0.3048 m exactly

describe('costRows', () => {
  const trainer = studied(demoConcept('trainer'));
  const costs = requirementCosts(trainer.design, { step: 0.1 });

  it('has one row per enabled requirement with the stepped values in display units', () => {
    const rows = costRows(costs, 'us');
    expect(rows.map((row) => row.id)).toEqual(trainer.design.requirements.filter((r) => r.enabled).map((r) => r.id));
    const stall = rows.find((row) => row.id === 'stall')!;
    expect(stall.stepped).toBe('speed 45.0 kt');
    expect(stall.relaxed.value).toBe('49.5 kt');
    expect(stall.tightened.value).toBe('40.5 kt');
    expect(stall.relaxedDirection).toBe('up');
    const cruise = rows.find((row) => row.id === 'cruise')!;
    expect(cruise.relaxed.value).toBe('99.0 kt');
    expect(cruise.relaxedDirection).toBe('down');
  });

  it('gives the installed power change in kW, in step with the power-to-weight change at a fixed mass', () => {
    // P = (P/W) W at take-off weight (common practice), so at one mass both change by the same fraction.
    const stall = costRows(costs, 'si').find((row) => row.id === 'stall')!;
    const relative = (text: string) => Number(/\(([+−-][\d.]+) %\)$/.exec(text)![1].replace('−', '-'));
    expect(stall.tightened.installed).toMatch(/^\+[\d.]+ kW \(\+[\d.]+ %\)$/);
    expect(relative(stall.tightened.installed)).toBeCloseTo(relative(stall.tightened.loading), 1);
    expect(relative(stall.relaxed.installed)).toBeCloseTo(relative(stall.relaxed.loading), 1);
    const jet = studied(demoConcept('business-jet'));
    const jetRows = costRows(requirementCosts(jet.design, { step: 0.1 }), 'si');
    expect(jetRows.find((row) => row.relaxed.feasible)!.relaxed.installed).toMatch(/kN|±0/);
  });

  it('never shows a relaxed requirement costing more power at the optimum', () => {
    for (const cost of costs.costs) {
      if (cost.relaxed.optimum) expect(cost.relaxed.loadingChange).toBeLessThanOrEqual(1e-9);
    }
    const stall = costRows(costs, 'si').find((row) => row.id === 'stall')!;
    expect(stall.relaxed.loading).toMatch(/^−[\d.]+ W\/N \(−[\d.]+ %\)$/);
    expect(stall.tightened.loading).toMatch(/^\+[\d.]+ W\/N \(\+[\d.]+ %\)$/);
  });

  it('writes wing-area changes with their unit, in ft² for US units', () => {
    const entry = costs.costs.find((c) => c.id === 'stall')!.tightened;
    const us = costRows(costs, 'us').find((row) => row.id === 'stall')!;
    const expected = (entry.wingAreaChangeM2 * FT2_PER_M2).toFixed(1);
    expect(us.tightened.wingArea.startsWith(`+${expected} ft² (`)).toBe(true);
  });

  it('formats gradients in per cent and load factors plainly, never NaN', () => {
    expect(steppedValueText('gradient', 0.0913, 'si')).toBe('9.13 %');
    expect(steppedValueText('loadFactor', 2, 'si')).toBe('n 2.00');
    expect(steppedValueText('speedMps', NaN, 'si')).toBe('—');
  });

  it('marks a case with no feasible point instead of printing numbers', () => {
    const tight = requirementCosts(trainer.design, { step: 0.9 });
    const rows = costRows(tight, 'si');
    const infeasible = rows.flatMap((row) => [row.relaxed, row.tightened]).filter((c) => !c.feasible);
    expect(infeasible.length).toBeGreaterThan(0);
    for (const c of infeasible) expect(c.loading).toBe('nothing feasible');
    expect(JSON.stringify(rows)).not.toMatch(/NaN|undefined|Infinity/);
  });
});
