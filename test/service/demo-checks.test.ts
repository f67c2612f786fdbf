import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { demoChecksFile, demoChecksText, matchingDemoChecks, ownDemoChecksFile, readDemoChecks } from '../../app/service/demo-checks';
import { checkAndEvaluate, demoConcepts, type CheckedConcept, type DemoConcept } from '../../app/service/engine';

const demos = demoConcepts();
const checkOf = (demo: DemoConcept): CheckedConcept => checkAndEvaluate(demo.concept, `demo concept "${demo.title}"`);

describe('the demo checks the build records beside the single file', () => {
  it('are found only beside a single-file build, under its own name', () => {
    expect(ownDemoChecksFile('file:///somewhere/app/service/demo-checks.ts')).toBeNull();
    expect(ownDemoChecksFile('file:///somewhere/out/cli/chunk-ABC.js')).toBeNull();
    const bundle = join(tmpdir(), 'loftpoint-cli-ABC.cjs');
    expect(ownDemoChecksFile(pathToFileURL(bundle).href)).toBe(demoChecksFile(bundle));
    expect(demoChecksFile(bundle)).toBe(`${bundle}.demo-checks.json`);
  });

  it('give back every demo\'s check as it was worked out', () => {
    const text = demoChecksText(demos, checkOf);
    const matched = matchingDemoChecks(text, demos);
    expect(matched.size).toBe(demos.length);
    for (const demo of demos) {
      const checked = matched.get(demo)!;
      expect(checked).toEqual(JSON.parse(JSON.stringify(checkOf(demo))));
      // Every demo is sized: a wing area on each (the summaries are the engine's, not placeholders).
      expect(checked.summary.sizing?.wingArea).toBeGreaterThan(0);
    }
  });

  it('are not used for a demo whose concept changed since, nor from a file that is not theirs', () => {
    const text = demoChecksText(demos, checkOf);
    const changed = demos.map((demo, i) => (i === 0 ? { ...demo, concept: { ...(demo.concept as object), name: 'Another name' } } : demo));
    const matched = matchingDemoChecks(text, changed);
    expect(matched.has(changed[0]!)).toBe(false);
    expect(matched.size).toBe(demos.length - 1);
    expect(matchingDemoChecks('{"demoChecks": [', demos).size).toBe(0);
    expect(matchingDemoChecks('{"somethingElse": []}', demos).size).toBe(0);
    // A recorded check of the wrong shape (no summary) is not taken either.
    const broken = JSON.parse(text) as { demoChecks: { checked: unknown }[] };
    broken.demoChecks[1]!.checked = { warnings: [] };
    expect(matchingDemoChecks(JSON.stringify(broken), demos).has(demos[1]!)).toBe(false);
  });

  it('read as nothing where there is no file', () => {
    const folder = mkdtempSync(join(tmpdir(), 'loftpoint-demo-checks-'));
    expect(readDemoChecks(null)).toBeNull();
    expect(readDemoChecks(join(folder, 'missing.json'))).toBeNull();
    writeFileSync(join(folder, 'there.json'), 'text');
    expect(readDemoChecks(join(folder, 'there.json'))).toBe('text');
  });
});
