/**
 * "Did you mean": the nearest known name by edit distance (Levenshtein, 1966:
 * one insertion, deletion or substitution costs 1; a swap of two neighbours
 * costs 2), accepted when within a third of the written word's length, at
 * least 1 and at most 3. Distances below are counted by hand in each comment.
 */
import { describe, expect, it } from 'vitest';
import { closestName } from '../../../core/concept/suggest';

describe('closestName', () => {
  it('finds aspectRatio for aspectRatoi (two substitutions, within 3 for 11 letters)', () => {
    expect(closestName('aspectRatoi', ['cd0', 'aspectRatio', 'configurations'])).toBe('aspectRatio');
  });

  it('ignores case: ASPECTRATIO is aspectRatio at distance 0', () => {
    expect(closestName('ASPECTRATIO', ['aspectRatio', 'aspectRatios'])).toBe('aspectRatio');
    expect(closestName('Cd0', ['cd0'])).toBe('cd0');
  });

  it('takes the nearest of several, not the first close enough', () => {
    // speeed -> speed: 1 deletion; speeed -> seed: 2 deletions.
    expect(closestName('speeed', ['seed', 'speed'])).toBe('speed');
    expect(closestName('speeed', ['speed', 'seed'])).toBe('speed');
  });

  it('keeps the first of two equally near names', () => {
    // cat -> bat and cat -> cut: one substitution each.
    expect(closestName('cat', ['bat', 'cut'])).toBe('bat');
    expect(closestName('cat', ['cut', 'bat'])).toBe('cut');
  });

  it('allows one edit in a word of up to five letters', () => {
    // ab -> ac: 1 substitution (allowed max(1, floor(2/3)) = 1); ab -> cd: 2.
    expect(closestName('ab', ['ac'])).toBe('ac');
    expect(closestName('ab', ['cd'])).toBeUndefined();
    // A swap of neighbours is two edits: ab -> ba.
    expect(closestName('ab', ['ba'])).toBeUndefined();
    // kind -> kinds: 1 insertion; kind -> kit: 1 substitution + 1 deletion = 2.
    expect(closestName('kind', ['kinds'])).toBe('kinds');
    expect(closestName('kind', ['kit'])).toBeUndefined();
  });

  it('allows two edits from six letters and three from nine, never more', () => {
    // clmaxx (6 letters, allowed 2) -> clMax: 1 deletion; -> cd0: 5 edits.
    expect(closestName('clmaxx', ['cd0', 'clMax'])).toBe('clMax');
    // kitten -> sitting: 3 (k->s, e->i, +g); 6 letters allow 2.
    expect(closestName('kitten', ['sitting'])).toBeUndefined();
    // kittens (7 letters, allowed 2) -> sitting: k->s, e->i, s->g = 3.
    expect(closestName('kittens', ['sitting'])).toBeUndefined();
    // enginesxx (9 letters, allowed 3) -> engines: 2 deletions; -> engine: 3 deletions.
    expect(closestName('enginesxx', ['engine'])).toBe('engine');
    // 9 letters, 4 edits: abcdefghi -> abcdewxyz.
    expect(closestName('abcdefghi', ['abcdewxyz'])).toBeUndefined();
    // 5 letters allow 1: abcde -> abxye is 2.
    expect(closestName('abcde', ['abxye'])).toBeUndefined();
    // 15 letters still allow only 3: 4 substitutions refused, 3 accepted.
    expect(closestName('abcdefghijklmno', ['abcdefghijkwxyz'])).toBeUndefined();
    expect(closestName('abcdefghijklmno', ['abcdefghijklxyz'])).toBe('abcdefghijklxyz');
  });

  it('counts insertions, deletions and substitutions anywhere in the word', () => {
    // Each at distance 1 from "takeoffmass" (11 letters, allowed 3) and the only candidate.
    expect(closestName('takeofmass', ['takeoffMass'])).toBe('takeoffMass');
    expect(closestName('xtakeoffmass', ['takeoffMass'])).toBe('takeoffMass');
    expect(closestName('takeoffmasz', ['takeoffMass'])).toBe('takeoffMass');
    // Nearest wins by exact distance: 1 insertion (a) against 2 (b).
    expect(closestName('takeoffmas', ['takeoffMass', 'takeoffMas'.concat('sx'), 'takeoffMas'])).toBe('takeoffMas');
    expect(closestName('takeoffmas', ['takeoffMassxx', 'takeoffMass'])).toBe('takeoffMass');
  });

  it('finds nothing among no candidates', () => {
    expect(closestName('speed', [])).toBeUndefined();
  });
});
