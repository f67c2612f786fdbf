/**
 * Readable renderings of service answers for the command line: the version
 * list and a comparison. Units follow the project's preference; every
 * rendering ends with the preliminary-sizing caution.
 */
// @ts-nocheck

import { formatMargin, formatQuantity, type UnitSystem } from '../../core';
import type { EvaluationSummary, FieldChange, MarginChange, PointMove, VersionComparison, VersionSummary } from './contract';
import { PRELIMINARY_CAUTION } from './contract';

type Axis = EvaluationSummary['axis'];

function table(header: string[], rows: string[][]): string {
  const widths = header.map((title, column) => Math.max(title.length, ...rows.map((row) => row[column].length)));
  const line = (cells: string[]) =>
    cells
      .map((cell, column) => (column === cells.length - 1 ? cell : cell.padEnd(widths[column])))
      .join('  ')
      .trimEnd();
  return [line(header), line(widths.map((width) => '-'.repeat(width))), ...rows.map(line)].join('\n');
}

function clip(text: string, max: number): string {
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
}

function shortTime(iso: string): string {
  return /^\d{4}-\d\d-\d\dT\d\d:\d\d/.test(iso) ? `${iso.slice(0, 10)} ${iso.slice(11, 16)}` : iso;
}

function loadingText(value: number | null | undefined, axis: Axis, units: UnitSystem): string {
  return formatQuantity(value, axis, units);
}

function pointText(point: { wingLoading: number; loading: number } | null, axis: Axis, units: UnitSystem): string {
  if (!point) return '—';
  const loading = loadingText(point.loading, axis, units);
  return `${formatQuantity(point.wingLoading, 'wingLoading', units)}, ${axis === 'thrustToWeight' ? `T/W ${loading}` : loading}`;
}

export function versionsText(versions: readonly VersionSummary[], units: UnitSystem, projectName: string): string {
  if (versions.length === 0) return `${projectName}: no versions yet.\n${PRELIMINARY_CAUTION}\n`;
  const rows = versions.map((version) => [
    String(version.number),
    clip(version.conceptName, 28),
    version.parent === null ? '—' : String(version.parent),
    shortTime(version.createdAt),
    clip(version.author, 16),
    version.summary.error ? 'not evaluated' : pointText(version.summary.optimum, version.summary.axis, units),
    clip((version.note.split(/\r?\n/, 1)[0] ?? '').trim(), 48) + (version.tags.length > 0 ? ` [${version.tags.join(', ')}]` : ''),
  ]);
  return `${projectName}\n${table(['#', 'concept', 'parent', 'saved (UTC)', 'author', 'optimum', 'note'], rows)}\n${PRELIMINARY_CAUTION}\n`;
}

function written(value: unknown): string {
  return value === undefined ? '(absent)' : JSON.stringify(value);
}

function fieldLines(changes: readonly FieldChange[], indent: string): string[] {
  return changes.map((change) => `${indent}${change.path}: ${written(change.before)} -> ${written(change.after)}`);
}

function signed(value: number | null, format: (v: number) => string): string {
  if (value === null || !Number.isFinite(value)) return '';
  const sign = value > 0 ? '+' : value < 0 ? '−' : '±';
  return ` (${sign}${format(Math.abs(value))})`;
}

function moveLines(title: string, move: PointMove, axis: { before: Axis; after: Axis }, units: UnitSystem): string[] {
  if (!move.before && !move.after) return [`${title}: none in either version`];
  const lines = [`${title}:`];
  lines.push(
    `  wing loading      ${formatQuantity(move.before?.wingLoading, 'wingLoading', units)} -> ${formatQuantity(move.after?.wingLoading, 'wingLoading', units)}` +
      signed(move.delta?.wingLoading ?? null, (v) => formatQuantity(v, 'wingLoading', units)),
  );
  const name = axis.after === 'thrustToWeight' ? 'thrust-to-weight ' : 'power-to-weight  ';
  lines.push(
    `  ${name} ${loadingText(move.before?.loading, axis.before, units)} -> ${loadingText(move.after?.loading, axis.after, units)}` +
      signed(move.delta?.loading ?? null, (v) => loadingText(v, axis.after, units)),
  );
  return lines;
}

function marginPoints(delta: number | null): string {
  if (delta === null || !Number.isFinite(delta)) return '';
  const points = delta * 100;
  return `${points > 0.05 ? '+' : points < -0.05 ? '−' : '±'}${Math.abs(points).toFixed(1)} pts`;
}

function marginLines(title: string, margins: readonly MarginChange[]): string[] {
  if (margins.length === 0) return [];
  const rows = margins.map((m) => [m.id, formatMargin(m.before), formatMargin(m.after), marginPoints(m.delta)]);
  return [`${title}:`, ...table(['requirement', 'before', 'after', 'change'], rows).split('\n').map((line) => `  ${line}`)];
}

export function comparisonText(comparison: VersionComparison, units: UnitSystem): string {
  const { a, b } = comparison;
  const lines: string[] = [
    `Version ${a.number} ("${a.conceptName}", ${shortTime(a.createdAt)}, ${a.author}) -> version ${b.number} ("${b.conceptName}", ${shortTime(b.createdAt)}, ${b.author})`,
    '',
  ];
  const { added, removed, changed } = comparison.requirements;
  lines.push('Requirements:');
  if (added.length + removed.length + changed.length === 0) lines.push('  no change');
  for (const r of added) lines.push(`  + ${r.id} (${r.kind}) added: ${JSON.stringify(r.requirement)}`);
  for (const r of removed) lines.push(`  - ${r.id} (${r.kind}) removed`);
  for (const r of changed) lines.push(`  ~ ${r.id} (${r.kind}) changed:`, ...fieldLines(r.fields, '      '));
  lines.push('Assumptions:');
  lines.push(...(comparison.assumptions.length === 0 ? ['  no change'] : fieldLines(comparison.assumptions, '  ')));
  if (comparison.other.length > 0) lines.push('Other fields:', ...fieldLines(comparison.other, '  '));
  if (comparison.axis.before !== comparison.axis.after) {
    lines.push(`Note: the vertical axis changed from ${comparison.axis.before} to ${comparison.axis.after}; loadings are not compared.`);
  }
  lines.push('');
  lines.push(...moveLines('Optimum', comparison.optimum, comparison.axis, units));
  const before = comparison.optimum.activeBefore.join(', ') || '—';
  const after = comparison.optimum.activeAfter.join(', ') || '—';
  lines.push(`  binding           ${before} -> ${after}`);
  lines.push(...moveLines('Design point', comparison.designPoint, comparison.axis, units));
  lines.push(...marginLines('Margins at the design point', comparison.margins.designPoint));
  lines.push(...marginLines('Margins at the optimum', comparison.margins.optimum));
  const { wingArea, installed } = comparison.sizing;
  const installedQuantity = installed.id === 'thrust' ? 'thrust' : 'power';
  lines.push('Sizing at take-off mass:');
  lines.push(
    `  wing area         ${formatQuantity(wingArea.before, 'area', units)} -> ${formatQuantity(wingArea.after, 'area', units)}` +
      signed(wingArea.delta, (v) => formatQuantity(v, 'area', units)),
  );
  lines.push(
    `  installed ${installedQuantity.padEnd(7)} ${formatQuantity(installed.before, installedQuantity, units)} -> ${formatQuantity(installed.after, installedQuantity, units)}` +
      signed(installed.delta, (v) => formatQuantity(v, installedQuantity, units)),
  );
  lines.push('', PRELIMINARY_CAUTION);
  return `${lines.join('\n')}\n`;
}
