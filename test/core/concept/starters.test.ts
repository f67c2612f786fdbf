/**
 * Starting concepts by kind of aircraft: each is a valid concept with no
 * warnings (its values inside the typical ranges), the configurations its kind
 * flies in, and a stall line where the stall equation puts it by hand.
 */
import { describe, expect, it } from 'vitest';
import { CONCEPT_STARTERS, conceptStarter, evaluateDesign, parseConcept } from '../../../core';

// ISA sea-level density 1.2250 kg/m^3 (U.S. Standard Atmosphere 1976); 1 kt = 1852/3600 m/s (NIST SP 811).
const RHO0 = 1.225;
const KT = 1852 / 3600;

describe('concept starters', () => {
  it.each(CONCEPT_STARTERS.map((s) => [s.kind, s] as const))('%s: parses without issues or warnings and keeps the name given', (_kind, starter) => {
    const parsed = parseConcept(starter.concept('Study A'));
    if (!parsed.ok) throw new Error(parsed.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
    expect(parsed.warnings).toEqual([]);
    expect((parsed.concept as { name: string }).name).toBe('Study A');
    const evaluation = evaluateDesign(parsed.design);
    expect(evaluation.optimum).not.toBeNull();
  });

  it('each call is a fresh object: editing one starter concept leaves the next untouched', () => {
    const one = conceptStarter('single-piston')!.concept('A') as { aircraft: { takeoffMass: string } };
    one.aircraft.takeoffMass = '1 kg';
    expect((conceptStarter('single-piston')!.concept('B') as { aircraft: { takeoffMass: string } }).aircraft.takeoffMass).toBe('1100 kg');
  });

  it('single piston: the stall line sits at w = rho0 V^2 CLmax / 2 for 61 kt in landing flaps (by hand)', () => {
    // 61 kt is the traditional stall-speed ceiling for light single-engine aeroplanes (common practice).
    const parsed = parseConcept(conceptStarter('single-piston')!.concept('A'));
    if (!parsed.ok) throw new Error('does not parse');
    const stall = evaluateDesign(parsed.design).boundaries.find((b) => b.id === 'stall');
    const byHand = 0.5 * RHO0 * (61 * KT) ** 2 * 2.1; // 1266.9 N/m^2
    expect(stall && 'wingLoadingMax' in stall ? stall.wingLoadingMax : NaN).toBeCloseTo(byHand, 0);
  });

  it('the twin has a one-engine-out configuration; the drone flies clean only', () => {
    expect(Object.keys((conceptStarter('twin-turboprop')!.concept('T').aircraft.aero.configurations))).toEqual(['clean', 'takeoff', 'landing', 'engine-out']);
    expect(Object.keys((conceptStarter('small-uav')!.concept('D').aircraft.aero.configurations))).toEqual(['clean']);
    expect(conceptStarter('airship')).toBeUndefined();
  });
});
