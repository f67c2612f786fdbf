/**
 * Where the diagram writes its words: a label for every boundary and a note
 * beside the optimum and the design point, placed greedily so that they stay
 * inside the plot and clear of one another and, where possible, of the lines.
 * Pixel space; text width is estimated, so it works without a DOM.
 */
import type { ChartData } from './series-types';
import type { ChartScales, PlotArea } from './scales';
import { clipToBand, type XY } from './clip';
import { segmentHitsBox, type Box } from './boxes';
import { bestOf } from './best-candidate';
import { curveCandidates, limitCandidates, markerBox, noteCandidates, offPlot, type Candidate } from './label-candidates';
import { segmentGrid } from './segment-grid';
import { shorten } from './text';

export { boxesOverlap, boxInside, segmentHitsBox, textWidth, type Box } from './boxes';

import type { LabelPlacement, PointNote } from './placement';
export type { LabelPlacement, PointNote } from './placement';

export interface LabelOptions {
  fontSize?: number;
  /** Notes to place beside marked points (optimum, design point) before the boundary labels. */
  notes?: readonly PointNote[];
  /** Longer boundary labels are shortened with an ellipsis. */
  maxChars?: number;
}

export interface Labels {
  boundaries: LabelPlacement[];
  notes: LabelPlacement[];
}

export function placeLabels(data: ChartData, scales: ChartScales, options: LabelOptions = {}): Labels {
  const fontSize = options.fontSize ?? 12;
  const maxChars = options.maxChars ?? 32;
  const [yLo, yHi] = scales.y.domain();
  const toPixels = (runs: XY[][]) => runs.map((run) => run.map(([x, y]): XY => [scales.x(x), scales.y(y)]));
  const curveRuns = new Map(data.curves.map((curve) => [curve.id, toPixels(clipToBand(curve.points, yLo, yHi))]));
  const limitXs = new Map(data.limits.map((limit) => [limit.id, scales.x(limit.wingLoading)]));
  const placed: Box[] = [];

  // Everything drawn that a label would hide: curve segments (with their bounds, for a quick reject) and limit lines.
  const segments = [...curveRuns].flatMap(([id, runs]) =>
    runs.flatMap((run) =>
      run.slice(1).map((b, i) => {
        const a = run[i];
        return { id, a, b, x0: Math.min(a[0], b[0]), x1: Math.max(a[0], b[0]), y0: Math.min(a[1], b[1]), y1: Math.max(a[1], b[1]) };
      }),
    ),
  );
  // Only the segments near a box are looked at (the same ones a scan of all of them would find).
  const grid = segmentGrid(segments);
  // Counting stops once it reaches `enough` (a box that already costs that much is not the best one).
  const crossings = (box: Box, ownId: string | null, enough = Infinity): number => {
    let count = 0;
    for (const [id, px] of limitXs) if (id !== ownId && px > box.x0 && px < box.x1) count += 6;
    if (count >= enough) return count;
    grid.near(box, (s) => {
      if (segmentHitsBox(s.a, s.b, box)) count += s.id === ownId ? 2 : 3;
      return count >= enough;
    });
    return count;
  };

  const markers: Box[] = [data.optimum, data.designPoint]
    .filter((point): point is NonNullable<typeof point> => point !== null)
    .map((point) => markerBox(scales.x(point.wingLoading), scales.y(point.loading)));
  placed.push(...markers);

  const notes = (options.notes ?? []).map((note) => {
    const best = bestOf(noteCandidates(note, scales, fontSize), scales.plot, placed, (box, enough) => crossings(box, null, enough));
    placed.push(best.box);
    return best;
  });

  const boundaries: LabelPlacement[] = [];
  for (const curve of data.curves) {
    const runs = curveRuns.get(curve.id) ?? [];
    const text = shorten(curve.plotLabel, maxChars);
    const candidates = curveCandidates(curve.id, text, curve.colour, runs, scales.plot, fontSize);
    if (candidates.length === 0) {
      boundaries.push(offPlot(curve.id, text, curve.colour, scales.plot, fontSize));
      continue;
    }
    const best = bestOf(candidates, scales.plot, placed, (box, enough) => crossings(box, curve.id, enough));
    placed.push(best.box);
    boundaries.push(best);
  }
  for (const limit of data.limits) {
    const px = limitXs.get(limit.id) ?? NaN;
    const text = shorten(limit.plotLabel, maxChars);
    if (!(px >= scales.plot.left && px <= scales.plot.right)) {
      boundaries.push(offPlot(limit.id, text, limit.colour, scales.plot, fontSize));
      continue;
    }
    const candidates = limitCandidates(limit.id, text, limit.colour, px, scales.plot, fontSize);
    const best = bestOf(candidates, scales.plot, placed, (box, enough) => crossings(box, limit.id, enough));
    placed.push(best.box);
    boundaries.push(best);
  }
  return { boundaries, notes };
}
