/**
 * Choosing a label's spot among its candidates: the fewest overlaps with
 * what is placed, then the small bias, then the fewest lines hidden.
 */
import type { Candidate } from './label-candidates';
import type { LabelPlacement } from './placement';
import type { PlotArea } from './scales';
import { boxesOverlap, boxInside, type Box } from './boxes';

/**
 * The candidate that fits the plot, avoids placed boxes and hides the fewest
 * lines (the first of equals). `cost` is never negative and may stop counting
 * once it reaches `enough`. Candidates are costed cheapest fixed part
 * (overlaps and bias) first: once that part alone is worse than the best
 * score so far, no later candidate can win, so most are never costed; the one
 * chosen is still the first of equals in `candidates`' order.
 */
export function bestOf(candidates: Candidate[], plot: PlotArea, placed: Box[], cost: (box: Box, enough: number) => number): LabelPlacement {
  const inside = candidates.filter((candidate) => boxInside(candidate.box, plot));
  const pool = inside.length > 0 ? inside : candidates;
  const order = pool.map((candidate, index) => {
    let overlaps = 0;
    for (const box of placed) if (boxesOverlap(box, candidate.box)) overlaps += 1;
    return { index, fixed: overlaps * 1000 + candidate.bias };
  });
  order.sort((a, b) => a.fixed - b.fixed || a.index - b.index);
  let best = -1;
  let bestScore = Infinity;
  for (const { index, fixed } of order) {
    if (fixed > bestScore) break;
    // At best a tie, which only an earlier candidate wins.
    if (fixed === bestScore && index > best) continue;
    // Half a line more than the difference: stopping there still leaves this candidate worse whatever the rounding.
    const score = fixed + cost(pool[index].box, bestScore - fixed + 0.5);
    if (score < bestScore || (score === bestScore && index < best)) {
      bestScore = score;
      best = index;
    }
  }
  const { bias: _bias, ...placement } = best >= 0 ? pool[best] : candidates[0];
  return placement;
}
