/**
 * `loftpoint evaluate` on concepts with a mission: the JSON carries `mass`,
 * and a mission that cannot close ends with exit status 2 and one line naming
 * the mission field and the fraction that fails (run in-process through main()).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../app/cli/main';
import { bufferIO } from '../../app/cli/io';
import { DEMO_CONCEPTS } from '../../core';

const dir = mkdtempSync(join(tmpdir(), 'loftpoint-mission-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, change: (c: any) => void): string {
  const concept = structuredClone(DEMO_CONCEPTS.find((d) => d.slug === 'utility-twin')!.concept) as any;
  change(concept);
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify(concept, null, 2));
  return path;
}

describe('loftpoint evaluate with a mission', () => {
  it('--json carries the mass object in SI', async () => {
    const io = bufferIO();
    expect(await main(['evaluate', file('twin.json', () => {}), '--json'], io)).toBe(0);
    const json = JSON.parse(io.stdout());
    expect(Object.keys(json.mass)).toEqual(['takeoff', 'empty', 'fuel', 'battery', 'payload', 'crew', 'emptyFraction', 'growthFactor', 'iterations', 'segments', 'drivers']);
    expect(json.mass.payload).toBe(1250);
    expect(json.mass.battery).toBe(0);
    expect(Object.keys(json).indexOf('mass')).toBe(Object.keys(json).indexOf('sizing') + 1);
  });

  it('a mission that cannot close exits 2 with one line naming the field and the fractions', async () => {
    const io = bufferIO();
    const bad = file('far.json', (c) => {
      c.mission.segments[1].range = '12000 km';
      c.mission.emptyMassFraction = 0.6;
    });
    expect(await main(['evaluate', bad], io)).toBe(2);
    expect(io.stdout()).toBe('');
    const lines = io.stderr().trimEnd().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^loftpoint: .*far\.json: mission\.emptyMassFraction: empty-mass fraction 0\.60 plus fuel fraction 0\.\d\d add to 1\.\d\d and leave nothing for payload and crew; /);
  });

  it('--units us shows the mass section in pounds', async () => {
    const io = bufferIO();
    expect(await main(['evaluate', file('twin-us.json', () => {}), '--units', 'us'], io)).toBe(0);
    const text = io.stdout();
    expect(text).toMatch(/MASS \(closed from the mission\)\n  Take-off\s+[\d,]+ lb/);
    // 1,250 kg of payload is 2,756 lb (0.45359237 kg/lb, NIST SP 811).
    expect(text).toMatch(/Payload\s+2,756 lb/);
    expect(text).toMatch(/certification requirements come from the applicable authority/);
  });
});
