/**
 * The drawn line segments bucketed by square cells of the plot, so that the
 * label placer asks about the few segments near a candidate box rather than
 * all of them: the same segments are found, each once, as a scan of the whole
 * list would find them. Pixel space.
 */
import type { XY } from './clip';
import type { Box } from './boxes';

export interface Segment {
  id: string;
  a: XY;
  b: XY;
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** Cell size in pixels: a label is one to a few cells across. */
const CELL = 32;
/** A segment spanning more cells than this (or with no finite extent) is checked for every box. */
const MOST_CELLS = 4096;

export interface SegmentGrid {
  /**
   * Calls `visit` once for each segment whose extent touches `box` (edges
   * included), until `visit` answers true (enough seen: the rest are skipped).
   */
  near(box: Box, visit: (segment: Segment) => boolean | void): void;
}

const cell = (value: number) => Math.floor(value / CELL);
/**
 * A cell's key: its column and row in one number. Two cells far apart (2^20 rows) could share a key; a
 * lookup then only meets more segments, which the extent test below sets aside, never fewer.
 */
const key = (cx: number, cy: number) => cx * 1_048_576 + cy;

export function segmentGrid(segments: readonly Segment[]): SegmentGrid {
  const cells = new Map<number, number[]>();
  const everywhere: number[] = [];
  segments.forEach((s, index) => {
    const [cx0, cx1, cy0, cy1] = [cell(s.x0), cell(s.x1), cell(s.y0), cell(s.y1)];
    const count = (cx1 - cx0 + 1) * (cy1 - cy0 + 1);
    if (!Number.isFinite(count) || count > MOST_CELLS) {
      everywhere.push(index);
      return;
    }
    for (let cx = cx0; cx <= cx1; cx += 1) {
      for (let cy = cy0; cy <= cy1; cy += 1) {
        const k = key(cx, cy);
        const list = cells.get(k);
        if (list) list.push(index);
        else cells.set(k, [index]);
      }
    }
  });
  const seen = new Int32Array(segments.length);
  let query = 0;
  return {
    near(box, visit) {
      query += 1;
      const touches = (s: Segment) => !(s.x1 < box.x0 || s.x0 > box.x1 || s.y1 < box.y0 || s.y0 > box.y1);
      for (const index of everywhere) if (touches(segments[index]) && visit(segments[index])) return;
      const [cx0, cx1, cy0, cy1] = [cell(box.x0), cell(box.x1), cell(box.y0), cell(box.y1)];
      const count = (cx1 - cx0 + 1) * (cy1 - cy0 + 1);
      if (!Number.isFinite(count) || count > MOST_CELLS) {
        // A box with no finite extent, or one larger than the plot: every segment, as a full scan would.
        for (let index = 0; index < segments.length; index += 1) {
          const s = segments[index];
          if (seen[index] !== query && !everywhere.includes(index) && touches(s) && visit(s)) return;
        }
        return;
      }
      for (let cx = cx0; cx <= cx1; cx += 1) {
        for (let cy = cy0; cy <= cy1; cy += 1) {
          const list = cells.get(key(cx, cy));
          if (!list) continue;
          for (const index of list) {
            if (seen[index] === query) continue;
            seen[index] = query;
            if (touches(segments[index]) && visit(segments[index])) return;
          }
        }
      }
    },
  };
}
