/**
 * `loftpoint report FILE [--version N] --out PATH [--units si|us|kt-ft] [--step 10%] [--samples N] [--seed N]`:
 * the design-review report of a concept (a JSON file, or a stored version of
 * a project file). PATH's extension picks the output: .html (self-contained),
 * .pdf (printed by headless Chromium), .svg or .png (the diagram with bands
 * and probability contours), .csv (the boundaries). Everything is built
 * before anything is written; the file appears whole or not at all, and the
 * input is never overwritten.
 */
import { extname, resolve } from 'node:path';
import type { Command } from 'commander';
import { evaluateDesign, parseConcept, PRELIMINARY_CAUTION, type ProbabilityMap, type UnitSystem } from '../../core';
import type { StudyInput, StudyOptions } from '../report/studies';
import type { SetExitCode } from './io';
import { EXIT_FAILURE, EXIT_OK, InputError } from './errors';
import { ProjectReadFailure, readEvaluateInput } from './evaluate-input';
import type { CliIO } from './io';
import { checkOutputTarget, oneLine, writeWhole, type OutputTarget } from './output-file';
import { hasMark, markCsv, markPdf, markPng, markSvg } from './output-mark';

export interface ReportOptions {
  version?: string;
  out?: string;
  units?: string;
  step?: string;
  samples?: string;
  seed?: string;
  force?: boolean;
}

type OutputKind = 'html' | 'pdf' | 'svg' | 'png' | 'csv';

const KINDS: Record<string, { kind: OutputKind; what: string; isOurs: (head: Buffer, tail: Buffer) => boolean }> = {
  '.html': { kind: 'html', what: 'design-review report (HTML)', isOurs: hasMark.html },
  '.htm': { kind: 'html', what: 'design-review report (HTML)', isOurs: hasMark.html },
  '.pdf': { kind: 'pdf', what: 'design-review report (PDF)', isOurs: hasMark.pdf },
  '.svg': { kind: 'svg', what: 'constraint diagram with bands and probability contours (SVG)', isOurs: hasMark.svg },
  '.png': { kind: 'png', what: 'constraint diagram with bands and probability contours (PNG)', isOurs: hasMark.png },
  '.csv': { kind: 'csv', what: 'constraint boundaries (CSV)', isOurs: hasMark.csv },
};

export function registerReport(program: Command, io: CliIO, setExitCode: SetExitCode): void {
  program
    .command('report')
    .description(
      'Write the design-review report of a concept: requirements, assumptions, the diagram, optimum, design point, ' +
        'margins, sizing, speeds, bands, tornado, probabilities, requirement costs, the version note and changes.\n' +
        'The extension of --out picks the output: .html, .pdf, .svg or .png (the diagram), .csv (the boundaries).\n' +
        'Preliminary sizing only.',
    )
    .argument('<file>', 'a concept JSON file (- reads it from standard input), or a project file with --version')
    .option('--version <n>', 'the stored version to report (project files only): the project-wide number N, or CONCEPT@N for that concept\'s N-th version')
    .option('--out <path>', 'the file to write: .html, .pdf, .svg, .png or .csv (replaces only an earlier Loftpoint output)')
    .option('--force', 'replace an existing --out file even if Loftpoint did not write it (never a read-only one)')
    .option('--units <system>', 'units of the report: si, us or kt-ft', 'si')
    .option('--step <step>', 'how far each requirement is relaxed and tightened for its cost, e.g. 10%', '10%')
    .option('--samples <n>', 'Monte Carlo sample count (default: the concept’s, else 10000)')
    .option('--seed <n>', 'Monte Carlo seed (default: the concept’s, else 1)')
    .action(async (file: string, options: ReportOptions) => {
      try {
        io.out(await runReport(file, options));
        setExitCode(EXIT_OK);
      } catch (error) {
        if (error instanceof ProjectReadFailure) {
          io.err(`loftpoint: ${error.line}\n`);
          setExitCode(EXIT_FAILURE);
          return;
        }
        if (error instanceof (await import('../report/chromium')).ChromiumFailed) {
          io.err(`loftpoint: ${oneLine(file)}: ${oneLine(error.message)}\n`);
          setExitCode(EXIT_FAILURE);
          return;
        }
        throw error;
      }
    });
}

