/**
 * Project file benchmark (`npx tsx test/bench/store.ts`, part of `npm run bench`):
 * saving a version, opening and listing a project of 1,000 versions, and
 * bytes per version, each beside its target. Measures; never fails on a figure.
 */
// @ts-nocheck

import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEMO_CONCEPTS } from '../../core';
import { ProjectService } from '../../app/service';
import { ProjectStore, openProjectFile } from '../../app/store';

const VERSIONS = 1000;
const OPEN_RUNS = 15;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

function timed<T>(run: () => T): [T, number] {
  const start = process.hrtime.bigint();
  const value = run();
  return [value, Number(process.hrtime.bigint() - start) / 1e6];
}

/** Concept texts that differ from save to save, as real edits do. */
function conceptText(i: number): string {
  const demo = DEMO_CONCEPTS[i % DEMO_CONCEPTS.length];
  const concept = structuredClone(demo.concept) as { aircraft: { aero: { aspectRatio: number } } };
  concept.aircraft.aero.aspectRatio = Math.round((concept.aircraft.aero.aspectRatio + (i % 17) * 0.1) * 100) / 100;
  return `${JSON.stringify(concept, null, 2)}\n`;
}

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-bench-'));
try {
  const file = join(folder, 'bench.loftpoint');
  const service = new ProjectService({ author: 'bench' });
  service.createProject({ file, name: 'Benchmark' });

  const saveMs: number[] = [];
  let conceptBytes = 0;
  for (let i = 0; i < VERSIONS; i++) {
    const text = conceptText(i);
    conceptBytes += Buffer.byteLength(text);
    const note = `Version ${i + 1}: aspect ratio study.\n\nWhy: trade-off between cruise and climb margins.`;
    const [, ms] = timed(() => service.saveVersion({ conceptText: text, note, conceptName: DEMO_CONCEPTS[i % DEMO_CONCEPTS.length].title }));
    saveMs.push(ms);
  }

  // The write alone: the same rows appended in one transaction each, without parsing or evaluating.
  const sample = service.getVersion({ version: 1 });
  const writeMs: number[] = [];
  {
    const store = new ProjectStore(openProjectFile(join(folder, 'bench.loftpoint')));
    const conceptId = sample.conceptId;
    const evaluationJson = JSON.stringify(sample.summary);
    for (let i = 0; i < 200; i++) {
      const [, ms] = timed(() =>
        store.write(() =>
          store.insertVersion({
            conceptId,
            parent: store.latestVersionOf(conceptId),
            conceptJson: sample.conceptText,
            evaluationJson,
            note: sample.note,
            author: 'bench',
            createdAt: new Date().toISOString(),
          }),
        ),
      );
      writeMs.push(ms);
    }
    store.close();
  }
  service.closeProject({});

  // Bytes per version on a project of exactly 1,000 versions (the file as it rests, WAL folded in).
  const sizeFile = join(folder, 'size.loftpoint');
  const sizer = new ProjectService({ author: 'bench' });
  sizer.createProject({ file: sizeFile, name: 'Size' });
  const emptyBytes = statSync(sizeFile).size;
  const exported = new ProjectService();
  exported.openProject({ file });
  const rows = exported.exportProject({}).versions.slice(0, VERSIONS);
  exported.closeProject({});
  sizer.closeProject({});
  const importFile = join(folder, 'thousand.loftpoint');
  const importer = new ProjectService();
  importer.importProject({
    file: importFile,
    document: {
      format: 'loftpoint-project-export/1',
      exportedAt: new Date().toISOString(),
      project: { name: 'Thousand', description: '', units: 'si', createdAt: new Date().toISOString() },
      concepts: DEMO_CONCEPTS.map((demo) => ({ name: demo.title, createdAt: new Date().toISOString() })),
      versions: rows.map((row) => ({ ...row, parent: null, tags: [] })),
    },
  });
  importer.closeProject({});
  const fileBytes = statSync(importFile).size;
  const bytesPerVersion = (fileBytes - emptyBytes) / VERSIONS;

  // Opening and listing the 1,000-version project.
  const openMs: number[] = [];
  const listMs: number[] = [];
  for (let run = 0; run < OPEN_RUNS; run++) {
    const reader = new ProjectService();
    const [, open] = timed(() => reader.openProject({ file: importFile }));
    const [listed, list] = timed(() => reader.listVersions({}));
    if (listed.length !== VERSIONS) throw new Error(`listed ${listed.length} versions, expected ${VERSIONS}`);
    openMs.push(open);
    listMs.push(list);
    reader.closeProject({});
  }

  const fmt = (ms: number) => `${ms.toFixed(2)} ms`;
  const verdict = (value: number, target: number) => (value < target ? 'met' : 'MISSED');
  const rowsOut: string[][] = [
    ['save a version (check, evaluate, write), median', fmt(median(saveMs)), '< 5 ms', verdict(median(saveMs), 5)],
    ['save a version, 95th percentile', fmt(percentile(saveMs, 95)), '', ''],
    ['  of which the write transaction, median', fmt(median(writeMs)), '', ''],
    [`open a ${VERSIONS}-version project, median`, fmt(median(openMs)), '< 50 ms', verdict(median(openMs), 50)],
    [`list its ${VERSIONS} versions, median`, fmt(median(listMs)), '< 50 ms', verdict(median(listMs), 50)],
    ['bytes per version in the file', `${Math.round(bytesPerVersion)} B`, '< 8192 B', verdict(bytesPerVersion, 8192)],
    ['  of which concept JSON text, mean', `${Math.round(conceptBytes / VERSIONS)} B`, '', ''],
    ['file size with 1,000 versions', `${(fileBytes / 1024).toFixed(0)} KiB`, '', ''],
  ];
  const widths = [0, 1, 2, 3].map((c) => Math.max(...rowsOut.map((r) => r[c].length), ['measure', 'figure', 'target', ''][c].length));
  const line = (cells: string[]) => cells.map((cell, c) => cell.padEnd(widths[c])).join('  ').trimEnd();
  console.log(line(['measure', 'figure', 'target', '']));
  console.log(line(widths.map((w) => '-'.repeat(w))));
  for (const row of rowsOut) console.log(line(row));
  console.log(`(${process.version}, ${VERSIONS} saves, ${OPEN_RUNS} opens; load average ${(await import('node:os')).loadavg()[0].toFixed(1)})`);
} finally {
  rmSync(folder, { recursive: true, force: true });
}
