import { describe, expect, it } from 'vitest';
import { bestOf } from '../../app/chart/best-candidate';
import { boxesOverlap, boxInside, type Box } from '../../app/chart/boxes';
import type { Candidate } from '../../app/chart/label-candidates';

const PLOT = { left: 0, top: 0, right: 400, bottom: 300, width: 400, height: 300 };

/** A small deterministic stream of numbers in [0, 1) (a linear congruential generator, Numerical Recipes' constants). */
function numbers(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

function candidate(id: string, box: Box, bias: number): Candidate {
  return { id, lines: [id], colour: '#000', x: box.x0, y: box.y1, anchor: 'start', rotate: 0, box, onPlot: true, bias };
}

/**
 * What the label placer promises, written out plainly: among the candidates inside the plot with its margin (all of
 * them when none is), the least of 1000 per placed box overlapped, plus the bias, plus the full cost; the first of equals.
 */
function plainChoice(candidates: Candidate[], placed: Box[], cost: (box: Box) => number): string {
  const inside = candidates.filter((c) => boxInside(c.box, PLOT));
  const pool = inside.length > 0 ? inside : candidates;
  let best = pool[0];
  let bestScore = Infinity;
  for (const c of pool) {
    const overlaps = placed.filter((p) => boxesOverlap(p, c.box)).length;
    const score = overlaps * 1000 + c.bias + cost(c.box);
    if (score < bestScore) {
      bestScore = score;
      best = c;
    }
  }
  return best.id;
}

describe('choosing a label spot', () => {
  it('picks what a plain search of every candidate picks, ties to the first, while costing fewer of them', () => {
    let costedByPlacer = 0;
    let costedInAll = 0;
    for (let trial = 0; trial < 400; trial += 1) {
      const next = numbers(trial + 1);
      const box = (): Box => {
        const x0 = next() * 420 - 10;
        const y0 = next() * 320 - 10;
        return { x0, y0, x1: x0 + 20 + next() * 60, y1: y0 + 10 + next() * 10 };
      };
      // Few distinct biases and small whole costs, so that equal scores are common.
      const candidates = Array.from({ length: 1 + Math.floor(next() * 40) }, (_, i) => candidate(`c${i}`, box(), Math.floor(next() * 4) * 0.25));
      const placed = Array.from({ length: Math.floor(next() * 6) }, box);
      const costs = new Map(candidates.map((c) => [c.box, Math.floor(next() * 5)]));
      const fullCost = (b: Box) => costs.get(b) ?? 0;
      // The placer's cost may stop counting once it reaches `enough`, answering anything at least that.
      const stoppingCost = (b: Box, enough: number) => {
        costedByPlacer += 1;
        const full = fullCost(b);
        return full >= enough ? Math.ceil(enough) + Math.floor(next() * 3) : full;
      };
      costedInAll += candidates.length;
      expect(bestOf(candidates, PLOT, placed, stoppingCost).id, `trial ${trial}`).toBe(plainChoice(candidates, placed, fullCost));
    }
    expect(costedByPlacer).toBeLessThan(costedInAll / 2);
  });

  it('keeps a candidate outside the plot only when none is inside', () => {
    const outside = candidate('outside', { x0: -50, y0: 20, x1: -10, y1: 30 }, 0);
    const inside = candidate('inside', { x0: 20, y0: 20, x1: 60, y1: 30 }, 3);
    expect(bestOf([outside, inside], PLOT, [], () => 0).id).toBe('inside');
    expect(bestOf([outside], PLOT, [], () => 0).id).toBe('outside');
  });
});