function outputKind(file: string, out: string | undefined): { target: string; kind: OutputKind; what: string; isOurs: (head: Buffer, tail: Buffer) => boolean } {
  if (out === undefined || out.trim() === '') throw new InputError('needs the file to write, e.g. --out review.pdf (.html, .pdf, .svg, .png or .csv)', file, '--out');
  const extension = extname(out).toLowerCase();
  const known = KINDS[extension];
  if (!known) {
    const named = extension === '' ? 'has no extension' : `has the extension "${oneLine(extension)}", which Loftpoint does not write`;
    throw new InputError(`${oneLine(out)} ${named}; use .html, .pdf, .svg, .png or .csv`, file, '--out');
  }
  return { target: resolve(out), ...known };
}

function unitSystem(file: string, units: string | undefined): UnitSystem {
  const value = (units ?? 'si').trim().toLowerCase();
  if (value === 'si' || value === 'us' || value === 'kt-ft') return value;
  throw new InputError(`must be si, us or kt-ft, not "${oneLine(units ?? '')}"`, file, '--units');
}

/** "10%", "12.5 %" or a fraction "0.1"; strictly between 0 and 100 %. */
function parseStep(file: string, step: string | undefined): number {
  const text = (step ?? '10%').trim();
  const percent = /^(\d+(?:\.\d+)?)\s*%$/.exec(text);
  const fraction = percent ? Number(percent[1]) / 100 : /^\d*\.\d+$|^0$/.test(text) ? Number(text) : NaN;
  if (!percent && /^\d+(?:\.\d+)?$/.test(text) && Number(text) >= 1) {
    throw new InputError(`"${oneLine(text)}" is ambiguous; write a percentage such as 10% or a fraction such as 0.1`, file, '--step');
  }
  if (!(fraction > 0 && fraction < 1)) throw new InputError(`must be a percentage between 0 and 100 such as 10%, or a fraction such as 0.1, not "${oneLine(text)}"`, file, '--step');
  return fraction;
}

function wholeNumber(file: string, flag: string, value: string | undefined, min: number, max: number, example: string): number | undefined {
  if (value === undefined) return undefined;
  const text = value.trim().replace(/[_,]/g, '');
  if (!/^\d+$/.test(text) || Number(text) < min || Number(text) > max) {
    throw new InputError(`must be a whole number from ${min.toLocaleString('en-US')} to ${max.toLocaleString('en-US')}, e.g. ${example}, not "${oneLine(value)}"`, file, flag);
  }
  return Number(text);
}

/** The version's note, author and changes; a project that cannot be read now is not the user's input (exit 1). */
async function versionInfo(file: string, number: number) {
  // Loaded only here: a concept JSON file never touches the native SQLite module.
  const { storedVersionInfo } = await import('../report/version-info');
  try {
    return storedVersionInfo(file, number);
  } catch (error) {
    throw new ProjectReadFailure(`${file}: ${oneLine(error instanceof Error ? error.message : String(error))}`);
  }
}

/** Build and write the output; returns what to print. Throws InputError on bad input. */
async function runReport(file: string, options: ReportOptions): Promise<string> {
  const output = outputKind(file, options.out);
  // The Monte Carlo's worker threads start first, to load while this thread reads and evaluates the concept.
  const { reportProbabilityMap, startMonteCarloThreads } = await import('./monte-carlo-workers');
  const threads = output.kind === 'csv' ? null : startMonteCarloThreads();
  try {
    return await reportWith(file, options, output, threads === null ? null : (input) => reportProbabilityMap(input, threads));
  } finally {
    threads?.close();
  }
}

