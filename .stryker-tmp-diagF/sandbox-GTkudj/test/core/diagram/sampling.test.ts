// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { sampleWingLoadings } from '../../../core/diagram';
import { assertInDelta } from '../helpers/asserts';

describe('sampleWingLoadings', () => {
  it('spaces the samples evenly and includes both ends exactly', () => {
    const ws = sampleWingLoadings([200, 1500], 131);
    expect(ws.length).toBe(131);
    expect(ws[0]).toBe(200);
    expect(ws[130]).toBe(1500);
    for (let i = 1; i < ws.length; i++) assertInDelta(ws[i] - ws[i - 1], 10, 1e-9);
  });

  it('puts a caller-chosen wing loading on the grid when the range and count allow it', () => {
    // 400 Pa in [200, 1500] with 131 samples: step 10 Pa.
    expect(Array.from(sampleWingLoadings([200, 1500], 131))).toContain(400);
  });

  it('gives at least the two ends', () => {
    expect(Array.from(sampleWingLoadings([100, 900], 1))).toEqual([100, 900]);
  });
});
