/**
 * `loftpoint evaluate FILE [--version N] [--json | --csv | --svg OUT] [--units si|us|kt-ft]`:
 * evaluate a concept (a JSON file, or a stored version of a project file)
 * and print a report, the evaluation JSON, the boundaries as CSV, or write
 * the diagram as SVG. The whole output is built before anything is printed,
 * so bad input never leaves partial output behind.
 */
import type { Command } from 'commander';
// The engine's own modules, not core's index: `evaluate` starts without the studies, demos and starters.
import { evaluateDesign } from '../../core/diagram/evaluate';
import { evaluationJsonText } from '../../core/diagram/evaluation-text';
import type { Evaluation } from '../../core/evaluation';
import type { UnitSystem } from '../../core/units/display';
import type { SetExitCode } from './io';
import { EXIT_FAILURE, EXIT_OK, InputError } from './errors';
import { ProjectReadFailure, readEvaluateInput } from './evaluate-input';
import type { CliIO } from './io';
import { checkOutputTarget, oneLine, writeWhole, type OutputTarget } from './output-file';
import { hasMark, markSvg } from './output-mark';

export interface EvaluateOptions {
  version?: string;
  json?: boolean;
  csv?: boolean;
  svg?: string;
  units?: string;
  force?: boolean;
}

export function registerEvaluate(program: Command, io: CliIO, setExitCode: SetExitCode): void {
  program
    .command('evaluate')
    .description(
      'Evaluate a concept: which requirements bind, by how much, the optimum, the design point, ' +
        'wing area and installed power or thrust. Preliminary sizing only.',
    )
    .argument('<file>', 'a concept JSON file (- reads it from standard input), or a project file with --version')
    .option('--version <n>', 'the stored version to evaluate (project files only): the project-wide number N, or CONCEPT@N for that concept\'s N-th version')
    .option('--json', 'print the evaluation as JSON (always SI units)')
    .option('--csv', 'print the sampled boundaries as CSV')
    .option('--svg <out>', 'write the constraint diagram to an SVG file')
    .option('--units <system>', 'units of the report, CSV and SVG: si, us or kt-ft', 'si')
    .option('--force', 'with --svg: replace an existing file even if Loftpoint did not write it (never a read-only one)')
    .action(async (file: string, options: EvaluateOptions) => {
      try {
        io.out(await runEvaluate(file, options));
        setExitCode(EXIT_OK);
      } catch (error) {
        if (!(error instanceof ProjectReadFailure)) throw error;
        io.err(`loftpoint: ${error.line}\n`);
        setExitCode(EXIT_FAILURE);
      }
    });
}

/** Everything `evaluate` prints, built in full; throws InputError on bad input. */
async function runEvaluate(file: string, options: EvaluateOptions): Promise<string> {
  const modes = (['json', 'csv', 'svg'] as const).filter((mode) => options[mode] !== undefined && options[mode] !== false);
  if (modes.length > 1) {
    throw new InputError(`choose one output: ${modes.map((mode) => `--${mode}`).join(' and ')} cannot be used together`, file, `--${modes[1]}`);
  }
  const system = unitSystem(file, options.units);
  if (options.svg !== undefined && options.svg.trim() === '') throw new InputError('needs a file name to write, e.g. --svg diagram.svg', file, '--svg');
  const input = await readEvaluateInput(file, options.version);
  const evaluation = evaluateDesign(input.design);
  // A mission that cannot close is bad input: one line naming the mission field and the fraction that fails.
  const unclosed = evaluation.warnings.find((warning) => warning.code === 'mission-not-closed');
  if (unclosed) throw new InputError(unclosed.message, file, unclosed.field);
  const name = input.design.name;
  // Written from the engine's columns: the same text as JSON.stringify, without a [w, y] pair per sample.
  if (options.json) return `${evaluationJsonText(evaluation)}\n`;
  // Each output's writer loads when asked for, so `--json` starts without the chart and CSV code.
  if (options.csv) return (await import('./evaluate-csv')).evaluationCsv({ name, evaluation, system });
  if (options.svg !== undefined) {
    const out = writeSvg(file, options.svg, evaluation, name, system, options.force === true, (await import('../chart/svg')).constraintDiagramSvg);
    return `Wrote the constraint diagram of ${oneLine(name.trim() || input.source)} to ${out}\n`;
  }
  return (await import('./evaluate-report')).evaluationReport({ source: input.source, design: input.design, evaluation, system });
}

function unitSystem(file: string, units: string | undefined): UnitSystem {
  const value = (units ?? 'si').trim().toLowerCase();
  if (value === 'si' || value === 'us' || value === 'kt-ft') return value;
  throw new InputError(`must be si, us or kt-ft, not "${oneLine(units ?? '')}"`, file, '--units');
}

/** Writes the diagram; an existing file is replaced only when Loftpoint wrote it as an SVG, or with --force. */
function writeSvg(file: string, out: string, evaluation: Evaluation, name: string, system: UnitSystem, force: boolean, constraintDiagramSvg: typeof import('../chart/svg').constraintDiagramSvg): string {
  const target: OutputTarget = { file, out, flag: '--svg', extension: '.svg', exampleName: 'diagram.svg', inputRole: 'the file being evaluated', isOurs: hasMark.svg, force };
  const path = checkOutputTarget(target);
  writeWhole(target, path, markSvg(constraintDiagramSvg(evaluation, { title: name, system })));
  return path;
}
