import { describe, expect, it } from 'vitest';
import { scaleLinear } from 'd3';
import type { ChartScales, Labels } from '../../app/chart';
import type { BandSeries } from '../../app/chart/bands';
import type { ContourSeries } from '../../app/chart/contours';
import { bandShapes, contourLabels, contourShapes, mapBox } from '../../app/chart/study-geometry';

/** A plot 600 px wide from x = 100 to 700, 400 px tall from y = 20 to 420; wing loading 0-1200, loading 0-30. */
function scales(yDomain: [number, number] = [0, 30]): ChartScales {
  const plot = { left: 100, right: 700, top: 20, bottom: 420, width: 600, height: 400 };
  const x = scaleLinear().domain([0, 1200]).range([plot.left, plot.right]);
  const y = scaleLinear().domain(yDomain).range([plot.bottom, plot.top]);
  return { x, y, plot, xTicks: [], yTicks: [], formatX: String, formatY: String, xTitle: '', yTitle: '' };
}

/** Every "x,y" pair of a path, in order. */
function points(d: string): Array<[number, number]> {
  return [...d.matchAll(/(-?[\d.]+),(-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

/** A path's points read back through the scales into plot values, to 0.1. */
function plottedPoints(d: string, s: ChartScales): number[][] {
  return points(d).map(([px, py]) => [s.x.invert(px), s.y.invert(py)].map((v) => Math.round(v * 10) / 10));
}

const NO_LABELS: Labels = { boundaries: [], notes: [] };

describe('bands in pixels', () => {
  it('draws a limit band as a strip across the plot between its two wing loadings', () => {
    const band: BandSeries = { id: 'stall', kind: 'stall', colour: '#123456', fields: [], type: 'limit', range: [600, 900] };
    const [shape] = bandShapes([band], scales(), { powerLoading: false });
    // x = 100 + 600 px x W/S / 1200 (a linear scale, common practice).
    expect(shape.area).toBe('M400,20H550V420H400Z');
    expect(shape.colour).toBe('#123456');
  });

  it('keeps a band narrower than a line visible, one pixel either side', () => {
    const band: BandSeries = { id: 'stall', kind: 'stall', colour: '#000', fields: [], type: 'limit', range: [600, 600.5] };
    const match = /^M([\d.]+),20H([\d.]+)V420/.exec(bandShapes([band], scales(), { powerLoading: false })[0].area);
    // 0.5 N/m^2 is a quarter pixel at 0.5 px per N/m^2; drawn from 1 px left of it to 1 px right.
    expect(Number(match?.[1])).toBeCloseTo(399, 6);
    // Paths are written to a tenth of a pixel.
    expect(Math.abs(Number(match?.[2]) - 401.25)).toBeLessThanOrEqual(0.05 + 1e-9);
  });

  it('shows a curve band in power loading as W/P = k / (P/W), the two edges trading places', () => {
    const band: BandSeries = {
      id: 'cruise',
      kind: 'cruise',
      colour: '#000',
      fields: [],
      type: 'curve',
      points: [
        [300, 8, 10],
        [600, 10, 12.5],
      ],
    };
    // 1000 / (10 W/N) = 100 N/kW (power loading is the inverse of power-to-weight, common practice).
    const view = { powerLoading: true as const, factor: 1000 };
    const s = scales([0, 200]);
    const [shape] = bandShapes([band], s, view);
    const drawn = plottedPoints(shape.area, s);
    // Upper edge first (W/P from the lower P/W), then the lower edge back.
    expect(drawn).toEqual([
      [300, 125],
      [600, 100],
      [600, 80],
      [300, 100],
    ]);
  });

  it('leaves out the wing loadings where no combination meets the requirement, and opens the top where some cannot', () => {
    const band: BandSeries = {
      id: 'climb',
      kind: 'climb-rate',
      colour: '#000',
      fields: [],
      type: 'curve',
      points: [
        [200, null, null],
        [300, 5, 7],
        [400, 6, null],
        [500, 7, 9],
      ],
    };
    const s = scales();
    const [shape] = bandShapes([band], s, { powerLoading: false });
    const drawn = points(shape.area);
    expect(drawn).toHaveLength(6);
    // The open top reaches a tenth of the view beyond its top (30 + 3), where the clip hides it.
    expect(s.y.invert(drawn[1][1])).toBeCloseTo(33, 1);
    expect(shape.area).not.toMatch(/NaN|Infinity/);
  });
});

describe('contours in pixels', () => {
  const square: ContourSeries = {
    level: 0.9,
    rings: [
      [
        [300, 10],
        [600, 10],
        [600, 20],
        [300, 20],
      ],
    ],
    frontier: [
      [300, 10],
      [400, 10],
      [500, 10],
      [600, 10],
    ],
  };

  it('draws each ring closed, styled by its level as in the report', () => {
    const [shape] = contourShapes([square], scales(), { powerLoading: false });
    expect(shape.d).toBe('M250,286.7L400,286.7L400,153.3L250,153.3Z');
    expect(shape.level).toBe(0.9);
    expect(contourShapes([{ ...square, rings: [] }], scales(), { powerLoading: false })).toEqual([]);
  });

  it('puts the label on the line, inside the plot and clear of a boundary label already there', () => {
    const s = scales();
    const [free] = contourLabels([square], s, NO_LABELS, { powerLoading: false });
    expect(free.text).toBe('90 %');
    expect(s.y.invert(free.y - 11 * 0.35)).toBeCloseTo(10, 6);
    // A boundary label covering the first place tried moves the contour's label to the next one.
    const box = { x0: free.x - 30, y0: free.y - 20, x1: free.x + 30, y1: free.y + 20 };
    const taken = { boundaries: [{ id: 'cruise', onPlot: true, box } as unknown as Labels['boundaries'][number]], notes: [] };
    const [moved] = contourLabels([square], s, taken, { powerLoading: false });
    expect(moved.x).not.toBe(free.x);
    expect(moved.x + 14 < box.x0 || moved.x - 14 > box.x1).toBe(true);
  });
});

describe('contours past the top of the map', () => {
  // A 90 % region from W/S 300 to 600 whose ring runs on above the map's last row (P/W 20, half a row
  // 20.5), as d3 traces it through the padding that copies the last row.
  const open: ContourSeries = {
    level: 0.9,
    rings: [
      [
        [300, 10],
        [600, 10],
        [600, 21.5],
        [300, 21.5],
      ],
    ],
    frontier: [],
    beyondTop: 20.5,
  };

  it('in power loading runs down to W/P = 0: above the map the chance is taken as its last row', () => {
    const s = scales([0, 200]);
    const [shape] = contourShapes([open], s, { powerLoading: true, factor: 1000 });
    const drawn = plottedPoints(shape.d, s);
    // W/P = 1000 / (10 W/N) = 100 N/kW along the bottom of the region; the run above the map at W/P 0.
    expect(drawn).toEqual([
      [300, 100],
      [600, 100],
      [600, 0],
      [300, 0],
    ]);
  });

  it('in power-to-weight stays where d3 put it (the clip to the map hides the padding)', () => {
    const s = scales();
    const [shape] = contourShapes([open], s, { powerLoading: false });
    const drawn = plottedPoints(shape.d, s);
    expect(drawn[2]).toEqual([600, 21.5]);
  });
});

describe('the part of the plot a probability map covers', () => {
  it('is the map itself where it lies inside the plot', () => {
    // x = 100 + 600 W/S / 1200 and y = 420 - 400 P/W / 30 (linear scales).
    const box = mapBox([300, 600], [0, 20], scales(), { powerLoading: false });
    expect(box.x).toBe(250);
    expect(box.width).toBe(150);
    expect(box.y).toBeCloseTo(420 - (400 * 20) / 30, 9);
    expect(box.y + box.height).toBe(420);
  });

  it('in power loading reaches from the top of the plot down to W/P = 0, where the contours continue past the map', () => {
    // The map's P/W up to 25 W/N ends at W/P = 1000/25 = 40 N/kW (power loading is the inverse of
    // power-to-weight); below that the contours run on to W/P = 0 (ringPath), so the clip does too.
    const s = scales([0, 200]);
    const box = mapBox([0, 1200], [0, 25], s, { powerLoading: true, factor: 1000 });
    expect(box.y).toBe(s.plot.top);
    expect(box.y + box.height).toBe(s.plot.bottom);
    expect(box.width).toBe(s.plot.width);
  });
});
