/**
 * What each requirement costs, as the window's table
 * (app/renderer/lib/studies/cost-table.ts). Checks: installed power is
 * P/W x W at take-off weight, so its change is the loading change times the
 * weight (core/methods.md section 7; W = m g0, g0 = 9.80665 m/s^2 by definition,
 * CGPM 1901); 1 hp = 745.69987158227 W (NIST SP 811); relaxing a requirement
 * never needs more power at the optimum (a larger feasible set has a least
 * value no greater: common practice); a stall speed tightened by 50 % to
 * 22.5 kt caps the wing loading at w = 1/2 rho0 V^2 CLmax (Anderson,
 * Introduction to Flight; rho0 = 1.225 kg/m^3, U.S. Standard Atmosphere
 * 1976), below the 200 N/m^2 where the trainer's plotted range starts, so no
 * plotted point meets every requirement.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept, requirementCosts, type Design } from '../../core';
import { costTable, readStep } from '../../app/renderer/lib/studies/cost-table';

const G0 = 9.80665; // m/s^2, exact (CGPM 1901)
const HP_W = 745.69987158227; // W, NIST SP 811

function design(slug: string): Design {
  const parsed = parseConcept(DEMO_CONCEPTS.find((entry) => entry.slug === slug)!.concept);
  if (!parsed.ok) throw new Error(`demo ${slug} does not parse`);
  return parsed.design;
}

/** "+18.4 kW" -> 18.4 */
const numberOf = (text: string) => Number(text.replace('−', '-').replace(/,/g, '').replace(/[^\d.+-]/g, ''));

describe('costTable', () => {
  const trainer = design('trainer');
  const costs = requirementCosts(trainer, { step: 0.1 });

  it('has one row per enabled requirement, the largest effect first', () => {
    const rows = costTable(costs, 'si');
    expect(rows.map((row) => row.id).sort()).toEqual(trainer.requirements.filter((r) => r.enabled).map((r) => r.id).sort());
    for (let i = 1; i < rows.length; i++) expect(rows[i].effect).toBeLessThanOrEqual(rows[i - 1].effect);
    // The effect is the largest relative change of P/W, wing area or power, in either case.
    for (const row of rows) {
      const cost = costs.costs.find((entry) => entry.id === row.id)!;
      const relatives = [cost.relaxed, cost.tightened].flatMap((c) => [c.loadingChangeRelative, c.wingAreaChangeRelative]).map(Math.abs);
      expect(row.effect).toBeCloseTo(Math.max(...relatives), 12);
    }
  });

  it('gives the installed power change as the loading change times the take-off weight, in kW and in hp', () => {
    const weightN = trainer.aircraft.takeoffMassKg * G0;
    const rows = { si: costTable(costs, 'si'), us: costTable(costs, 'us') };
    for (const cost of costs.costs) {
      const change = cost.tightened.loadingChange * weightN;
      if (Math.abs(change) < 1) continue;
      const si = rows.si.find((row) => row.id === cost.id)!.tightened.installed;
      const us = rows.us.find((row) => row.id === cost.id)!.tightened.installed;
      expect(si.change.endsWith(' kW')).toBe(true);
      expect(numberOf(si.change)).toBeCloseTo(change / 1000, 1);
      expect(us.change.endsWith(' hp')).toBe(true);
      expect(Math.abs(numberOf(us.change) - change / HP_W)).toBeLessThanOrEqual(0.5);
      // Installed power scales with P/W at a fixed mass, so the relative changes agree.
      expect(si.relative).toBe(rows.si.find((row) => row.id === cost.id)!.tightened.loading.relative);
    }
  });

  it('never shows a relaxed requirement costing more power', () => {
    for (const row of costTable(costs, 'si')) {
      if (row.relaxed.feasible && row.relaxed.installed.change !== '0') expect(row.relaxed.installed.change.startsWith('−')).toBe(true);
    }
  });

  it('shows a dash, and marks the case, where no point meets every requirement after tightening', () => {
    const cap = 0.5 * 1.225 * (22.5 * 1852 / 3600) ** 2 * 2.05; // landing CLmax 2.05 of the trainer
    expect(cap).toBeLessThan(200);
    expect(trainer.diagram.wingLoadingRangePa?.[0]).toBe(200);
    const rows = costTable(requirementCosts(trainer, { step: 0.5 }), 'us');
    const stall = rows[0];
    expect(stall.id).toBe('stall');
    expect(stall.effect).toBe(Infinity);
    expect(stall.tightened).toEqual({
      value: '22.5 kt',
      feasible: false,
      loading: { change: '—', relative: '—' },
      wingArea: { change: '—', relative: '—' },
      installed: { change: '—', relative: '—' },
    });
    expect(JSON.stringify(rows)).not.toMatch(/NaN|undefined/);
  });

  it('says thrust for a jet, in kN and lbf', () => {
    const jet = design('business-jet');
    const rows = costTable(requirementCosts(jet, { step: 0.1 }), 'us');
    const moving = rows.find((row) => row.tightened.installed.change !== '0' && row.tightened.feasible)!;
    expect(moving.tightened.installed.change).toMatch(/ lbf$/);
    expect(costTable(requirementCosts(jet, { step: 0.1 }), 'si').find((row) => row.id === moving.id)!.tightened.installed.change).toMatch(/ kN$/);
  });
});

describe('readStep', () => {
  it.each([
    ['10', 0.1],
    ['10 %', 0.1],
    ['2.5%', 0.025],
    [' 50 ', 0.5],
  ])('reads "%s" as %s', (text, step) => {
    expect(readStep(text)).toEqual({ ok: true, step });
  });

  it.each([
    ['', /^Step: give a percentage/],
    ['ten', /^Step: "ten" is not a number/],
    ['0', /^Step: 0 % is outside the range/],
    ['100', /^Step: 100 % is outside the range/],
    ['-5', /^Step: -5 % is outside the range/],
  ])('names the field when "%s" cannot be used', (text, message) => {
    const read = readStep(text);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.message).toMatch(message);
  });
});
