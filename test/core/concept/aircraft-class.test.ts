/**
 * The optional aircraft class (README.md: which kind of aircraft, so the
 * studies start from that kind's typical ranges) reaches the design as
 * written, and a concept without one has none.
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { exampleConcept } from './fixture';

function aircraftOf(change: (c: ReturnType<typeof exampleConcept>) => void) {
  const concept = exampleConcept();
  change(concept);
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.design.aircraft;
}

describe('the aircraft class', () => {
  it('is carried as written', () => {
    expect(aircraftOf((c) => (c.aircraft.class = 'sailplane')).class).toBe('sailplane');
    expect(aircraftOf((c) => (c.aircraft.class = 'light-aircraft')).class).toBe('light-aircraft');
  });

  it('is absent when not written', () => {
    expect('class' in aircraftOf(() => {})).toBe(false);
  });
});
