/**
 * A requirement's fractions written as the trade writes them: "88 %" of
 * take-off mass, "75 %" power, "82 %" propeller efficiency (README.md: mass
 * fractions and power settings as "75 %"). A percent is a hundredth (ISO
 * 80000-1; common practice), so each reads as the plain number it stands for.
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { exampleConcept } from './fixture';

function cruiseWith(fields: Record<string, unknown>) {
  const concept = exampleConcept();
  Object.assign(concept.requirements[1], fields);
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  const cruise = parsed.design.requirements.find((r) => r.id === 'cruise');
  if (!cruise) throw new Error('no cruise requirement');
  return cruise;
}

describe('fractions of a requirement written in percent', () => {
  it('reads "88 %", "75 %" and "82 %" as 0.88, 0.75 and 0.82', () => {
    const cruise = cruiseWith({ massFraction: '88 %', powerSetting: '75 %', propellerEfficiency: '82 %' });
    expect(cruise.massFraction).toBeCloseTo(0.88, 12);
    expect(cruise.powerSetting).toBeCloseTo(0.75, 12);
    expect(cruise.propellerEfficiency).toBeCloseTo(0.82, 12);
  });

  it('reads the same fractions written as plain numbers unchanged', () => {
    const cruise = cruiseWith({ massFraction: 0.88, powerSetting: 0.75, propellerEfficiency: 0.82 });
    expect([cruise.massFraction, cruise.powerSetting, cruise.propellerEfficiency]).toEqual([0.88, 0.75, 0.82]);
  });
});
