/**
 * `loftpoint project ...`: the project file from the command line. Scripts
 * rely on these verbs and their output: `save` prints only the new version's
 * number, `show` prints the concept JSON exactly as saved, `--json` prints
 * JSON only; readable output ends with the preliminary-sizing caution.
 */
import type { Command } from 'commander';
import { checkOutputTarget, writeWhole, type OutputTarget } from './output-file';
import { basename, extname } from 'node:path';
import { PRELIMINARY_CAUTION } from '../../core/caution';
import type { ProjectService, ServiceError, UnitSystem } from '../service';
import { EXIT_FAILURE, InputError } from './errors';
import { STANDARD_INPUT, inputName, readInputText } from './input-text';
import { conceptVersionNumber, parseVersionRef } from '../service/version-ref';
import type { CliIO } from './io';
import type { SetExitCode } from './io';

/** Errors that are not the user's input: reported in one line with exit status 1. */
const NOT_INPUT = new Set(['busy', 'io', 'disk-full', 'internal']);

/**
 * The project-wide number of the version `text` names: N itself, or
 * CONCEPT@N, the N-th version of that concept (the project must be open).
 */
function versionNumber(service: ProjectService, text: string, argument: string): number {
  if (/^\d+$/.test(text.trim()) && Number(text) >= 1) return Number(text);
  if (!text.includes('@')) throw new InputError(`"${text}" is not a version number (1, 2, 3, ...) or CONCEPT@N`, undefined, argument);
  const ref = parseVersionRef(text);
  if ('error' in ref) throw new InputError(ref.error, undefined, argument);
  if (ref.kind === 'project') return ref.number;
  const number = conceptVersionNumber(ref, service.listVersions({}));
  if (typeof number !== 'number') throw new InputError(number.error, undefined, argument);
  return number;
}

function unitsOption(value: string | undefined): UnitSystem | undefined {
  if (value === undefined) return undefined;
  if (value !== 'si' && value !== 'us' && value !== 'kt-ft') throw new InputError(`"${value}" is not a unit system: use si, us or kt-ft`, undefined, '--units');
  return value;
}

type ServiceModule = typeof import('../service');
let serviceModule: ServiceModule | undefined;
/** The project service's module: loaded by the project verbs only, so the other verbs start without the project store. */
const projects = (): ServiceModule => serviceModule as ServiceModule;

/**
 * Runs a save of a concept file's text; a concept that fails its checks becomes one line naming the file,
 * the first field and how many more problems there are, ending "nothing was <outcome>".
 */
function refusingInvalidConcept<T>(conceptFile: string, outcome: 'saved' | 'imported', save: () => T): T {
  try {
    return save();
  } catch (error) {
    if (error instanceof projects().ServiceFailure && error.error.code === 'invalid-concept') {
      const issues = error.error.issues ?? [];
      const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
      const first = issues[0];
      throw new InputError(`${first?.message ?? 'is not a valid concept'}${more}; nothing was ${outcome}`, conceptFile, first?.path || undefined);
    }
    throw error;
  }
}

/** Runs one verb: service errors become one line, input errors exit 2, the rest exit 1. */
function run(io: CliIO, setExitCode: SetExitCode, verb: (service: ProjectService) => void | Promise<void>) {
  return async () => {
    serviceModule ??= await import('../service');
    const { StoreError } = await import('../store/errors');
    const { ServiceFailure } = serviceModule;
    const service = new serviceModule.ProjectService();
    try {
      await verb(service);
    } catch (error) {
      const serviceError: ServiceError | undefined =
        error instanceof ServiceFailure
          ? error.error
          : error instanceof StoreError
            ? { code: error.code, message: error.message }
            : undefined;
      if (!serviceError) throw error;
      if (NOT_INPUT.has(serviceError.code)) {
        io.err(`loftpoint: ${serviceError.message}\n`);
        setExitCode(EXIT_FAILURE);
        return;
      }
      throw new InputError(serviceError.message);
    } finally {
      service.closeProject({});
    }
  };
}

