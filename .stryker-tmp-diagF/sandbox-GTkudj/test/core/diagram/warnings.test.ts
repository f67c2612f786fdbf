// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../../core/diagram';
import type { WarningJson } from '../../../core/evaluation';
import type { Design } from '../../../core/model';
import { DEMO_DESIGNS, TRAINER } from '../helpers/demo-designs';
import { aircraft, ceiling, climbGradient, cruise, design, landingRoll, stall, takeoffRoll } from '../helpers/design';

function fields(d: Design): string[] {
  return evaluateDesign(d).warnings.map((w) => w.field);
}

describe('evaluation warnings', () => {
  it('names the configuration field of an Oswald efficiency outside 0.7-0.95', () => {
    // Typical e 0.7-0.95 (core/methods.md section 9, common practice).
    const d = design({ aircraft: aircraft({ clean: { cd0: 0.03, oswaldEfficiency: 0.6, clMax: 1.5 } }), requirements: [cruise(50)], rangePa: [200, 1500] });
    expect(fields(d)).toContain('aircraft.aero.configurations.clean.oswaldEfficiency');
  });

  it('names the requirement index of a propeller efficiency outside its typical range', () => {
    // eta_p about 0.8 in cruise (core/methods.md section 9, common practice); index counts every requirement.
    const d = design({ requirements: [stall(25), takeoffRoll(300), cruise(50, { propellerEfficiency: 0.3 })], rangePa: [200, 1500] });
    expect(fields(d)).toContain('requirements[2].propellerEfficiency');
  });

  it('says why a climb gradient with every engine out cannot be met, and draws it all null', () => {
    const twin = aircraft({ kind: 'turbofan', engines: 2 });
    const d = design({ aircraft: twin, requirements: [stall(30), climbGradient(0.024, { enginesInoperative: 2 })], rangePa: [200, 3000] });
    const e = evaluateDesign(d);
    const warning = e.warnings.find((w) => w.code === 'no-engine-left') as WarningJson;
    expect(warning.field).toBe('requirements[1].enginesInoperative');
    const curve = e.boundaries[1];
    expect('points' in curve && curve.points.every(([, y]) => y === null)).toBe(true);
    expect(e.optimum).toBeNull();
  });

  it('points at the speed of a cruise below the stall speed everywhere on the plot', () => {
    const d = design({ requirements: [cruise(20)], rangePa: [500, 1500] });
    const warning = evaluateDesign(d).warnings.find((w) => w.code === 'requirement-unattainable') as WarningJson;
    expect(warning.field).toBe('requirements[0].speed');
  });

  it('points at the altitude when a piston engine has no power left there', () => {
    const d = design({ requirements: [ceiling(21000)], rangePa: [200, 1500] });
    const warning = evaluateDesign(d).warnings.find((w) => w.code === 'no-power-available') as WarningJson;
    expect(warning.field).toBe('requirements[0].altitude');
  });

  it('flags an optimum on the right edge of the plot', () => {
    const d = design({ requirements: [cruise(60)], rangePa: [200, 900] });
    const e = evaluateDesign(d);
    expect(e.optimum!.unbounded).toBe(true);
    expect(e.warnings.find((w) => w.code === 'optimum-at-edge')!.field).toBe('diagram.wingLoading');
  });

  it('passes the design warnings through first', () => {
    const passed: WarningJson = { code: 'configuration-default', field: 'requirements[0].configuration', message: 'Landing is not defined; clean is used.' };
    const d = { ...design({ requirements: [landingRoll(400)], rangePa: [200, 3000] }), warnings: [passed] } as Design;
    expect(evaluateDesign(d).warnings[0]).toEqual(passed);
  });

  it('warns about a configuration the aircraft does not define', () => {
    const d = design({ requirements: [cruise(50, { configuration: 'ferry' })], rangePa: [200, 1500] });
    expect(fields(d)).toContain('requirements[0].configuration');
  });

  it('gives every warning a code, a field and a message', () => {
    for (const d of DEMO_DESIGNS) {
      for (const w of evaluateDesign(d).warnings) {
        expect(w.code).toMatch(/^[a-z-]+$/);
        expect(typeof w.field).toBe('string');
        expect(w.message.length).toBeGreaterThan(10);
      }
    }
  });

  it('is quiet for a design whose assumptions are all typical', () => {
    expect(evaluateDesign(TRAINER).warnings).toEqual([]);
  });
});
