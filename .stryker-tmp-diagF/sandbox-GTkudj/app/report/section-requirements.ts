/**
 * The requirements table: each requirement's id, kind, label (which names
 * its source), main values in display units, whether it binds at the
 * optimum, and its margin at the optimum and at the design point.
 */
// @ts-nocheck

import { kindTitle } from '../chart/palette';
import { marginText, marginValue, type ReportContext } from './context';
import { cell, markup, paragraph, section, table, text } from './html';
import { requirementValues, segmentsText } from './requirement-values';
import { formatQuantity } from '../../core';

export function requirementsSection(ctx: ReportContext): string {
  const { design, evaluation, system } = ctx;
  const active = new Set(evaluation.optimum?.active ?? []);
  const hasPoint = evaluation.designPoint !== undefined;
  const header = ['Id and kind', 'Label (with its source) and values', 'Binds', 'Margin at optimum', 'Speed at optimum (TAS)', 'Mach at optimum', ...(hasPoint ? ['Margin at design point'] : [])];
  const rows = design.requirements.map((r) => {
    const label = r.label?.trim() ? r.label.trim() : 'No label or source given';
    const boundary = evaluation.boundaries.find((b) => b.id === r.id);
    const segments = boundary?.segmentsAtOptimum ? `<span class="label">${text(`At the optimum: ${segmentsText(boundary.segmentsAtOptimum, system)}`)}</span>` : '';
    const described = markup(`${text(label)}<span class="label">${text(requirementValues(r, design.aircraft.propulsion.kind, system))}</span>${segments}`);
    const id = markup(`<span class="id">${text(r.id)}</span><span class="label">${text(kindTitle(r.kind))}</span>`);
    if (!r.enabled) return [id, described, 'off', '—', '—', '—', ...(hasPoint ? ['—'] : [])];
    const mach = boundary?.machAtOptimum;
    const atPoint = marginValue(evaluation.designPoint?.margins, r.id);
    return [
      id,
      described,
      active.has(r.id) ? cell('yes', 'binds') : '',
      marginText(evaluation.optimum?.margins, r.id),
      formatQuantity(boundary?.speedAtOptimum, 'speed', system),
      mach !== undefined && Number.isFinite(mach) ? `M${mach.toFixed(mach < 0.1 ? 3 : 2)}` : '—',
      ...(hasPoint ? [cell(marginText(evaluation.designPoint?.margins, r.id), atPoint < 0 ? 'bad' : undefined)] : []),
    ];
  });
  const body = [
    table(header, rows, { numeric: hasPoint ? [3, 4, 5, 6] : [3, 4, 5], className: 'requirements' }),
    paragraph('Margins are relative loadings (methods reference, section 7): positive means met with room to spare, negative means missed. The speed at the optimum is the true airspeed of the condition each requirement uses there (lift-off, V2, touchdown, approach, climb, cruise or turn speed), and the Mach number is that speed over the speed of sound at the requirement\'s altitude and temperature. A requirement that is off is not on the diagram.', 'small muted'),
  ].join('\n');
  return section('requirements', `Requirements (${design.requirements.filter((r) => r.enabled).length} on the diagram)`, body);
}
