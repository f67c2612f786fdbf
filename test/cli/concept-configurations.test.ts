/**
 * `loftpoint concept add-configuration | rename-configuration |
 * remove-configuration`: the edited concept evaluates as the file says.
 * References: a configuration that states nothing but its CD0 increment has
 * clean's e and CLmax (core/methods.md section 3); renaming changes no number.
 */
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bufferIO } from '../../app/cli/io';
import { main } from '../../app/cli/main';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';

let dir: string;
let trainer: string;
const original = () => structuredClone(DEMO_CONCEPTS.find((d) => d.slug === 'trainer')!.concept) as any;

async function run(...args: string[]) {
  const io = bufferIO();
  const code = await main(args, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-configurations-'));
  trainer = join(dir, 'trainer.json');
  writeFileSync(trainer, JSON.stringify(original(), null, 2));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('loftpoint concept ...-configuration', () => {
  it('adds a configuration with clean values where none are given, and the climb flown in it reads them', async () => {
    const added = await run('concept', 'add-configuration', trainer, 'engine-out', '--cd0-increment', '0.02');
    expect(added.code, added.stderr).toBe(0);
    const concept = JSON.parse(added.stdout);
    expect(concept.aircraft.aero.configurations['engine-out']).toEqual({ cd0Increment: 0.02 });
    concept.requirements.find((r: any) => r.id === 'climb-83').configuration = 'engine-out';
    const parsed = parseConcept(concept);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    // Clean's e 0.79 and CLmax 1.45 and C_D0 0.029 + 0.02 (the demo's clean values; core/methods.md section 3).
    expect(parsed.design.aircraft.configurations['engine-out']).toEqual({ cd0: 0.029 + 0.02, oswaldEfficiency: 0.79, clMax: 1.45 });
    expect(readFileSync(trainer, 'utf8')).toBe(JSON.stringify(original(), null, 2));
  });

  it('renames a configuration, with the requirements flown in it (named or by default), and changes no number', async () => {
    const out = join(dir, 'renamed.json');
    const renamed = await run('concept', 'rename-configuration', trainer, 'takeoff', 'flaps-10', '--out', out);
    expect(renamed.code, renamed.stderr).toBe(0);
    expect(renamed.stdout).toMatch(/Renamed configuration "takeoff" to "flaps-10"; wrote the concept to .*\nPreliminary sizing only/);
    const concept = JSON.parse(readFileSync(out, 'utf8'));
    expect(Object.keys(concept.aircraft.aero.configurations)).toEqual(['clean', 'flaps-10', 'landing']);
    // The take-off roll named no configuration (its kind's default is take-off); it now names the new one.
    expect(concept.requirements.find((r: any) => r.id === 'takeoff-grass').configuration).toBe('flaps-10');
    const before = parseConcept(original());
    const after = parseConcept(concept);
    if (!before.ok || !after.ok) throw new Error('both must parse');
    expect(evaluateDesign(after.design).optimum).toEqual(evaluateDesign(before.design).optimum);
  });

  it('removes an unused configuration, and refuses clean, one still flown, a taken name and the input as output', async () => {
    const withSpare = original();
    withSpare.aircraft.aero.configurations.spare = { cd0Increment: 0.01 };
    const spare = join(dir, 'spare.json');
    writeFileSync(spare, JSON.stringify(withSpare));
    const removed = await run('concept', 'remove-configuration', spare, 'spare');
    expect(removed.code, removed.stderr).toBe(0);
    expect(JSON.parse(removed.stdout)).toEqual(original());
    expect(await run('concept', 'remove-configuration', trainer, 'clean')).toMatchObject({ code: 2, stderr: `loftpoint: ${trainer}: aircraft.aero.configurations.clean: is the reference configuration and cannot be removed\n` });
    const flown = await run('concept', 'remove-configuration', trainer, 'landing');
    expect(flown.code).toBe(2);
    expect(flown.stderr).toMatch(/requirements\[0\]\.configuration: requirements "stall", "landing-grass" still fly in "landing"/);
    expect((await run('concept', 'add-configuration', trainer, 'landing')).stderr).toMatch(/configurations\.landing: already exists/);
    expect((await run('concept', 'add-configuration', trainer, 'eo', '--oswald', '1.2')).stderr).toMatch(/eo\.oswaldEfficiency: the edited concept would not be valid/);
    expect((await run('concept', 'rename-configuration', trainer, 'landing', 'x', '--out', trainer)).code).toBe(2);
    expect(readFileSync(trainer, 'utf8')).toBe(JSON.stringify(original(), null, 2));
    expect(existsSync(join(dir, 'x'))).toBe(false);
  });
});
