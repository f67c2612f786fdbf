/**
 * `loftpoint concept ...`: edits of a concept JSON file that the window also
 * offers, done by core/concept/configurations.ts: add, rename and remove an
 * aerodynamic configuration. The edited concept is printed (JSON only) or
 * written to a new file with --out; the input file is never changed, and the
 * result is checked as a concept before anything is written.
 */
import type { Command } from 'commander';
import { PRELIMINARY_CAUTION } from '../../core/caution';
import { addConfiguration, removeConfiguration, renameConfiguration, type ConfigurationEdit } from '../../core/concept/configurations';
import { parseConcept, type ConceptDocument } from '../../core/concept';
import { InputError } from './errors';
import { inputName, readInputText } from './input-text';
import type { CliIO, SetExitCode } from './io';
import { checkOutputTarget, oneLine, writeWhole, type OutputTarget } from './output-file';

interface OutOptions {
  out?: string;
  force?: boolean;
}

function readConcept(file: string): ConceptDocument {
  const text = readInputText(file);
  let document: unknown;
  try {
    document = JSON.parse(text);
  } catch (error) {
    throw new InputError(`is not valid JSON (${oneLine((error as Error).message)})`, inputName(file));
  }
  const parsed = parseConcept(document);
  if (!parsed.ok) throw new InputError(`${oneLine(parsed.issues[0]?.message ?? 'is not a valid concept')}; fix it before editing`, inputName(file), parsed.issues[0]?.path || undefined);
  return document as ConceptDocument;
}

function number(value: string | undefined, flag: string): number | undefined {
  if (value === undefined) return undefined;
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n)) throw new InputError(`must be a number, not "${oneLine(value)}"`, undefined, flag);
  return n;
}

/** Prints or writes the edited concept; `done` says what was done, for the readable line after writing. */
function finish(io: CliIO, file: string, edit: ConfigurationEdit, options: OutOptions, done: string): void {
  if (!edit.ok) throw new InputError(edit.message, inputName(file), edit.path);
  const checked = parseConcept(edit.concept);
  if (!checked.ok) {
    const first = checked.issues[0];
    throw new InputError(`the edited concept would not be valid: ${oneLine(first?.message ?? 'unknown problem')}; nothing was written`, inputName(file), first?.path || undefined);
  }
  const text = `${JSON.stringify(edit.concept, null, 2)}\n`;
  if (options.out === undefined) {
    io.out(text);
    return;
  }
  const target: OutputTarget = { file, out: options.out, flag: '--out', extension: '.json', exampleName: 'concept.json', inputRole: 'the concept being edited', force: options.force === true };
  writeWhole(target, checkOutputTarget(target), text);
  io.out(`${done}; wrote the concept to ${options.out}.\n${PRELIMINARY_CAUTION}\n`);
}

export function registerConcept(program: Command, io: CliIO, _setExitCode: SetExitCode): void {
  const concept = program
    .command('concept')
    .description('Edit a concept JSON file (or - for standard input): add, rename or remove an aerodynamic configuration (prints the edited concept, or --out FILE).');
  const out = (command: Command) =>
    command
      .option('--out <file>', 'write the edited concept to this new file instead of printing it (never the input file)')
      .option('--force', 'with --out: replace an existing file (never a read-only one, never the input)');

  out(
    concept
      .command('add-configuration')
      .description('Add a configuration (e.g. engine-out); values not given are clean\'s, the CD0 increment 0.')
      .argument('<file>', 'the concept JSON file (- reads it from standard input)')
      .argument('<name>', 'the new configuration\'s name')
      .option('--cd0-increment <x>', 'zero-lift drag added to clean\'s CD0 (flaps, gear, windmilling)')
      .option('--oswald <e>', 'Oswald efficiency e')
      .option('--clmax <c>', 'maximum lift coefficient'),
  ).action((file: string, name: string, options: OutOptions & { cd0Increment?: string; oswald?: string; clmax?: string }) => {
    const values = {
      ...(options.cd0Increment !== undefined ? { cd0Increment: number(options.cd0Increment, '--cd0-increment') } : {}),
      ...(options.oswald !== undefined ? { oswaldEfficiency: number(options.oswald, '--oswald') } : {}),
      ...(options.clmax !== undefined ? { clMax: number(options.clmax, '--clmax') } : {}),
    };
    finish(io, file, addConfiguration(readConcept(file), name, values), options, `Added configuration "${name}"`);
  });

  out(
    concept
      .command('rename-configuration')
      .description('Rename a configuration; requirements flown in it and ranges on its fields follow.')
      .argument('<file>', 'the concept JSON file (- reads it from standard input)')
      .argument('<from>', 'the configuration\'s name now')
      .argument('<to>', 'its new name'),
  ).action((file: string, from: string, to: string, options: OutOptions) => {
    finish(io, file, renameConfiguration(readConcept(file), from, to), options, `Renamed configuration "${from}" to "${to}"`);
  });

  out(
    concept
      .command('remove-configuration')
      .description('Remove a configuration no requirement or range uses (clean stays).')
      .argument('<file>', 'the concept JSON file (- reads it from standard input)')
      .argument('<name>', 'the configuration to remove'),
  ).action((file: string, name: string, options: OutOptions) => {
    finish(io, file, removeConfiguration(readConcept(file), name), options, `Removed configuration "${name}"`);
  });
}
