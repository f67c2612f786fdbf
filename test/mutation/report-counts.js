// Counting a Stryker JSON report (the mutation-testing-report schema):
// per-part rows, one table over core/, and the parts merged into one report.

const COUNTED = ['Killed', 'Timeout', 'Survived', 'NoCoverage'];

/** Counts of a report's mutants by status (only the statuses the score counts). */
export function statusCounts(report) {
  const counts = { Killed: 0, Timeout: 0, Survived: 0, NoCoverage: 0 };
  for (const file of Object.values(report.files ?? {})) {
    for (const mutant of file.mutants ?? []) {
      if (COUNTED.includes(mutant.status)) counts[mutant.status]++;
    }
  }
  return counts;
}

/** (killed + timed out) / (every counted mutant), in per cent; null when nothing was counted. */
export function score(counts) {
  const detected = counts.Killed + counts.Timeout;
  const total = detected + counts.Survived + counts.NoCoverage;
  return total === 0 ? null : (100 * detected) / total;
}

export function partRow(part, report) {
  return { part, ...statusCounts(report) };
}

const percent = (value) => (value === null ? 'none' : `${value.toFixed(1)} %`);

/** A fixed-width table of the parts and their sum; a part without a report says so and is left out of the sum. */
export function scoreTable(rows) {
  const head = ['part', 'mutants', 'killed', 'timed out', 'survived', 'no coverage', 'score'];
  const sum = { Killed: 0, Timeout: 0, Survived: 0, NoCoverage: 0 };
  const lines = rows.map((row) => {
    if (row.missing) return [row.part, 'not run', '', '', '', '', ''];
    for (const key of Object.keys(sum)) sum[key] += row[key];
    const mutants = row.Killed + row.Timeout + row.Survived + row.NoCoverage;
    return [row.part, mutants, row.Killed, row.Timeout, row.Survived, row.NoCoverage, percent(score(row))].map(String);
  });
  const missing = rows.filter((row) => row.missing).map((row) => row.part);
  const total = sum.Killed + sum.Timeout + sum.Survived + sum.NoCoverage;
  lines.push([missing.length > 0 ? 'core/ (parts run)' : 'core/', total, sum.Killed, sum.Timeout, sum.Survived, sum.NoCoverage, percent(score(sum))].map(String));
  const widths = head.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i].length)));
  const format = (cells) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ').trimEnd();
  const text = [format(head), widths.map((w) => '-'.repeat(w)).join('  '), ...lines.map(format)];
  if (missing.length > 0) text.push(`Not run yet, so not in the score: ${missing.join(', ')}.`);
  return text.join('\n');
}

/** The parts' reports as one: every file once (a later report of the same file wins); test details left out. */
export function mergedReport(reports) {
  const files = {};
  for (const report of reports) {
    for (const [path, file] of Object.entries(report.files ?? {})) {
      files[path] = { ...file, mutants: (file.mutants ?? []).map(({ coveredBy, killedBy, ...mutant }) => mutant) };
    }
  }
  return { schemaVersion: reports[0]?.schemaVersion ?? '1', thresholds: reports[0]?.thresholds ?? { high: 90, low: 80 }, files };
}
