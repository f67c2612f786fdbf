/**
 * The assumptions: the aircraft (mass, aspect ratio, propulsion), each
 * aerodynamic configuration, and every ranged assumption with its range and
 * distribution (the concept's own, or the typical ranges the studies used).
 */
// @ts-nocheck

import { propulsionKind } from '../../core/propulsion/kinds';
import { formatQuantity } from '../../core';
import { plainNumber } from '../chart/tornado-data';
import type { ReportContext } from './context';
import { cell, facts, markup, paragraph, section, table, text } from './html';
import type { RangeRow, ReportStudies } from './studies';

function rangeNote(row: RangeRow | undefined): string {
  return row ? `<span class="label">range ${text(plainNumber(row.low))} to ${text(plainNumber(row.high))}, ${text(row.distribution)}</span>` : '';
}

export function assumptionsSection(ctx: ReportContext, studies: ReportStudies | null): string {
  const { design, system } = ctx;
  const { aircraft } = design;
  const own = new Map((studies?.ranges === 'concept' ? studies.rows : []).map((row) => [row.field, row]));
  const value = (field: string, v: number) => markup(`${text(plainNumber(v))}${rangeNote(own.get(field))}`);
  const propulsion = aircraft.propulsion;
  const aircraftRows: Array<readonly [string, ReturnType<typeof cell> | string]> = [
    ['Take-off mass', formatQuantity(aircraft.takeoffMassKg, 'mass', system)],
    ['Aspect ratio', value('aircraft.aero.aspectRatio', aircraft.aspectRatio)],
    ['Linear drag term K1 (C_D = C_D0 + K1 C_L + K C_L²)', value('aircraft.aero.cdLinear', aircraft.cdLinear)],
    ['Propulsion', `${propulsion.kind}, ${propulsion.engines} engine${propulsion.engines === 1 ? '' : 's'}`],
  ];
  const propulsionDescriptor = propulsionKind(propulsion.kind);
  if (propulsionDescriptor.lapseExponent) {
    aircraftRows.push([`Lapse exponent m (${propulsionDescriptor.propeller ? 'power' : 'thrust'} ∝ σ^m)`, value('aircraft.propulsion.lapseExponent', propulsion.lapseExponent)]);
  }
  if (propulsionDescriptor.needsCriticalAltitude) aircraftRows.push(['Critical altitude', formatQuantity(propulsion.criticalAltitudeM, 'altitude', system)]);

  const clean = aircraft.configurations.clean;
  const configurationRows = Object.entries(aircraft.configurations).map(([name, polar]) => {
    const at = (key: string) => `aircraft.aero.configurations.${name}.${key}`;
    return [
      cell(name, 'code'),
      name === 'clean' ? value(at('cd0'), polar.cd0) : cell(plainNumber(polar.cd0)),
      name === 'clean' ? '—' : value(at('cd0Increment'), polar.cd0 - (clean?.cd0 ?? 0)),
      value(at('oswaldEfficiency'), polar.oswaldEfficiency),
      value(at('clMax'), polar.clMax),
    ];
  });

  const parts = [
    '<h3>Aircraft</h3>',
    facts(aircraftRows),
    '<h3>Aerodynamic configurations</h3>',
    table(['Configuration', 'C_D0', 'ΔC_D0 from clean', 'Oswald e', 'C_Lmax'], configurationRows, { numeric: [1, 2, 3, 4] }),
  ];
  if (studies && studies.rows.length > 0) {
    const typical = studies.ranges === 'typical';
    parts.push(typical ? '<h3>Typical ranges used by the studies</h3>' : '<h3>Ranged assumptions</h3>');
    if (typical) {
      parts.push(paragraph('The concept gives no ranges. The studies below use the typical ranges of the methods reference (section 9) for every assumption that has one, uniform over the range and widened where needed to contain the concept’s own value. They show which assumptions could move the design point; they are not the concept’s own uncertainty.', 'notice'));
    }
    const rows = studies.rows.map((row) => [
      markup(`${text(row.label)}<span class="label">${text(row.field)}</span>`),
      plainNumber(row.low),
      plainNumber(row.nominal),
      plainNumber(row.high),
      row.distribution,
      ...(typical ? [cell(row.source ?? '—', 'small')] : []),
    ]);
    parts.push(table(['Assumption', 'Low', 'Nominal', 'High', 'Distribution', ...(typical ? ['Source'] : [])], rows, { numeric: [1, 2, 3] }));
  } else {
    parts.push(paragraph('No assumption carries a range, and none has a published typical range to study.', 'muted'));
  }
  return section('assumptions', 'Assumptions', parts.join('\n'));
}
