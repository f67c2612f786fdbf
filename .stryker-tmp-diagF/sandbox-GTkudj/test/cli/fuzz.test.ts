/**
 * Generated concept files through `loftpoint evaluate`, in process: the demo
 * concepts with random fields replaced, removed or duplicated (fast-check).
 * Whatever the file says, the command ends with exit 0 or 2 (never a crash,
 * exit 1 or a stack trace), and no output (report, --json, --csv, --svg)
 * holds "NaN", "Infinity" or "undefined". The number of files is
 * LOFTPOINT_FUZZ_RUNS (default 1,000 in the normal suite; 10,000 for a long run).
 */
// @ts-nocheck

import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main } from '../../app/cli/main';
import { bufferIO } from '../../app/cli/io';
import { DEMO_CONCEPTS } from '../../core';

const RUNS = Number(process.env.LOFTPOINT_FUZZ_RUNS ?? 1000);
const FORBIDDEN = /NaN|Infinity|undefined/;

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-fuzz-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every path into a JSON value, objects and lists included. */
function pathsOf(value: Json, prefix: Array<string | number> = []): Array<Array<string | number>> {
  const own = [prefix];
  if (Array.isArray(value)) return [...own, ...value.flatMap((item, i) => pathsOf(item, [...prefix, i]))];
  if (value !== null && typeof value === 'object') return [...own, ...Object.entries(value).flatMap(([key, item]) => pathsOf(item, [...prefix, key]))];
  return own;
}

const UNITS = ['kg', 'lb', 'kt', 'm/s', 'km/h', 'ft/min', 'ft', 'm', 'nmi', 'N/m^2', 'lb/ft^2', 'psf', '%', 'deg', 'K', 'hp/lb', 'W/N', 's', '', 'kts', 'KT', 'parsec'];
const EXTREME = ['0', '-0', '1e308', '1e-320', '5e-324', '1e60', '9e59', '1e-59', '-1', '1e5', '0.0001', '45', '750', '2.4'];

/** Text that cannot smuggle the forbidden words in by itself: letters only from a small alphabet. */
const safeText = fc.string({ maxLength: 12, unit: fc.constantFrom('a', 'b', 'k', 't', ' ', '-', '"', '\\', '{', '\n', 'é') });

const quantityText = fc
  .tuple(fc.oneof(fc.constantFrom(...EXTREME), fc.double({ noNaN: true, noDefaultInfinity: true }).map(String)), fc.constantFrom(...UNITS))
  .map(([number, unit]) => (unit === '' ? number : `${number} ${unit}`))
  .filter((text) => !FORBIDDEN.test(text));

const leaf: fc.Arbitrary<Json> = fc.oneof(
  quantityText,
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: -3, max: 6000 }),
  fc.constantFrom(null, true, false, 0, -0, 1e308, 5e-324),
  safeText,
  fc.constantFrom('piston', 'turboprop', 'turbofan', 'electric', 'stall', 'cruise', 'clean', 'landing', 'takeoff', 'toString', '__proto__', 'constructor'),
);
const value: fc.Arbitrary<Json> = fc.oneof(
  { weight: 6, arbitrary: leaf },
  { weight: 1, arbitrary: fc.array(leaf, { maxLength: 3 }) },
  { weight: 1, arbitrary: fc.dictionary(fc.constantFrom('kind', 'id', 'speed', 'samples', 'toString', 'clMax'), leaf, { maxKeys: 3 }) },
);

type Mutation = { at: number; kind: 'replace'; value: Json } | { at: number; kind: 'delete' } | { at: number; kind: 'copy-requirement' };
const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 5, arbitrary: fc.record({ at: fc.nat(), kind: fc.constant('replace' as const), value }) },
  { weight: 2, arbitrary: fc.record({ at: fc.nat(), kind: fc.constant('delete' as const) }) },
  { weight: 1, arbitrary: fc.record({ at: fc.nat(), kind: fc.constant('copy-requirement' as const) }) },
);

function mutate(base: Json, mutations: Mutation[]): Json {
  const root = structuredClone(base) as { [key: string]: Json };
  for (const change of mutations) {
    if (change.kind === 'copy-requirement') {
      const list = root.requirements;
      if (Array.isArray(list) && list.length > 0) list.push(structuredClone(list[change.at % list.length]));
      continue;
    }
    const paths = pathsOf(root).filter((path) => path.length > 0);
    if (paths.length === 0) continue;
    const path = paths[change.at % paths.length];
    let parent: Json = root;
    for (const key of path.slice(0, -1)) parent = (parent as Record<string | number, Json>)[key];
    const last = path[path.length - 1];
    if (change.kind === 'delete') {
      if (Array.isArray(parent)) parent.splice(last as number, 1);
      else delete (parent as Record<string, Json>)[last as string];
    } else (parent as Record<string | number, Json>)[last] = change.value;
  }
  // Keep the sampling modest so the run stays within its time; the limits themselves are tested elsewhere.
  const diagram = root.diagram as { samples?: unknown } | undefined;
  if (diagram && typeof diagram === 'object' && typeof diagram.samples === 'number' && diagram.samples > 1000) diagram.samples = 1000;
  return root;
}

const concept = fc.record({
  base: fc.constantFrom(...DEMO_CONCEPTS.map((demo) => demo.concept as unknown as Json)),
  mutations: fc.array(mutation, { minLength: 0, maxLength: 4 }),
  mode: fc.constantFrom('text', 'json', 'csv', 'svg'),
  units: fc.constantFrom('si', 'us'),
});

describe(`loftpoint evaluate on ${RUNS.toLocaleString('en-US')} generated concept files`, () => {
  it('exits 0 or 2 and never prints NaN, Infinity or undefined', async () => {
    let n = 0;
    const exits = { 0: 0, 2: 0 } as Record<number, number>;
    await fc.assert(
      fc.asyncProperty(concept, async ({ base, mutations, mode, units }) => {
        n += 1;
        const file = join(dir, `c${n}.json`);
        const svg = join(dir, `c${n}.svg`);
        writeFileSync(file, JSON.stringify(mutate(base, mutations), null, 2));
        const args = ['evaluate', file, '--units', units, ...(mode === 'text' ? [] : mode === 'svg' ? ['--svg', svg] : [`--${mode}`])];
        const io = bufferIO();
        const code = await main(args, io);
        exits[code] = (exits[code] ?? 0) + 1;
        const outputs = [io.stdout(), io.stderr()];
        if (mode === 'svg' && existsSync(svg)) {
          outputs.push(readFileSync(svg, 'utf8'));
          rmSync(svg);
        }
        rmSync(file);
        if (code !== 0 && code !== 2) throw new Error(`exit ${code}: ${io.stderr()}`);
        for (const output of outputs) {
          const found = FORBIDDEN.exec(output);
          if (found) throw new Error(`"${found[0]}" in the output of ${args.join(' ')}: …${output.slice(Math.max(0, found.index - 120), found.index + 60)}…`);
        }
        if (code === 0 && mode === 'json') JSON.parse(io.stdout());
        if (code === 2) expect(io.stderr().trim().split('\n')).toHaveLength(1);
      }),
      { numRuns: RUNS, seed: process.env.LOFTPOINT_FUZZ_SEED ? Number(process.env.LOFTPOINT_FUZZ_SEED) : undefined },
    );
    console.log(`fuzz: ${n} concept files, exit 0: ${exits[0]}, exit 2: ${exits[2]}`);
    expect(exits[0]).toBeGreaterThan(0);
    expect(exits[2]).toBeGreaterThan(0);
  }, 600_000);
});
