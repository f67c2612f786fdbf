/**
 * Span and mean chord in `loftpoint evaluate`: the JSON (SI) and the text
 * report in every unit system, checked against values worked by hand.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runInProcess } from './run-in-process';
import { DEMO_CONCEPTS } from '../../core';

let dir: string;
let jet: string;

const run = runInProcess;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-span-'));
  jet = join(dir, 'jet.json');
  // Without its mission, so the written take-off mass is the one sized (the closed mass has its own tests).
  const { mission: _mission, ...concept } = DEMO_CONCEPTS.find((d) => d.slug === 'business-jet')!.concept as Record<string, unknown>;
  writeFileSync(jet, JSON.stringify(concept));
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

// The business-jet demo's design point: 7,400 kg at 3,400 N/m^2, aspect ratio 8.6. By hand:
// S = 7400 x 9.80665 / 3400 = 21.3439 m^2 (g0, CGPM 1901); b = sqrt(AR S) = sqrt(183.558) = 13.5483 m;
// c = S/b = 1.57539 m (AR = b^2/S, Anderson, Introduction to Flight); 1 ft = 0.3048 m (NIST SP 811):
// b = 44.450 ft, c = 5.1686 ft.
describe('span and mean chord', () => {
  it('are in --json sizing, in metres', async () => {
    const { code, stdout } = await run('evaluate', jet, '--json');
    expect(code).toBe(0);
    const sizing = JSON.parse(stdout).sizing;
    expect(sizing.span).toBeCloseTo(13.5483, 3);
    expect(sizing.meanChord).toBeCloseTo(1.57539, 4);
  });

  it('are in the text report in SI, US and knots-feet units', async () => {
    const rows = async (units: string) => {
      const { code, stdout } = await run('evaluate', jet, '--units', units);
      expect(code).toBe(0);
      return [stdout.match(/^\s+Span\s+(.*)$/m)?.[1], stdout.match(/^\s+Mean chord\s+(.*)$/m)?.[1]];
    };
    expect(await rows('si')).toEqual(['13.55 m (aspect ratio 8.6)', '1.58 m']);
    expect(await rows('us')).toEqual(['44.4 ft (aspect ratio 8.6)', '5.2 ft']);
    expect(await rows('kt-ft')).toEqual(['44.4 ft (aspect ratio 8.6)', '5.17 ft']);
  });
});
