/**
 * A requirement of a kind without a speed field that no plotted wing loading
 * can meet is named by its own path, with the general sentence
 * (core/diagram/boundary-warnings.ts).
 *
 * Hand derivation: a take-off distance includes the rotation, flown for the
 * rotation time at lift-off speed, s_R = t_R V_LOF (Raymer, Aircraft Design:
 * A Conceptual Approach, ch. 17, from memory; core/requirements/takeoff-distance.ts).
 * With t_R = 3 s and V_LOF = 1.1 V_s, V_s = sqrt(2 w / (rho C_Lmax)) at sea level
 * (rho = 1.225 kg/m^3, U.S. Standard Atmosphere 1976) and the take-off
 * C_Lmax 1.8, the least plotted wing loading, 100 Pa, gives
 * V_s = sqrt(200 / 2.205) = 9.524 m/s, V_LOF = 10.48 m/s and s_R = 31.4 m:
 * a 10 m take-off distance cannot be met at any w from 100 Pa up, whatever the
 * thrust.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../../core/diagram';
import { aircraft, design, takeoffDistance } from '../helpers/design';

describe('a take-off distance shorter than its rotation alone', () => {
  it('is reported as unattainable on the requirement itself, with no speed to blame', () => {
    const e = evaluateDesign(
      design({ aircraft: aircraft({ kind: 'turbofan', engines: 2 }), requirements: [takeoffDistance(10, { id: 'short-field' })], rangePa: [100, 3000], samples: 11 }),
    );
    expect(e.warnings.filter((w) => w.code === 'requirement-unattainable')).toEqual([
      { code: 'requirement-unattainable', field: 'requirements[0]', message: 'Requirement "short-field" cannot be met at any plotted wing loading.' },
    ]);
    expect(e.optimum).toBeNull();
  });
});
