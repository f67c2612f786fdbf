import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { segmentGrid, type Segment } from '../../app/chart/segment-grid';
import type { Box } from '../../app/chart/boxes';

/** A segment with its extent, as the label placer builds them. */
function segment(id: string, a: [number, number], b: [number, number]): Segment {
  return { id, a, b, x0: Math.min(a[0], b[0]), x1: Math.max(a[0], b[0]), y0: Math.min(a[1], b[1]), y1: Math.max(a[1], b[1]) };
}

/** The definition: every segment whose extent touches the box, edges included. */
function touching(segments: Segment[], box: Box): Segment[] {
  return segments.filter((s) => !(s.x1 < box.x0 || s.x0 > box.x1 || s.y1 < box.y0 || s.y0 > box.y1));
}

function visited(segments: Segment[], box: Box): Segment[] {
  const found: Segment[] = [];
  segmentGrid(segments).near(box, (s) => void found.push(s));
  return found;
}

describe('segmentGrid', () => {
  it('finds a segment passing through a box whose corners are in other cells, and one touching only its edge', () => {
    const through = segment('through', [0, 100], [300, 100]);
    const edge = segment('edge', [150, 0], [150, 40]);
    const away = segment('away', [400, 400], [420, 410]);
    const box = { x0: 100, y0: 40, x1: 200, y1: 120 };
    expect(visited([through, edge, away], box).map((s) => s.id).sort()).toEqual(['edge', 'through']);
  });

  it('visits exactly the segments whose extent touches the box, each once, for any segments and box', () => {
    const coordinate = fc.double({ min: -200, max: 1200, noNaN: true });
    const point = fc.tuple(coordinate, coordinate);
    fc.assert(
      fc.property(fc.array(fc.tuple(point, point), { maxLength: 60 }), point, fc.double({ min: 0, max: 400, noNaN: true }), fc.double({ min: 0, max: 200, noNaN: true }), (pairs, [x, y], w, h) => {
        const segments = pairs.map(([a, b], i) => segment(`s${i}`, a, b));
        const box = { x0: x, y0: y, x1: x + w, y1: y + h };
        const found = visited(segments, box);
        expect(new Set(found).size).toBe(found.length);
        expect(new Set(found)).toEqual(new Set(touching(segments, box)));
      }),
    );
  });

  it('still finds segments with no finite extent, and answers boxes larger than the grid', () => {
    const endless = segment('endless', [0, 0], [Infinity, 5]);
    const ordinary = segment('ordinary', [10, 10], [20, 20]);
    expect(visited([endless, ordinary], { x0: 15, y0: 0, x1: 30, y1: 12 }).map((s) => s.id).sort()).toEqual(['endless', 'ordinary']);
    expect(visited([endless, ordinary], { x0: -1e9, y0: -1e9, x1: 1e9, y1: 1e9 }).map((s) => s.id).sort()).toEqual(['endless', 'ordinary']);
  });

  it('stops as soon as the visitor has seen enough, for boxes of any size', () => {
    const segments = Array.from({ length: 10 }, (_, i) => segment(`s${i}`, [i * 10, 0], [i * 10 + 5, 5]));
    const endless = segment('endless', [0, 0], [Infinity, 5]);
    for (const box of [{ x0: 0, y0: 0, x1: 100, y1: 10 }, { x0: -1e9, y0: -1e9, x1: 1e9, y1: 1e9 }]) {
      for (const list of [segments, [endless, ...segments]]) {
        let seen = 0;
        segmentGrid(list).near(box, () => ++seen >= 3);
        expect(seen).toBe(3);
      }
    }
  });
});
