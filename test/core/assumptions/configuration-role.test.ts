/**
 * Which configuration names count as take-off and which as landing, as the
 * trade names flap settings and flight phases (common practice: "take-off
 * flaps", "second segment", "approach flaps", "landing flaps").
 */
import { describe, expect, it } from 'vitest';
import { configurationRole } from '../../../core/assumptions/configuration-role';

describe('configuration roles', () => {
  it('reads "clean" as clean, in that exact spelling only', () => {
    expect(configurationRole('clean')).toBe('clean');
    // Any other spelling is a name of the user's own, with no known role.
    expect(configurationRole('Clean')).toBe('other');
    expect(configurationRole('cruise')).toBe('other');
  });

  it('reads landing and approach settings as landing, whatever the case', () => {
    for (const name of ['landing', 'Landing', 'landing-full', 'approach', 'APPROACH', 'flaps-approach', 'balked-landing-climb']) {
      expect(configurationRole(name), name).toBe('landing');
    }
  });

  it('reads take-off, second-segment and climb settings as take-off, whatever the case', () => {
    for (const name of ['takeoff', 'TakeOff', 'take-off', 'Take-Off-15', 'second-segment', 'Second-Segment', 'climb', 'en-route-CLIMB']) {
      expect(configurationRole(name), name).toBe('takeoff');
    }
  });

  it('gives other names no role', () => {
    for (const name of ['engine-out', 'ferry', 'second segment', 'take off', '']) expect(configurationRole(name), name).toBe('other');
  });
});
