/**
 * The requirements table: each requirement's id, kind, label (which names
 * its source), main values in display units, whether it binds at the
 * optimum, and its margin at the optimum and at the design point.
 */
import { kindTitle } from '../chart/palette';
import { marginText, marginValue, type ReportContext } from './context';
import { cell, markup, paragraph, section, table, text } from './html';
import { requirementValues } from './requirement-values';

export function requirementsSection(ctx: ReportContext): string {
  const { design, evaluation, system } = ctx;
  const active = new Set(evaluation.optimum?.active ?? []);
  const hasPoint = evaluation.designPoint !== undefined;
  const header = ['Id and kind', 'Label (with its source) and values', 'Binds', 'Mach at optimum', 'Margin at optimum', ...(hasPoint ? ['Margin at design point'] : [])];
  const rows = design.requirements.map((r) => {
    const label = r.label?.trim() ? r.label.trim() : 'No label or source given';
    const described = markup(`${text(label)}<span class="label">${text(requirementValues(r, design.aircraft.propulsion.kind, system))}</span>`);
    const id = markup(`<span class="id">${text(r.id)}</span><span class="label">${text(kindTitle(r.kind))}</span>`);
    if (!r.enabled) return [id, described, 'off', '—', '—', ...(hasPoint ? ['—'] : [])];
    const mach = evaluation.boundaries.find((b) => b.id === r.id)?.machAtOptimum;
    const atPoint = marginValue(evaluation.designPoint?.margins, r.id);
    return [
      id,
      described,
      active.has(r.id) ? cell('yes', 'binds') : '',
      mach !== undefined && Number.isFinite(mach) ? `M${mach.toFixed(mach < 0.1 ? 3 : 2)}` : '—',
      marginText(evaluation.optimum?.margins, r.id),
      ...(hasPoint ? [cell(marginText(evaluation.designPoint?.margins, r.id), atPoint < 0 ? 'bad' : undefined)] : []),
    ];
  });
  const body = [
    table(header, rows, { numeric: hasPoint ? [3, 4, 5] : [3, 4], className: 'requirements' }),
    paragraph('Margins are relative loadings (methods reference, section 7): positive means met with room to spare, negative means missed. A requirement that is off is not on the diagram.', 'small muted'),
  ].join('\n');
  return section('requirements', `Requirements (${design.requirements.filter((r) => r.enabled).length} on the diagram)`, body);
}
