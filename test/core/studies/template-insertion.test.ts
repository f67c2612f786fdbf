/**
 * A requirement template inserted into a concept: the exact lines the
 * engineer reads, the id it gets, and the configuration it flies in.
 * Engine-out counts are those of the rules' own wording (14 CFR 25.121:
 * "one engine inoperative" for two-, three- and four-engine aeroplanes;
 * 14 CFR 23.2120(b): multiengine aeroplanes, one engine inoperative).
 */
import { describe, expect, it } from 'vitest';
import { REQUIREMENT_TEMPLATES, templateRequirement, type RequirementTemplate } from '../../../core/studies';

const byId = (id: string) => REQUIREMENT_TEMPLATES.find((t) => t.id === id) as RequirementTemplate;
const SECOND_SEGMENT = byId('14cfr-25.121b-2eng'); // 14 CFR 25.121(b), written for two engines, one out
const APPROACH = byId('14cfr-25.121d-2eng'); // 14 CFR 25.121(d): approach configuration, else landing
const OEI_400FT = byId('14cfr-23.2120b2'); // 14 CFR 23.2120(b)(2): two engines, one out, not a 25.121 row
const ALL_ENGINES = byId('14cfr-23.65b'); // 14 CFR 23.65(b): all engines, no configuration named

describe('templateRequirement: refusals and notes, word for word', () => {
  it('refuses an engine-out rule for one engine, in the singular, naming the field', () => {
    expect(templateRequirement(SECOND_SEGMENT, { configurations: ['clean'], requirementIds: [], engines: 1 })).toEqual({
      ok: false,
      message: '14 CFR 25.121(b) is an engine-out rule; the concept has 1 engine (aircraft.propulsion.engines)',
    });
  });

  it('refuses a rule with as many engines out as the concept has, in the plural', () => {
    // An invented rule with two engines out, for a twin: nothing would be left running.
    const twoOut: RequirementTemplate = { ...SECOND_SEGMENT, source: 'Invented rule 1', requirement: { ...SECOND_SEGMENT.requirement, enginesInoperative: 2 } };
    expect(templateRequirement(twoOut, { configurations: ['clean'], requirementIds: [], engines: 2 })).toEqual({
      ok: false,
      message: 'Invented rule 1 is an engine-out rule; the concept has 2 engines (aircraft.propulsion.engines)',
    });
    // With three engines one is left: accepted.
    expect(templateRequirement(twoOut, { configurations: ['clean'], requirementIds: [], engines: 3 }).ok).toBe(true);
  });

  it('accepts a one-engine-out rule for a twin with no note when the row is written for two engines', () => {
    const result = templateRequirement(SECOND_SEGMENT, { configurations: ['clean'], requirementIds: [], engines: 2 });
    expect(result).toEqual({ ok: true, requirement: { ...SECOND_SEGMENT.requirement }, notes: [] });
  });

  it('notes a 25.121 row written for another engine count, in one sentence', () => {
    const result = templateRequirement(SECOND_SEGMENT, { configurations: ['clean'], requirementIds: [], engines: 4 });
    expect(result.ok && result.notes).toEqual(['This row of 14 CFR 25.121(b) is for 2 engines; the concept has 4.']);
  });

  it('adds no engine-count note to a rule outside 25.121, nor to one without an engine count', () => {
    // 14 CFR 23.2120(b)(2) has one gradient for every multiengine aeroplane: a three-engine concept needs no note.
    const threeEngines = templateRequirement(OEI_400FT, { configurations: ['clean'], requirementIds: [], engines: 3 });
    expect(threeEngines.ok && threeEngines.notes).toEqual([]);
    const allEngines = templateRequirement(ALL_ENGINES, { configurations: ['clean'], requirementIds: [], engines: 3 });
    expect(allEngines.ok && allEngines.notes).toEqual([]);
    // A 25.121 row with no engine count of its own (made by hand: every shipped row has one) needs no note either.
    const { engines: _engines, ...countless } = SECOND_SEGMENT;
    const noCount = templateRequirement(countless, { configurations: ['clean'], requirementIds: [], engines: 3 });
    expect(noCount.ok && noCount.notes).toEqual([]);
  });
});

describe('templateRequirement: configuration and id', () => {
  it('takes the first configuration in the rule\'s own order that the concept defines', () => {
    // 25.121(d) means the approach configuration; a concept with landing and approach flies it in approach.
    const both = templateRequirement(APPROACH, { configurations: ['clean', 'landing', 'approach'], requirementIds: [], engines: 2 });
    expect(both.ok && [both.requirement.configuration, both.notes]).toEqual(['approach', []]);
    const landingOnly = templateRequirement(APPROACH, { configurations: ['clean', 'landing'], requirementIds: [], engines: 2 });
    expect(landingOnly.ok && landingOnly.requirement.configuration).toBe('landing');
  });

  it('says which configuration to define when the concept has none the rule means', () => {
    const result = templateRequirement(APPROACH, { configurations: ['clean'], requirementIds: [], engines: 2 });
    expect(result.ok && result.notes).toEqual([
      "The rule means the approach configuration, which the concept does not define; define aircraft.aero.configurations.approach and set this requirement's configuration to it.",
    ]);
    expect(result.ok && 'configuration' in result.requirement).toBe(false);
  });

  it('sets no configuration for a rule that names none', () => {
    const result = templateRequirement(ALL_ENGINES, { configurations: ['clean', 'takeoff'], requirementIds: [], engines: 1 });
    expect(result.ok && 'configuration' in result.requirement).toBe(false);
  });

  it('keeps the template\'s id while it is free, else numbers it from 2, leaving the template itself alone', () => {
    const target = (requirementIds: string[]) => ({ configurations: ['clean'], requirementIds, engines: 2 });
    const free = templateRequirement(SECOND_SEGMENT, target(['stall', '14cfr-25.121b-2eng-2']));
    expect(free.ok && free.requirement.id).toBe('14cfr-25.121b-2eng');
    const taken = templateRequirement(SECOND_SEGMENT, target(['14cfr-25.121b-2eng']));
    expect(taken.ok && taken.requirement.id).toBe('14cfr-25.121b-2eng-2');
    expect(SECOND_SEGMENT.requirement.id).toBe('14cfr-25.121b-2eng');
    const third = templateRequirement(SECOND_SEGMENT, target(['14cfr-25.121b-2eng-3', '14cfr-25.121b-2eng', '14cfr-25.121b-2eng-2']));
    expect(third.ok && third.requirement.id).toBe('14cfr-25.121b-2eng-4');
  });
});
