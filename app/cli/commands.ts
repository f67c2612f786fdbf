/**
 * The verbs of the command line, one file each. A verb that fails on bad
 * input throws InputError; main turns it into one line and exit status 2.
 *
 * A command loads only the verb it names: `loftpoint evaluate ...` never
 * loads the project, report, concept, demo or serve code (nor what they
 * import). Anything else first (help, an option such as --version, a
 * misspelt verb) loads every verb, in the order the help lists them, so the
 * help and commander's suggestions are the same as ever.
 */
import type { Command } from 'commander';
import type { CliIO, SetExitCode } from './io';

type Register = (program: Command, io: CliIO, setExitCode: SetExitCode) => void;

const VERBS: Record<string, () => Promise<Register>> = {
  evaluate: async () => (await import('./evaluate')).registerEvaluate,
  project: async () => (await import('./project')).registerProject,
  concept: async () => (await import('./concept')).registerConcept,
  demo: async () => (await import('./demo')).registerDemo,
  report: async () => (await import('./report')).registerReport,
  serve: async () => (await import('./serve')).registerServe,
};

export async function registerCommands(program: Command, io: CliIO, setExitCode: SetExitCode, argv: readonly string[] = []): Promise<void> {
  const first = argv[0];
  const named = first !== undefined && Object.hasOwn(VERBS, first) ? [first] : Object.keys(VERBS);
  const registers = await Promise.all(named.map((verb) => VERBS[verb]()));
  for (const register of registers) register(program, io, setExitCode);
}