export function registerProject(program: Command, io: CliIO, setExitCode: SetExitCode): void {
  const project = program
    .command('project')
    .description('Project files: every concept version with its note, author and time (preliminary sizing only).');

  project
    .command('create')
    .description('Create a new project file; never overwrites an existing file.')
    .argument('<file>', 'the new project file')
    .option('--demo', 'add the demo concepts as first versions')
    .option('--name <name>', 'project name (default: the file name)')
    .option('--description <text>', 'project description')
    .option('--units <system>', 'preferred units: si, us or kt-ft', 'si')
    .action((file: string, options: { demo?: boolean; name?: string; description?: string; units?: string }) =>
      run(io, setExitCode, (service) => {
        const info = service.createProject({
          file,
          name: options.name ?? basename(file, extname(file)),
          description: options.description ?? '',
          units: unitsOption(options.units) ?? 'si',
          demo: options.demo === true,
        });
        const versions =
          info.versionCount === 0 ? 'no versions yet' : `${info.conceptCount} concepts, versions 1 to ${info.versionCount}`;
        io.out(`Created project "${info.name}" in ${info.file} (${versions}).\n${PRELIMINARY_CAUTION}\n`);
      })(),
    );

  project
    .command('save')
    .description('Save a concept as a new version; prints only the new version number.')
    .argument('<file>', 'the project file')
    .argument('<concept>', 'the concept JSON file (- reads it from standard input)')
    .requiredOption('--note <text>', 'why this version exists (plain text or Markdown)')
    .option('--concept <name>', 'the concept (design alternative) to save into; created when new')
    .option('--parent <version>', 'the version this one was edited from, N or CONCEPT@N (default: the newest of its concept)')
    .option('--author <name>', 'author (default: $LOFTPOINT_AUTHOR or your user name)')
    .action((file: string, conceptFile: string, options: { note: string; concept?: string; parent?: string; author?: string }) =>
      run(io, setExitCode, (service) => {
        const conceptText = readInputText(conceptFile);
        service.openProject({ file });
        const parent = options.parent === undefined ? undefined : versionNumber(service, options.parent, '--parent');
        const saved = refusingInvalidConcept(inputName(conceptFile), 'saved', () =>
          service.saveVersion({
            conceptText,
            note: options.note,
            ...(options.concept !== undefined ? { conceptName: options.concept } : {}),
            ...(parent !== undefined ? { parent } : {}),
            ...(options.author !== undefined ? { author: options.author } : {}),
          }),
        );
        for (const warning of saved.warnings) io.err(`loftpoint: warning: ${inputName(conceptFile)}: ${warning}\n`);
        io.out(`${saved.version.number}\n`);
      })(),
    );

  project
    .command('branch')
    .description('Start a new concept (a design alternative) from a stored version; prints only its first version number.')
    .argument('<file>', 'the project file')
    .argument('<version>', 'the version to start from, N or CONCEPT@N (the new concept\'s first version has it as parent)')
    .requiredOption('--name <name>', 'the new concept\'s name in the project')
    .option('--title <title>', 'write this as the concept\'s own name (its title on diagrams and reports); default: copy the concept unchanged')
    .option('--note <text>', 'why this alternative exists (default: "Started from version N of ...")')
    .option('--author <name>', 'author (default: $LOFTPOINT_AUTHOR or your user name)')
    .action((file: string, version: string, options: { name: string; title?: string; note?: string; author?: string }) =>
      run(io, setExitCode, (service) => {
        service.openProject({ file });
        const fromVersion = versionNumber(service, version, 'VERSION');
        const started = service.startConcept({
          fromVersion,
          name: options.name,
          ...(options.title !== undefined ? { title: options.title } : {}),
          ...(options.note !== undefined ? { note: options.note } : {}),
          ...(options.author !== undefined ? { author: options.author } : {}),
        });
        for (const warning of started.warnings) io.err(`loftpoint: warning: ${file}: ${warning}\n`);
        io.out(`${started.version.number}\n`);
      })(),
    );

  project
    .command('rename-concept')
    .description('Rename a concept (design alternative) of the project; its versions and their numbers stay.')
    .argument('<file>', 'the project file')
    .argument('<from>', 'the concept\'s name now')
    .argument('<to>', 'its new name (not taken by another concept)')
    .action((file: string, from: string, to: string) =>
      run(io, setExitCode, (service) => {
        service.openProject({ file });
        const renamed = service.renameConcept({ from, to });
        const count = `${renamed.versionCount} version${renamed.versionCount === 1 ? '' : 's'}`;
        io.out(`Renamed concept "${from}" to "${renamed.name}" (${count}).\n${PRELIMINARY_CAUTION}\n`);
      })(),
    );

  project
    .command('import-concept')
    .description('Add a concept JSON file to the project as a new concept (design alternative); prints only its first version number.')
    .argument('<file>', 'the project file')
    .argument('<concept>', 'the concept JSON file, - for standard input (checked field by field; nothing is saved if it is not valid)')
    .option('--name <name>', 'the new concept\'s name in the project (default: the concept\'s own name); refused when taken')
    .option('--note <text>', 'why this alternative exists (default: "Imported from FILE.")')
    .option('--author <name>', 'author (default: $LOFTPOINT_AUTHOR or your user name)')
    .action((file: string, conceptFile: string, options: { name?: string; note?: string; author?: string }) =>
      run(io, setExitCode, (service) => {
        const conceptText = readInputText(conceptFile);
        let ownName: unknown;
        try {
          ownName = (JSON.parse(conceptText) as { name?: unknown } | null)?.name;
        } catch {
          ownName = undefined; // the save below reports the JSON error with its place
        }
        service.openProject({ file });
        const fileName = conceptFile === STANDARD_INPUT ? 'piped concept' : basename(conceptFile, extname(conceptFile));
        const name = (options.name ?? (typeof ownName === 'string' && ownName.trim() !== '' ? ownName : fileName)).trim();
        if (service.listConcepts({}).some((concept) => concept.name === name)) {
          throw new InputError(`a concept "${name}" already exists in ${file}; choose another with --name (or add a version to it with: loftpoint project save)`, undefined, '--name');
        }
        const saved = refusingInvalidConcept(inputName(conceptFile), 'imported', () =>
          service.importConcept({
            conceptText,
            name,
            note: options.note ?? `Imported from ${basename(inputName(conceptFile))}.`,
            ...(options.author !== undefined ? { author: options.author } : {}),
          }),
        );
        for (const warning of saved.warnings) io.err(`loftpoint: warning: ${inputName(conceptFile)}: ${warning}\n`);
        io.out(`${saved.version.number}\n`);
      })(),
    );

  project
    .command('versions')
    .description('List every version: number, concept, parent, time, author, optimum, note.')
    .argument('<file>', 'the project file')
    .option('--json', 'print the versions as JSON')
    .option('--concept <name>', 'only this concept')
    .option('--units <system>', 'si, us or kt-ft (default: the project preference)')
    .action((file: string, options: { json?: boolean; concept?: string; units?: string }) =>
      run(io, setExitCode, (service) => {
        const units = unitsOption(options.units);
        const info = service.openProject({ file, readonly: true });
        const versions = service.listVersions(options.concept !== undefined ? { concept: options.concept } : {});
        io.out(options.json ? `${JSON.stringify(versions, null, 2)}\n` : projects().versionsText(versions, units ?? info.units, info.name));
      })(),
    );

  project
    .command('show')
    .description("Print one version's concept JSON exactly as saved.")
    .argument('<file>', 'the project file')
    .argument('<version>', 'version: project-wide number N, or CONCEPT@N for a concept\'s N-th version')
    .action((file: string, version: string) =>
      run(io, setExitCode, (service) => {
        service.openProject({ file, readonly: true });
        const number = versionNumber(service, version, 'VERSION');
        io.out(service.getVersion({ version: number }).conceptText);
      })(),
    );

  project
    .command('compare')
    .description('Compare two versions: requirements, assumptions, optimum, design point, margins.')
    .argument('<file>', 'the project file')
    .argument('<a>', 'the earlier version (N, or CONCEPT@N)')
    .argument('<b>', 'the later version (N, or CONCEPT@N; any concept of the project)')
    .option('--json', 'print the comparison as JSON')
    .option('--units <system>', 'si, us or kt-ft (default: the project preference)')
    .action((file: string, a: string, b: string, options: { json?: boolean; units?: string }) =>
      run(io, setExitCode, (service) => {
        const units = unitsOption(options.units);
        const info = service.openProject({ file, readonly: true });
        const numbers = { a: versionNumber(service, a, 'A'), b: versionNumber(service, b, 'B') };
        const comparison = service.compareVersions(numbers);
        io.out(options.json ? `${JSON.stringify(comparison, null, 2)}\n` : projects().comparisonText(comparison, units ?? info.units));
      })(),
    );

  project
    .command('export')
    .description('Export the whole project, or one version, as JSON (stdout, or --out FILE).')
    .argument('<file>', 'the project file')
    .option('--version <n>', 'export only this version (N, or CONCEPT@N)')
    .option('--out <file>', 'write to this file instead of stdout (never replaces an existing file without --force)')
    .option('--force', 'with --out: replace an existing file (never a read-only one)')
    .action((file: string, options: { version?: string; out?: string; force?: boolean }) =>
      run(io, setExitCode, (service) => {
        service.openProject({ file, readonly: true });
        const number = options.version === undefined ? undefined : versionNumber(service, options.version, '--version');
        const document = number === undefined ? service.exportProject({}) : service.exportVersion({ version: number });
        const text = `${JSON.stringify(document, null, 2)}\n`;
        if (options.out === undefined) {
          io.out(text);
          return;
        }
        const target: OutputTarget = { file, out: options.out, flag: '--out', extension: '.json', exampleName: 'export.json', inputRole: 'the project file', force: options.force === true };
        writeWhole(target, checkOutputTarget(target), text);
        io.out(`Exported ${number === undefined ? 'the project' : `version ${number}`} to ${options.out}.\n${PRELIMINARY_CAUTION}\n`);
      })(),
    );

  project
    .command('import')
    .description('Create a new project file from an export (never overwrites).')
    .argument('<export>', 'a project or version export (JSON; - for standard input)')
    .argument('<file>', 'the new project file')
    .action((exportFile: string, file: string) =>
      run(io, setExitCode, (service) => {
        let document: unknown;
        try {
          document = JSON.parse(readInputText(exportFile));
        } catch (error) {
          if (error instanceof InputError) throw error;
          throw new InputError(`is not valid JSON (${(error as Error).message})`, inputName(exportFile));
        }
        const info = service.importProject({ file, document });
        io.out(`Imported ${info.versionCount} versions of ${info.conceptCount} concepts into ${info.file}.\n${PRELIMINARY_CAUTION}\n`);
      })(),
    );

  project
    .command('backup')
    .description('Copy the project into a new file, safely even while it is in use (never overwrites).')
    .argument('<file>', 'the project file')
    .argument('<destination>', 'the new backup file')
    .action((file: string, destination: string) =>
      run(io, setExitCode, async (service) => {
        service.openProject({ file, readonly: true });
        const result = await service.backupProject({ file: destination });
        io.out(`Backed up ${file} to ${result.file} (${result.bytes} bytes).\n${PRELIMINARY_CAUTION}\n`);
      })(),
    );
}
