/**
 * A requirement kind's own typical ranges are checked on the requirement's
 * field (core/diagram/assumption-warnings.ts): a landing ground roll's
 * braking friction outside 0.15-0.5, the wet-to-dry span of Raymer,
 * Aircraft Design: A Conceptual Approach, Table 17.1 (from memory).
 */
import { describe, expect, it } from 'vitest';
import { assumptionWarnings } from '../../../core/diagram/assumption-warnings';
import { design, landingRoll, stall } from '../helpers/design';

describe('a braking friction outside its typical range', () => {
  it('is named by the requirement\'s field, with the range and its source', () => {
    // 0.8 is above the dry-runway 0.5; the stall requirement before it makes the landing requirements[1].
    const warnings = assumptionWarnings(design({ requirements: [stall(30), landingRoll(400, { brakingFriction: 0.8 })], rangePa: [100, 2000] }));
    expect(warnings).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'requirements[1].brakingFriction',
        message: 'Braking friction 0.8 is outside the typical range: 0.3-0.5 dry, 0.15-0.3 wet (Raymer, Table 17.1).',
      },
    ]);
  });

  it('gives no warning for a wet-runway 0.2', () => {
    expect(assumptionWarnings(design({ requirements: [landingRoll(400, { brakingFriction: 0.2 })], rangePa: [100, 2000] }))).toEqual([]);
  });
});
