// Which surviving mutants of a Stryker report test/mutation/equivalent.md
// lists, and which it does not (those still need a test or a reason).
//
// equivalent.md keeps one table per section. A section's heading names the
// folder(s) or the file of core/ it speaks of ("## core/diagram (with ...)",
// "## core/requirements and core/assumptions", "## core/constraints/stall.ts");
// the first cell of a row gives the place: "25:19" under a file heading, or
// "bands.ts 86:15, 87:15" under a folder heading, or a whole path
// "core/units/display.ts 119:7" under any heading. A survivor is listed when a
// row of a section naming its folder (or file) gives its file and its
// line:column. Rows of a "why not killed" table, and rows whose reason starts
// "not killed", are not listings. Places are those of the code when the row was written: when
// the code moves, the survivor shows as not listed until the row is updated.

const UNCOUNTED = new Set(['Killed', 'Timeout', 'Ignored', 'CompileError', 'RuntimeError', 'Pending']);

/** The places equivalent.md lists, as "core/<folder>/<file>.ts line:column" keys. */
export function listedPlaces(markdown) {
  const places = new Set();
  let folders = [];
  let headingFile = null;
  let notKilledTable = false;
  for (const line of markdown.split('\n')) {
    if (line.startsWith('#')) {
      const paths = [...line.matchAll(/core\/[\w/.-]*/g)].map((m) => m[0].replace(/[/.]+$/, ''));
      const files = paths.filter((p) => p.endsWith('.ts'));
      headingFile = files.length === 1 ? files[0] : null;
      folders = paths.map((p) => (p.endsWith('.ts') ? p.slice(0, p.lastIndexOf('/')) : p));
      continue;
    }
    if (!line.startsWith('|')) {
      if (line.trim() !== '') notKilledTable = false;
      continue;
    }
    if (/^\|\s*place\b/.test(line)) {
      notKilledTable = /not killed/i.test(line);
      continue;
    }
    if (/^\|\s*-/.test(line) || notKilledTable) continue;
    const cells = line.split('|');
    // A row that says it is not killed ("not killed: ...") lists a mutant still waiting for a test.
    if (/^\s*not killed\b/i.test(cells[3] ?? '')) continue;
    const cell = cells[1] ?? '';
    // "a.ts 1:2, 3:4, b.ts 5:6": each position belongs to the last file named before it.
    let files = headingFile ? [headingFile] : [];
    for (const token of cell.matchAll(/((?:core\/[\w/-]+\/)?[\w-]+\.ts)|(\d+):(\d+)/g)) {
      if (token[1]) {
        files = token[1].startsWith('core/') ? [token[1]] : folders.map((folder) => `${folder}/${token[1]}`);
        continue;
      }
      for (const file of files) places.add(`${file} ${token[2]}:${token[3]}`);
    }
  }
  return places;
}

/** The counted survivors (status Survived or NoCoverage) of a report, each with its place and whether it is listed. */
export function survivors(report, markdown) {
  const listed = listedPlaces(markdown);
  const found = [];
  for (const [path, file] of Object.entries(report.files ?? {})) {
    const relative = path.slice(path.lastIndexOf('core/'));
    for (const mutant of file.mutants ?? []) {
      if (UNCOUNTED.has(mutant.status)) continue;
      const { line, column } = mutant.location.start;
      found.push({
        file: relative,
        line,
        column,
        status: mutant.status,
        mutator: mutant.mutatorName,
        replacement: mutant.replacement ?? '',
        listed: listed.has(`${relative} ${line}:${column}`),
      });
    }
  }
  return found.sort((a, b) => a.file.localeCompare(b.file) || a.line - b.line || a.column - b.column);
}

/** One line per survivor not listed: "core/x.ts 12:5 Survived ConditionalExpression -> true". */
export function unlistedLines(found) {
  return found
    .filter((s) => !s.listed)
    .map((s) => `${s.file} ${s.line}:${s.column} ${s.status} ${s.mutator} -> ${s.replacement.replace(/\s+/g, ' ').slice(0, 80)}`);
}