/** runReport once the output is known and the Monte Carlo's threads are starting (`monteCarlo`; null for the CSV, which has no studies). */
async function reportWith(
  file: string,
  options: ReportOptions,
  output: ReturnType<typeof outputKind>,
  monteCarlo: ((input: StudyInput) => Promise<{ map: ProbabilityMap | null; ms: number }>) | null,
): Promise<string> {
  // The report's parts load with this verb only, so the other verbs start without them.
  const { ChromiumUnavailable, findChromium, printPdf, svgToPng } = await import('../report/chromium');
  const { buildReport } = await import('../report/report');
  const { STUDY_DIAGRAM_SIZE } = await import('../report/section-results');
  const { reportDiagramSvg } = await import('../report/section-studies');
  const { runStudies } = await import('../report/studies');
  const { evaluationCsv } = await import('./evaluate-csv');
  const extension = extname(output.target).toLowerCase();
  const system = unitSystem(file, options.units);
  const studyOptions: StudyOptions = { step: parseStep(file, options.step) };
  const samples = wholeNumber(file, '--samples', options.samples, 100, 1_000_000, '10000');
  const seed = wholeNumber(file, '--seed', options.seed, 0, 4_294_967_295, '20261202');
  if (samples !== undefined) studyOptions.samples = samples;
  if (seed !== undefined) studyOptions.seed = seed;
  let chromium: string | undefined;
  if (output.kind === 'pdf' || output.kind === 'png') {
    try {
      chromium = findChromium();
    } catch (error) {
      if (error instanceof ChromiumUnavailable) throw new InputError(oneLine(error.message), file, '--out');
      throw error;
    }
  }
  const input = await readEvaluateInput(file, options.version);
  const target: OutputTarget = { file, out: options.out as string, flag: '--out', extension, exampleName: `review${extension}`, inputRole: 'the file being reported on', isOurs: output.isOurs, force: options.force === true };
  checkOutputTarget(target);
  const { design } = input;
  const name = design.name.trim() || input.source;
  const evaluation = evaluateDesign(design);
  // A mission that cannot close is bad input here as in evaluate: one line naming the field and the fraction.
  const unclosed = evaluation.warnings.find((warning) => warning.code === 'mission-not-closed');
  if (unclosed) throw new InputError(unclosed.message, file, unclosed.field);

  let content: string | Buffer;
  if (output.kind === 'csv' || monteCarlo === null) {
    content = markCsv(evaluationCsv({ name, evaluation, system }));
  } else {
    const parsed = parseConcept(input.concept);
    const uncertainty = parsed.ok ? parsed.uncertainty : undefined;
    const studyInput = { design, concept: input.concept, evaluation, system, ...(uncertainty ? { uncertainty } : {}), options: studyOptions };
    // The Monte Carlo on every free core (the same map as one core gives); the other studies here.
    const studies = runStudies(studyInput, await monteCarlo(studyInput));
    if (output.kind === 'svg' || output.kind === 'png') {
      const svg = reportDiagramSvg({ design, evaluation, system, studies });
      content = output.kind === 'svg' ? markSvg(svg) : markPng(await svgToPng(svg, STUDY_DIAGRAM_SIZE, { binary: chromium as string }));
    } else {
      const version = input.versionNumber !== undefined ? await versionInfo(file, input.versionNumber) : undefined;
      const html = buildReport({
        concept: input.concept,
        design,
        evaluation,
        ...(uncertainty ? { uncertainty } : {}),
        ...(version ? { version } : {}),
        studies: studyOptions,
        studyResults: studies,
        system,
        source: input.source,
      });
      content = output.kind === 'html' ? html : markPdf(await printPdf(html, { binary: chromium as string }));
    }
  }
  writeWhole(target, output.target, content);
  return `Wrote the ${output.what} of ${oneLine(name)} to ${output.target}\n${PRELIMINARY_CAUTION}\n`;
}
