/**
 * `loftpoint demo [NAME] [--out FILE]`: the demo concepts, invented
 * scenarios to start from. Without NAME, lists them; with NAME, prints that
 * concept's JSON (or writes it to FILE, never over an existing file).
 */
// @ts-nocheck

import { checkOutputTarget, writeWhole, type OutputTarget } from './output-file';
import type { Command } from 'commander';
import { DEMO_CONCEPTS, type DemoConcept } from '../../core';
import { SIZING_CAUTION } from '../chart/caution';
import { wrapText } from '../chart/text';
import type { SetExitCode } from './io';
import { EXIT_OK, InputError } from './errors';
import type { CliIO } from './io';

export interface DemoOptions {
  out?: string;
  force?: boolean;
}

export function registerDemo(program: Command, io: CliIO, setExitCode: SetExitCode): void {
  program
    .command('demo')
    .description('List the demo concepts, or print one as concept JSON to start from.')
    .argument('[name]', 'the demo to print (see the list)')
    .option('--out <file>', 'write the concept JSON to this file instead (never replaces an existing file without --force)')
    .option('--force', 'with --out: replace an existing file (never a read-only one)')
    .action((name: string | undefined, options: DemoOptions) => {
      io.out(runDemo(name, options));
      setExitCode(EXIT_OK);
    });
}

/** Everything `demo` prints, built in full; throws InputError on bad input. */
export function runDemo(name: string | undefined, options: DemoOptions = {}): string {
  if (name === undefined) {
    if (options.out !== undefined) throw new InputError('needs a demo name, e.g. loftpoint demo trainer --out trainer.json', options.out, '--out');
    return demoList();
  }
  const demo = findDemo(name);
  const json = `${JSON.stringify(demo.concept, null, 2)}\n`;
  if (options.out === undefined) return json;
  const target = writeNew(options.out, json, options.force === true);
  return [
    `Wrote the demo concept "${demo.title}" to ${target}; evaluate it with: loftpoint evaluate ${options.out}`,
    SIZING_CAUTION,
    '',
  ].join('\n');
}

function findDemo(name: string): DemoConcept {
  const wanted = name.trim().toLowerCase();
  const demo = DEMO_CONCEPTS.find((candidate) => candidate.slug === wanted);
  if (demo) return demo;
  const known = DEMO_CONCEPTS.map((candidate) => candidate.slug).join(', ');
  throw new InputError(`unknown demo "${name.replace(/\s+/g, ' ')}"; the demos are ${known}`, undefined, 'demo');
}

function demoList(): string {
  const width = Math.max(...DEMO_CONCEPTS.map((demo) => demo.slug.length));
  const lines = ['Demo concepts (invented scenarios to start from):', ''];
  for (const demo of DEMO_CONCEPTS) {
    lines.push(`  ${demo.slug.padEnd(width)}  ${demo.title}`);
    lines.push(...wrapText(firstSentence(demo.summary), 74 - width).map((line) => `  ${' '.repeat(width)}  ${line}`));
    lines.push('');
  }
  const first = DEMO_CONCEPTS[0]?.slug ?? 'NAME';
  lines.push(`Print one with: loftpoint demo ${first}`);
  lines.push(`Start from one: loftpoint demo ${first} --out ${first}.json, then loftpoint evaluate ${first}.json`);
  lines.push('');
  lines.push(SIZING_CAUTION);
  return `${lines.join('\n')}\n`;
}

/** The scenario itself; the list ends with the caution once rather than under every demo. */
function firstSentence(text: string): string {
  return text.split(/(?<=\.)\s+(?=[A-Z])/)[0] ?? text;
}

/** Write the file; an existing file is replaced only with --force (a concept file may hold the user's own edits). */
function writeNew(out: string, text: string, force: boolean): string {
  const target: OutputTarget = { file: undefined, out, flag: '--out', extension: '.json', exampleName: 'concept.json', inputRole: '', force };
  const path = checkOutputTarget(target);
  writeWhole(target, path, text);
  return path;
}
