// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { rangeableFields, resolveUncertainty, typicalRange, typicalUncertainty } from '../../../core/studies';
import { DEMO_SLUGS, demo } from './fixtures';

const trainer = demo('trainer');
const jet = demo('business-jet');
const range = (field: string, d = trainer) => {
  const r = typicalRange(field, d.design);
  return r ? [r.low, r.high] : null;
};

describe('typicalRange', () => {
  it('offers the published typical ranges of core/methods.md section 9', () => {
    // core/methods.md section 9: e 0.7-0.95 (common practice); clean CLmax 1.2-1.5 (common practice);
    // light-aircraft CD0 0.025-0.035 and business-jet CD0 0.018-0.025 (common practice);
    // take-off run eta_p 0.5-0.6 (common practice); dry paved mu 0.02-0.05 (Brandt et al.).
    expect(range('aircraft.aero.configurations.clean.oswaldEfficiency')).toEqual([0.7, 0.95]);
    expect(range('aircraft.aero.configurations.clean.clMax')).toEqual([1.2, 1.5]);
    expect(range('aircraft.aero.configurations.clean.cd0')).toEqual([0.025, 0.035]);
    expect(range('aircraft.aero.configurations.clean.cd0', jet)).toEqual([0.018, 0.025]);
    // The utility twin's gravel strip (0.05) sits at the top of the dry-paved class (the jet states a balanced field, without friction).
    expect(range('requirements.takeoff-strip.rollingFriction', demo('utility-twin'))).toEqual([0.02, 0.05]);
  });

  it('offers the configuration ranges of core/methods.md sections 3 and 9 by configuration', () => {
    // Roskam, Airplane Design I, Tables 3.1 and 3.6 as given in core/methods.md (from memory there):
    // landing CLmax 1.6-2.8, take-off CLmax 1.4-2.2, landing e 0.70-0.75, landing-flap dCD0 0.055-0.075.
    expect(range('aircraft.aero.configurations.landing.clMax')).toEqual([1.6, 2.8]);
    expect(range('aircraft.aero.configurations.takeoff.clMax')).toEqual([1.4, 2.2]);
    expect(range('aircraft.aero.configurations.landing.oswaldEfficiency')).toEqual([0.7, 0.75]);
    expect(range('aircraft.aero.configurations.landing.cd0Increment')).toEqual([0.055, 0.075]);
  });

  it('picks the class that contains the value, or widens the nearest one to contain it', () => {
    // Grass strip rolling friction 0.05 lies in the dry-paved class 0.02-0.05 (core/methods.md section 9).
    expect(range('requirements.takeoff-grass.rollingFriction')).toEqual([0.02, 0.05]);
    // Business-jet AR 8.6 is outside every class; the nearest (about 10, taken as 9-11) widens down to it.
    const ar = typicalRange('aircraft.aero.aspectRatio', jet.design);
    expect(ar && [ar.low, ar.high, ar.widened]).toEqual([8.6, 11, true]);
  });

  it('gives no range where core/methods.md publishes none, and none for a field the concept lacks', () => {
    expect(typicalRange('aircraft.aero.cdLinear', trainer.design)).toBeNull();
    expect(typicalRange('aircraft.propulsion.lapseExponent', trainer.design)).toBeNull();
  });

  it('names its source beside every range', () => {
    for (const field of rangeableFields(jet.design)) {
      const r = typicalRange(field, jet.design);
      if (r) expect(r.source, field).toMatch(/methods reference, section \d/);
    }
  });
});

describe('typicalUncertainty', () => {
  it('gives a block that resolves for every demo, each range containing the concept value', () => {
    for (const slug of DEMO_SLUGS) {
      const d = demo(slug);
      const block = typicalUncertainty(d.design);
      expect(block.parameters.length, slug).toBeGreaterThan(5);
      const resolved = resolveUncertainty(block, d.design, d.concept);
      expect(resolved.ok ? [] : resolved.issues, slug).toEqual([]);
    }
  });
});
