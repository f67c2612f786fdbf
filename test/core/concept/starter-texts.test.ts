/**
 * What the window shows of each starting concept says what the concept
 * holds: the summary's aspect ratio and clean CD0 are the concept's, each
 * placeholder requirement's label names its own speed or gradient and says it
 * is a starting value, the configurations named are the ones defined, and
 * the engine count matches. (Common practice: a label must not contradict
 * the value it labels.)
 */
import { describe, expect, it } from 'vitest';
import { AIRCRAFT_KINDS, CONCEPT_STARTERS, conceptStarter } from '../../../core';

const words = ['', 'one', 'two', 'three', 'four'];

describe('starting concepts: what is shown matches what is in them', () => {
  it('four kinds, each found by its kind, with distinct titles and summaries', () => {
    expect(AIRCRAFT_KINDS).toEqual(['single-piston', 'twin-turboprop', 'business-jet', 'small-uav']);
    for (const kind of AIRCRAFT_KINDS) expect(conceptStarter(kind)?.kind).toBe(kind);
    expect(new Set(CONCEPT_STARTERS.map((s) => s.title)).size).toBe(4);
    for (const s of CONCEPT_STARTERS) {
      expect(s.title.length).toBeGreaterThan(5);
      expect(s.summary.endsWith('.')).toBe(true);
    }
  });

  it.each(CONCEPT_STARTERS.map((s) => [s.kind, s] as const))('%s: the summary states its AR, CD0 and engines', (_kind, starter) => {
    const c = starter.concept('X') as any;
    expect(c.format).toBe('loftpoint-concept/1');
    const ar = /AR (\d+(?:\.\d+)?)/.exec(starter.summary);
    const cd0 = /CD0 (\d\.\d+)/.exec(starter.summary);
    expect(Number(ar?.[1])).toBe(c.aircraft.aero.aspectRatio);
    expect(Number(cd0?.[1])).toBe(c.aircraft.aero.configurations.clean.cd0);
    const engines = c.aircraft.propulsion.engines as number;
    expect(starter.summary.toLowerCase()).toContain(engines === 1 ? 'one ' : `${words[engines]} `);
    // Every configuration other than clean is named in the summary; a clean-only concept says so.
    const others = Object.keys(c.aircraft.aero.configurations).filter((n) => n !== 'clean');
    if (others.length === 0) expect(starter.summary).toContain('clean only');
    for (const name of others) expect(starter.summary.toLowerCase().replace('one-engine-out', 'engine-out').replace('take-off', 'takeoff')).toContain(name);
  });

  it.each(CONCEPT_STARTERS.map((s) => [s.kind, s] as const))('%s: each label names its own value and says it is a starting value', (_kind, starter) => {
    const c = starter.concept('X') as any;
    for (const r of c.requirements) {
      expect(r.label).toContain('starting value: replace with the programme requirement');
      if (r.kind === 'stall') expect(r.label).toContain(`Stall at most ${r.speed}`);
      if (r.kind === 'climb-gradient') expect(r.label).toContain(`gradient ${r.gradient}`);
    }
    expect(c.requirements.map((r: any) => r.kind)).toEqual(['stall', 'climb-gradient']);
    const [lo, hi] = c.diagram.wingLoading.map((v: string) => Number(v.split(' ')[0]));
    expect(lo).toBeLessThan(hi);
  });
});
