/**
 * Alternatives over the diagram: each other concept's feasible-region outline
 * and optimum in its own colour, in the window's marks, the SVG and its legend.
 * The check values are worked by hand from the stall equation.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, PRELIMINARY_CAUTION, evaluateDesign, parseConcept, type Evaluation } from '../../core';
import { chartData } from '../../app/chart';
import { ALTERNATIVE_INKS } from '../../app/chart/palette';
import { diagramGeometry } from '../../app/chart/geometry';
import { legendRows } from '../../app/chart/legend';
import { diagramMarks } from '../../app/chart/marks';
import { constraintDiagramSvg } from '../../app/chart/svg';

function evaluate(concept: unknown): Evaluation {
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error('does not parse');
  return evaluateDesign(parsed.design);
}

const trainer = () => structuredClone(DEMO_CONCEPTS[0].concept) as Record<string, any>;
// A trainer variant with a 40 kt stall: its region stops left of the 45 kt trainer's.
const variant = () => {
  const concept = trainer();
  concept.name = 'Trainer, 40 kt stall';
  concept.requirements[0].speed = '40 kt';
  return concept;
};

// Stall limit w = rho0 V^2 CLmax / 2: rho0 = 1.2250 kg/m^3 (U.S. Standard Atmosphere 1976), 1 kt = 1852/3600 m/s (NIST SP 811).
const stallLimit = (kt: number, clMax: number) => 0.5 * 1.225 * ((kt * 1852) / 3600) ** 2 * clMax;

const FRAME = { width: 900, height: 600, margin: { top: 20, right: 20, bottom: 50, left: 70 } };

function pathXs(d: string): number[] {
  return [...d.matchAll(/[ML](-?[\d.]+),(-?[\d.]+)/g)].map((m) => Number(m[1]));
}

describe('alternatives drawn over the diagram', () => {
  it("the outline ends at the alternative's own stall limit, and its optimum sits there too (the stall binds)", () => {
    const data = chartData(evaluate(trainer()), { alternatives: [{ name: 'Trainer, 40 kt stall', evaluation: evaluate(variant()) }] });
    const geometry = diagramGeometry(data, FRAME);
    const marks = diagramMarks(geometry);
    const outline = marks.behind.filter((mark) => mark.role === 'alternative');
    expect(outline).toHaveLength(1);
    const limit = stallLimit(40, 2.05); // 531.8 N/m^2, landing CLmax 2.05 of the trainer
    // Below the landing-distance limit (about 808 N/m^2), so the right edge of the outline is the stall line.
    const right = Math.max(...pathXs(String(outline[0].attrs.d)));
    expect(geometry.scales.x.invert(right)).toBeCloseTo(limit, -1);
    const diamond = marks.markers.find((mark) => mark.role === 'alternative-optimum');
    expect(diamond?.attrs.stroke).toBe(ALTERNATIVE_INKS[0]);
    const centre = Number(/^M([\d.]+),/.exec(String(diamond?.attrs.d))?.[1]);
    expect(geometry.scales.x.invert(centre)).toBeCloseTo(limit, -1);
    // The concept's own optimum stays where its own 45 kt stall puts it (673.0 N/m^2).
    expect(data.optimum?.wingLoading).toBeCloseTo(stallLimit(45, 2.05), 0);
  });

  it('each alternative has its own colour and a legend row under its name', () => {
    const second = variant();
    second.name = 'Trainer, heavier';
    second.aircraft.takeoffMass = '820 kg';
    const data = chartData(evaluate(trainer()), {
      alternatives: [
        { name: 'Trainer, 40 kt stall', evaluation: evaluate(variant()) },
        { name: 'Trainer, heavier', evaluation: evaluate(second) },
      ],
    });
    expect(data.alternatives.map((a) => a.colour)).toEqual(ALTERNATIVE_INKS.slice(0, 2));
    const rows = legendRows(data).filter((row) => row.id.startsWith('alternative:'));
    expect(rows.map((row) => [row.title, row.colour])).toEqual([
      ['Trainer, 40 kt stall', ALTERNATIVE_INKS[0]],
      ['Trainer, heavier', ALTERNATIVE_INKS[1]],
    ]);
  });

  it('an alternative on the other vertical axis is listed, not drawn', () => {
    const data = chartData(evaluate(trainer()), { alternatives: [{ name: 'Jet', evaluation: evaluate(DEMO_CONCEPTS[2].concept) }] });
    const marks = diagramMarks(diagramGeometry(data, FRAME));
    expect([...marks.behind, ...marks.markers].filter((mark) => mark.role.startsWith('alternative'))).toEqual([]);
    expect(legendRows(data).find((row) => row.id === 'alternative:Jet')?.details[0]).toMatch(/not drawn/);
  });

  it('in the power-loading view the optimum is drawn at W/P = 1/(P/W)', () => {
    const alternative = evaluate(variant());
    const data = chartData(evaluate(trainer()), { alternatives: [{ name: 'B', evaluation: alternative }] });
    const geometry = diagramGeometry(data, FRAME, { powerLoading: true });
    const diamond = diagramMarks(geometry).markers.find((mark) => mark.role === 'alternative-optimum');
    const top = /^M[\d.]+,([\d.]+)/.exec(String(diamond?.attrs.d))?.[1];
    // The diamond's top vertex is 6.5 px above its centre; W/P in N/kW is 1000 / (P/W in W/N).
    const y = geometry.scales.y.invert(Number(top) + 6.5);
    expect(y).toBeCloseTo(1000 / alternative.optimum!.powerToWeight!, 1);
  });

  it('the exported SVG carries the outlines, the names in its legend and the caution', () => {
    const svg = constraintDiagramSvg(evaluate(trainer()), { alternatives: [{ name: 'Trainer, 40 kt stall', evaluation: evaluate(variant()) }] });
    expect(svg).toContain('data-role="alternative"');
    expect(svg).toContain('data-role="alternative-optimum"');
    expect(svg).toContain('Trainer, 40 kt stall');
    expect(svg).toContain(PRELIMINARY_CAUTION.slice(0, 40));
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  });
});

describe('the view widens to the alternatives', () => {
  it("the wing-loading axis reaches past an alternative's optimum beyond the concept's own range", () => {
    const twin = evaluate(DEMO_CONCEPTS[1].concept);
    const data = chartData(evaluate(trainer()), { alternatives: [{ name: 'Twin', evaluation: twin }] });
    const [lo, hi] = diagramGeometry(data, FRAME).scales.x.domain();
    const w = twin.optimum!.wingLoading;
    expect(w).toBeGreaterThan(data.wingLoadingRange[1]);
    expect(lo).toBeLessThanOrEqual(data.wingLoadingRange[0]);
    expect(hi).toBeGreaterThan(w);
  });
});
