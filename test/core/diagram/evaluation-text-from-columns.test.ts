/**
 * The evaluation's JSON text is written from the engine's columns without
 * building a [w, y] pair per sample (core/diagram/evaluation-text.ts), and
 * falls back to ECMAScript's own serializer (JSON.stringify with two-space
 * indentation, the reference for every text here) whenever the columns no
 * longer say what the boundaries hold.
 *
 * Whether the pairs were built is seen by counting reads of a curve's
 * `points`: JSON.stringify reads each curve's points once; the columns do not
 * need them at all.
 */
import { describe, expect, it } from 'vitest';
import { columnsOf, evaluateDesign, evaluationJsonText } from '../../../core/diagram';
import type { CurveBoundaryJson, Evaluation } from '../../../core/evaluation';
import { DEMO_DESIGNS } from '../helpers/demo-designs';
import { cruise, design, stall } from '../helpers/design';

/** Counts the reads of every curve's `points` from now on (the values read are unchanged). */
function countPointReads(e: Evaluation): () => number {
  let reads = 0;
  for (const boundary of e.boundaries) {
    if (!('points' in boundary)) continue;
    const descriptor = Object.getOwnPropertyDescriptor(boundary, 'points')!;
    const read = descriptor.get ? () => descriptor.get!.call(boundary) : () => descriptor.value;
    Object.defineProperty(boundary, 'points', {
      configurable: true,
      enumerable: true,
      get() {
        reads++;
        return read();
      },
    });
  }
  return () => reads;
}

describe('the evaluation text written from the columns', () => {
  it('never builds the [w, y] pairs of a design with limits and curves, and gives JSON.stringify\'s text', () => {
    for (const d of DEMO_DESIGNS) {
      const e = evaluateDesign(d);
      expect(e.boundaries.some((b) => 'wingLoadingMax' in b)).toBe(true); // limits among the curves
      const reads = countPointReads(e);
      const text = evaluationJsonText(e);
      expect(reads()).toBe(0);
      expect(text).toBe(JSON.stringify(e, null, 2));
      expect(reads()).toBeGreaterThan(0); // the counter does see JSON.stringify's reads
    }
  });

  it('falls back to JSON.stringify when a curve was removed from the boundaries after the evaluation', () => {
    // Stall limit at 30 m/s and two cruise curves (40 and 80 m/s, sea level): the columns hold both curves;
    // with the first curve gone, column 0 no longer belongs to the first curve left.
    const d = design({ requirements: [stall(30), cruise(40, { id: 'slow' }), cruise(80, { id: 'fast' })], rangePa: [300, 1200], samples: 7 });
    const e = evaluateDesign(d);
    expect(columnsOf(e)!.curves.length).toBe(2);
    e.boundaries.splice(1, 1);
    const text = evaluationJsonText(e);
    expect(text).toBe(JSON.stringify(e, null, 2));
    const fast = (JSON.parse(text).boundaries as CurveBoundaryJson[]).find((b) => b.id === 'fast')!;
    expect(fast.points).toEqual((e.boundaries[1] as CurveBoundaryJson).points);
  });
});
