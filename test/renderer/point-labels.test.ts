/**
 * The optimum and the design point carry labels on screen, as in the
 * exported diagram: the name, and where the point is. The trainer's optimum
 * sits on its 45 kt landing stall line, worked by hand.
 */
import { describe, expect, it } from 'vitest';
import { chartData } from '../../app/chart';
import { diagramMarks } from '../../app/chart/marks';
import { diagramGeometry } from '../../app/renderer/lib/diagram/geometry';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';

const parsed = parseConcept(DEMO_CONCEPTS[0].concept);
if (!parsed.ok) throw new Error('demo does not parse');
const data = chartData(evaluateDesign(parsed.design), { system: 'si' });
const size = { width: 800, height: 560 };

function noteText(labels: ReturnType<typeof diagramMarks>['labels'], id: string): string {
  const note = labels.find((mark) => mark.role === 'note' && mark.attrs['data-id'] === id);
  return (note?.children ?? []).map((line) => line.text ?? '').join(' | ');
}

describe('labels on the optimum and the design point', () => {
  it('name each point with its wing loading and loading', () => {
    const labels = diagramMarks(diagramGeometry(data, size, null, false)).labels;
    // Stall limit w = rho0 V^2 CLmax / 2 = 0.5 x 1.225 x (45 x 1852/3600)^2 x 2.05 = 673.0 N/m^2
    // (U.S. Standard Atmosphere 1976 rho0; NIST SP 811 knot); the trainer's design point is 650 N/m^2, 11 W/N as written.
    expect(noteText(labels, 'optimum')).toMatch(/^Optimum \| 673 N\/m²/);
    expect(noteText(labels, 'design-point')).toMatch(/^Design point \| 650 N\/m² · 11(\.0+)? W\/N/);
  });

  it('in the power-loading view the design point reads 1000/11 = 90.9 N/kW', () => {
    const labels = diagramMarks(diagramGeometry(data, size, null, true)).labels;
    expect(noteText(labels, 'design-point')).toContain('W/P 90.9 N/kW');
  });

  it("while the design point is dragged only the optimum's label stays", () => {
    const labels = diagramMarks(diagramGeometry(data, size, null, false, 'optimum')).labels;
    expect(noteText(labels, 'optimum')).not.toBe('');
    expect(noteText(labels, 'design-point')).toBe('');
  });
});
