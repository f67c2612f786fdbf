/**
 * Candidate spots for the label placer: along a curve (above or below it),
 * along a wing-loading limit (reading upwards, either side), and around a
 * marked point (four quadrants, three distances). Each carries a small bias
 * that breaks ties in favour of the usual spot.
 */
// @ts-nocheck

import type { XY } from './clip';
import type { LabelPlacement, PointNote } from './placement';
import type { ChartScales, PlotArea } from './scales';
import { GAP, PAD, textWidth, type Box } from './boxes';

export interface Candidate extends LabelPlacement {
  /** Small preference between otherwise equal spots (lower is better). */
  bias: number;
}

export function markerBox(px: number, py: number): Box {
  return { x0: px - 7, y0: py - 7, x1: px + 7, y1: py + 7 };
}

export function curveCandidates(id: string, text: string, colour: string, runs: XY[][], plot: PlotArea, fontSize: number): Candidate[] {
  const width = textWidth(text, fontSize);
  const height = fontSize * 1.15;
  const candidates: Candidate[] = [];
  for (const run of runs) {
    for (const [px, py] of densify(run, 12)) {
      const preferred = Math.abs((px - plot.left) / Math.max(plot.width, 1) - 0.72);
      for (const above of [true, false]) {
        const y0 = above ? py - GAP - height : py + GAP;
        const box = { x0: px - width / 2, y0, x1: px + width / 2, y1: y0 + height };
        candidates.push({
          id,
          lines: [text],
          colour,
          x: px,
          y: y0 + fontSize * 0.88,
          anchor: 'middle',
          rotate: 0,
          box,
          onPlot: true,
          bias: preferred * 2 + (above ? 0 : 0.3),
        });
      }
    }
  }
  return candidates;
}

/** Points along a pixel polyline at most `step` px apart. */
function densify(run: XY[], step: number): XY[] {
  const points: XY[] = [];
  for (let i = 1; i < run.length; i += 1) {
    const [ax, ay] = run[i - 1];
    const [bx, by] = run[i];
    const n = Math.max(1, Math.ceil(Math.hypot(bx - ax, by - ay) / step));
    for (let k = 0; k < n; k += 1) points.push([ax + ((bx - ax) * k) / n, ay + ((by - ay) * k) / n]);
  }
  if (run.length > 0) points.push(run[run.length - 1]);
  return points;
}

export function limitCandidates(id: string, text: string, colour: string, px: number, plot: PlotArea, fontSize: number): Candidate[] {
  const length = textWidth(text, fontSize);
  // Rotated -90 with anchor 'end', the text ends at (x, top) and runs down the line;
  // ascenders reach about 0.8 em left of x, descenders about 0.25 em right of it.
  const ascent = fontSize * 0.8;
  const descent = fontSize * 0.25;
  const candidates: Candidate[] = [];
  const steps = Math.max(1, Math.floor((plot.height - length) / 24));
  for (let k = 0; k <= steps; k += 1) {
    const top = plot.top + PAD + 2 + k * 24;
    for (const left of [true, false]) {
      const x = left ? px - GAP - descent : px + GAP + ascent;
      const box = { x0: x - ascent, y0: top, x1: x + descent, y1: top + length };
      candidates.push({
        id,
        lines: [text],
        colour,
        x,
        y: top,
        anchor: 'end',
        rotate: -90,
        box,
        onPlot: true,
        bias: k * 0.05 + (left ? 0 : 0.2),
      });
    }
  }
  return candidates;
}

export function noteCandidates(note: PointNote, scales: ChartScales, fontSize: number): Candidate[] {
  const px = scales.x(note.at.wingLoading);
  const py = scales.y(note.at.loading);
  const lineHeight = fontSize * 1.25;
  const width = Math.max(...note.lines.map((line) => textWidth(line, fontSize)));
  const height = lineHeight * note.lines.length;
  const offsets: Array<[number, number, number]> = [
    [1, -1, 0],
    [1, 1, 0.2],
    [-1, -1, 0.4],
    [-1, 1, 0.6],
  ];
  const candidates: Candidate[] = [];
  for (const distance of [12, 24, 40]) {
    for (const [sx, sy, bias] of offsets) {
      const x0 = sx > 0 ? px + distance : px - distance - width;
      const y0 = sy < 0 ? py - distance - height : py + distance;
      candidates.push({
        id: note.id,
        lines: [...note.lines],
        colour: note.colour,
        x: sx > 0 ? x0 : x0 + width,
        y: y0 + fontSize * 0.95,
        anchor: sx > 0 ? 'start' : 'end',
        rotate: 0,
        box: { x0, y0, x1: x0 + width, y1: y0 + height },
        onPlot: true,
        bias: bias + distance / 40,
      });
    }
  }
  return candidates;
}

/** A boundary with nothing to label on the plot: parked at the plot's corner, flagged off-plot. */
export function offPlot(id: string, text: string, colour: string, plot: PlotArea, fontSize: number): LabelPlacement {
  const x = plot.right - PAD;
  const y = plot.top + PAD + fontSize;
  return {
    id,
    lines: [text],
    colour,
    x,
    y,
    anchor: 'end',
    rotate: 0,
    box: { x0: x - textWidth(text, fontSize), y0: plot.top + PAD, x1: x, y1: y + fontSize * 0.25 },
    onPlot: false,
  };
}
