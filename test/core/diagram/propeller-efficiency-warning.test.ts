/**
 * A propeller efficiency outside the typical range of its requirement kind is
 * warned on the requirement's field, by name (core/diagram/assumption-warnings.ts).
 * Cruise propeller efficiency about 0.8 (common practice), accepted from 0.7
 * to 0.9; a jet has no propeller, so its requirements are not checked.
 */
import { describe, expect, it } from 'vitest';
import { assumptionWarnings } from '../../../core/diagram/assumption-warnings';
import { aircraft, cruise, design } from '../helpers/design';

describe('a cruise propeller efficiency outside its typical range', () => {
  it('is named on a piston aircraft', () => {
    const warnings = assumptionWarnings(design({ requirements: [cruise(60, { propellerEfficiency: 0.95 })], rangePa: [100, 2000] }));
    expect(warnings).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'requirements[0].propellerEfficiency',
        message: 'Propeller efficiency 0.95 is outside the typical range: about 0.8 in cruise (common practice).',
      },
    ]);
  });

  it('is not checked for a jet', () => {
    const jet = aircraft({ kind: 'turbofan', engines: 2 });
    expect(assumptionWarnings(design({ aircraft: jet, requirements: [cruise(60, { propellerEfficiency: 0.95 })], rangePa: [100, 2000] }))).toEqual([]);
  });
});
