/**
 * The version: its note (as preformatted text, never markup) and what
 * changed since its parent version, from the project service's comparison:
 * requirements added, removed and changed, assumptions, and how the
 * optimum, the design point, the margins and the sizing moved.
 */
// @ts-nocheck

import { formatMargin, formatQuantity, toDisplay, type UnitSystem } from '../../core';
import { signedChange } from '../chart/change-text';
import type { FieldChange, MarginChange, PointMove, VersionComparison } from '../shared/contract';
import { cell, facts, paragraph, section, table, text } from './html';
import { shortTime, type ReportVersion } from './section-overview';

function written(value: unknown): string {
  if (value === undefined) return '(absent)';
  if (typeof value === 'string') return value;
  return JSON.stringify(value);
}

function fieldRows(changes: readonly FieldChange[]): string[][] {
  return changes.map((change) => [change.path, written(change.before), written(change.after)]);
}

function moveText(move: PointMove, axis: VersionComparison['axis'], system: UnitSystem): Array<readonly [string, string]> {
  const w = (v: number | undefined) => formatQuantity(v, 'wingLoading', system);
  const y = (v: number | undefined, which: 'before' | 'after') => formatQuantity(v, axis[which], system);
  const delta = (v: number | undefined, quantity: 'wingLoading' | 'powerToWeight' | 'thrustToWeight') =>
    v === undefined ? '' : ` (${signedChange(toDisplay(v, quantity, system), quantity, system)})`;
  return [
    ['Wing loading', `${w(move.before?.wingLoading)} → ${w(move.after?.wingLoading)}${delta(move.delta?.wingLoading, 'wingLoading')}`],
    [axis.after === 'thrustToWeight' ? 'Thrust-to-weight' : 'Power-to-weight', `${y(move.before?.loading, 'before')} → ${y(move.after?.loading, 'after')}${delta(move.delta?.loading, axis.after)}`],
  ];
}

function marginRows(margins: readonly MarginChange[]): string[][] {
  return margins
    .filter((m) => m.delta === null || Math.abs(m.delta) >= 0.0005)
    .map((m) => {
      const points = m.delta === null ? '—' : `${m.delta > 0 ? '+' : m.delta < 0 ? '−' : ''}${Math.abs(m.delta * 100).toFixed(1)} pts`;
      return [m.id, formatMargin(m.before), formatMargin(m.after), points];
    });
}

function changesHtml(comparison: VersionComparison, system: UnitSystem): string {
  const parts: string[] = [];
  const { added, removed, changed } = comparison.requirements;
  const requirementRows = [
    ...added.map((r) => [cell(r.id, 'id'), 'added', r.label ?? r.kind]),
    ...removed.map((r) => [cell(r.id, 'id'), 'removed', r.label ?? r.kind]),
    ...changed.map((r) => [cell(r.id, 'id'), 'changed', r.fields.map((f) => `${f.path}: ${written(f.before)} → ${written(f.after)}`).join('; ')]),
  ];
  parts.push('<h4>Requirements</h4>', requirementRows.length > 0 ? table(['Id', 'Change', 'What'], requirementRows) : paragraph('No change.', 'muted'));
  parts.push('<h4>Assumptions</h4>', comparison.assumptions.length > 0 ? table(['Field', 'Before', 'After'], fieldRows(comparison.assumptions)) : paragraph('No change.', 'muted'));
  if (comparison.other.length > 0) parts.push('<h4>Other fields</h4>', table(['Field', 'Before', 'After'], fieldRows(comparison.other)));
  if (comparison.axis.before !== comparison.axis.after) {
    parts.push(paragraph(`The vertical axis changed from ${comparison.axis.before} to ${comparison.axis.after}; loadings are not compared.`, 'notice'));
  }
  const binding = `${comparison.optimum.activeBefore.join(', ') || '—'} → ${comparison.optimum.activeAfter.join(', ') || '—'}`;
  const { wingArea, installed } = comparison.sizing;
  const installedQuantity = installed.id === 'thrust' ? 'thrust' : 'power';
  const sized = (m: MarginChange, quantity: 'area' | 'power' | 'thrust') =>
    `${formatQuantity(m.before, quantity, system)} → ${formatQuantity(m.after, quantity, system)}${m.delta === null ? '' : ` (${signedChange(toDisplay(m.delta, quantity, system), quantity, system)})`}`;
  parts.push(
    '<h4>Results</h4>',
    facts([
      ...moveText(comparison.optimum, comparison.axis, system).map(([name, value]) => [`Optimum: ${name.toLowerCase()}`, value] as const),
      ['Optimum: bound by', binding],
      ...(comparison.designPoint.before || comparison.designPoint.after
        ? moveText(comparison.designPoint, comparison.axis, system).map(([name, value]) => [`Design point: ${name.toLowerCase()}`, value] as const)
        : []),
      ['Wing area', sized(wingArea, 'area')],
      [`Installed ${installedQuantity}`, sized(installed, installedQuantity)],
    ]),
  );
  const marginChanges = marginRows(comparison.margins.designPoint.length > 0 ? comparison.margins.designPoint : comparison.margins.optimum);
  if (marginChanges.length > 0) {
    const where = comparison.margins.designPoint.length > 0 ? 'design point' : 'optimum';
    parts.push(`<h4>Margins that moved (at the ${where})</h4>`, table(['Requirement', 'Before', 'After', 'Change'], marginChanges, { numeric: [1, 2, 3] }));
  }
  return parts.join('\n');
}

export function versionSection(version: ReportVersion | undefined, comparison: VersionComparison | undefined, system: UnitSystem, unsavedDraft = false): string {
  if (!version) {
    const from = unsavedDraft
      ? 'This report was made from an unsaved draft in the designer window, not a saved version: there is no version note yet. Save a version to record one.'
      : 'This report was made from a concept file, not a saved version: there is no version note and no parent to compare with.';
    return section('version', 'Version', paragraph(from, 'muted'));
  }
  const parts = [
    facts([
      ['Version', String(version.number)],
      ['Saved', `${shortTime(version.createdAt)} by ${version.author.trim() || 'unknown author'}`],
      ['Parent', version.parent === null ? 'none (first version)' : `version ${version.parent}`],
    ]),
    '<h3>Note</h3>',
    version.note.trim() ? `<pre class="note">${text(version.note)}</pre>` : paragraph('No note was saved with this version.', 'muted'),
  ];
  if (version.parent !== null) {
    parts.push(`<h3>What changed since version ${text(String(version.parent))}</h3>`);
    parts.push(comparison ? changesHtml(comparison, system) : paragraph('The parent version could not be read, so the changes are not shown.', 'notice'));
  }
  return section('version', `Version ${version.number}: note and changes`, parts.join('\n'));
}
