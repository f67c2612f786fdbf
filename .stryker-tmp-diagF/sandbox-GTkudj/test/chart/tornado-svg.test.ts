// @ts-nocheck
// @vitest-environment jsdom
/**
 * The tornado chart (app/chart/tornado-svg.ts). Physical checks: more
 * parasite drag needs more power at the optimum (drag polar C_D = C_D0 +
 * K C_L^2 in the master equation, Mattingly, Aircraft Engine Design), and a
 * higher landing CLmax raises a stall-limited wing loading (w = 1/2 rho0 V^2
 * CLmax, Anderson, Introduction to Flight). Unit factor: 1 lbf/ft^2 =
 * 47.880258980335843 Pa (NIST SP 811).
 */
import { describe, expect, it } from 'vitest';
import { tornado, toDisplay } from '../../core';
import { SIZING_CAUTION } from '../../app/chart/caution';
import { signedChange } from '../../app/chart/change-text';
import { tornadoData } from '../../app/chart/tornado-data';
import { tornadoSvg } from '../../app/chart/tornado-svg';
import { studied, withTypicalRanges } from './study-fixture';

const PSF = 47.880258980335843; // Pa per lbf/ft^2, NIST SP 811

function parse(svg: string): Document {
  const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
  expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
  return doc;
}

const trainer = studied(withTypicalRanges('trainer'));
const moved = tornado(trainer.design, trainer.parameters);

describe('tornadoSvg', () => {
  it('has one row per ranged assumption, in the core order, largest swing first', () => {
    const doc = parse(tornadoSvg(moved, { title: 'Trainer' }));
    const rows = [...doc.querySelectorAll('g.tornado-row')];
    const fields = rows.map((row) => row.getAttribute('data-field'));
    expect(fields).toEqual(moved.bars.map((bar) => bar.field));
    expect([...fields].sort()).toEqual(trainer.parameters.map((p) => p.field).sort());
    const swings = rows.map((row) => Number(row.getAttribute('data-swing')));
    for (let i = 1; i < swings.length; i++) expect(swings[i]).toBeLessThanOrEqual(swings[i - 1]);
    expect(swings[0]).toBeGreaterThan(0);
  });

  it('writes each end’s change at the end of its bar, in display units', () => {
    const doc = parse(tornadoSvg(moved));
    const top = moved.bars[0];
    const row = doc.querySelector(`g.tornado-row[data-field="${top.field}"]`)!;
    const values = [...row.querySelectorAll('text.bar-value')].map((t) => t.textContent);
    expect(values).toContain(signedChange(top.low.wingLoadingChangePa, 'wingLoading', 'si'));
    expect(values).toContain(signedChange(top.high.loadingChange, 'powerToWeight', 'si'));
    expect(row.querySelectorAll('rect.bar').length).toBeGreaterThanOrEqual(2);
  });

  it('shows more CD0 needing more power and a higher landing CLmax allowing a higher wing loading', () => {
    const data = tornadoData(moved, 'si');
    const cd0 = data.rows.find((row) => row.field === 'aircraft.aero.configurations.clean.cd0')!;
    expect(cd0.high.loading).toBeGreaterThan(0);
    expect(cd0.low.loading).toBeLessThan(0);
    const clMax = data.rows.find((row) => row.field === 'aircraft.aero.configurations.landing.clMax')!;
    expect(clMax.high.wingLoading).toBeGreaterThan(0);
    expect(clMax.low.wingLoading).toBeLessThan(0);
  });

  it('converts changes to lb/ft² in US units', () => {
    const si = tornadoData(moved, 'si');
    const us = tornadoData(moved, 'us');
    expect(us.rows[0].low.wingLoading).toBeCloseTo(si.rows[0].low.wingLoading / PSF, 9);
    expect(toDisplay(PSF, 'wingLoading', 'us')).toBeCloseTo(1, 12);
    const doc = parse(tornadoSvg(moved, { system: 'us' }));
    expect(doc.documentElement.textContent).toContain('Optimum wing loading: change [lb/ft²]');
    expect(doc.documentElement.textContent).toContain('Optimum power-to-weight: change [hp/lb]');
  });

  it('can leave out the assumptions that do not move the optimum, naming them below', () => {
    const doc = parse(tornadoSvg(moved, { hideNoEffect: true, width: 860 }));
    const shown = doc.querySelectorAll('g.tornado-row').length;
    expect(shown).toBeGreaterThan(0);
    expect(shown).toBeLessThan(trainer.parameters.length);
    const listed = [...doc.querySelectorAll('text.no-effect-list')].map((t) => t.textContent).join(' ');
    expect(listed).toMatch(/^No effect on the optimum across their ranges: /);
    expect(listed).toContain('Rolling friction (takeoff-grass)');
  });

  it('carries the caution, wrapped on a narrow chart, and never prints NaN', () => {
    const doc = parse(tornadoSvg(moved, { width: 700 }));
    const caution = [...doc.querySelectorAll('text.caution')].map((t) => t.textContent).join(' ');
    expect(caution).toBe(SIZING_CAUTION);
    expect(doc.querySelectorAll('text.caution').length).toBeGreaterThan(1);
    expect(doc.documentElement.textContent).not.toMatch(/NaN|undefined|Infinity/);
  });

  it('says so when nothing is ranged', () => {
    const doc = parse(tornadoSvg(tornado(trainer.design, [])));
    expect(doc.querySelectorAll('g.tornado-row')).toHaveLength(0);
    expect(doc.documentElement.textContent).toContain('No assumption carries a range.');
  });
});
