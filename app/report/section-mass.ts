/**
 * The take-off mass closed from the mission: the breakdown (with a stacked
 * bar), each segment as flown, the growth factor and what moves the mass.
 */
import { AIRCRAFT_CLASS_TITLES, formatQuantity, type MassJson } from '../../core';
import { threeFigures } from '../../core/units/display';
import type { ReportContext } from './context';
import { facts, inlineSvg, paragraph, section, table } from './html';

/** Our own shades for the parts of the mass bar. */
const PART_COLOURS = { empty: '#8a94a6', fuel: '#c9822b', battery: '#3d8f6e', payload: '#3a63a8', crew: '#7a4fa0' } as const;

type Part = keyof typeof PART_COLOURS;

function percent(fraction: number): string {
  return Number.isFinite(fraction) ? `${(fraction * 100).toFixed(1)} %` : '—';
}

/** A horizontal bar split into the parts of the take-off mass, labelled under it. */
function massBar(mass: MassJson, system: ReportContext['system']): string {
  const width = 720;
  const parts = (['empty', mass.battery > 0 ? 'battery' : 'fuel', 'payload', 'crew'] as Part[])
    .map((part) => ({ part, kg: mass[part] }))
    .filter(({ kg }) => kg > 0);
  let x = 0;
  const marks = parts.map(({ part, kg }, i) => {
    const w = (kg / mass.takeoff) * width;
    const rect = `<rect x="${x.toFixed(1)}" y="0" width="${w.toFixed(1)}" height="28" fill="${PART_COLOURS[part]}"><title>${part}</title></rect>`;
    const label = `<text x="${(i * width) / parts.length}" y="48" font-size="12" fill="#222"><tspan fill="${PART_COLOURS[part]}">■</tspan> ${part} ${formatQuantity(kg, 'mass', system)} (${percent(kg / mass.takeoff)})</text>`;
    x += w;
    return rect + label;
  });
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="56" viewBox="0 0 ${width} 56">${marks.join('')}</svg>`;
}

/** Battery energy in kWh, the unit packs are rated in (common practice). */
function energyText(joules: number | null): string {
  return joules !== null && Number.isFinite(joules) ? `${threeFigures(joules / 3.6e6)} kWh` : '—';
}

export function massSection(ctx: ReportContext, mass: MassJson): string {
  const { system, design } = ctx;
  const kg = (value: number) => formatQuantity(value, 'mass', system);
  const battery = mass.battery > 0 || mass.fuel === 0;
  const mission = design.mission;
  const emptyBasis = mission?.emptyMassFraction !== undefined ? 'as given in the mission' : mission ? `${AIRCRAFT_CLASS_TITLES[mission.aircraftClass]} regression` : '';
  const breakdown = facts([
    ['Take-off mass', kg(mass.takeoff)],
    ['Empty', `${kg(mass.empty)} (${percent(mass.emptyFraction)}, ${emptyBasis})`],
    battery ? ['Battery', `${kg(mass.battery)} (${percent(mass.battery / mass.takeoff)})`] : ['Fuel, reserves included', `${kg(mass.fuel)} (${percent(mass.fuel / mass.takeoff)})`],
    ['Payload', kg(mass.payload)],
    ['Crew', kg(mass.crew)],
    ['Growth factor', `${mass.growthFactor.toFixed(2)} (take-off mass per unit of payload)`],
  ]);
  const segments = table(
    ['Segment', 'Mass fraction', battery ? 'Energy' : 'Fuel', 'L/D', 'Speed (TAS)', 'Altitude'],
    mass.segments.map((s) => [
      s.kind,
      s.massFraction === null ? '—' : s.massFraction.toFixed(4),
      battery ? energyText(s.energy) : s.fuel === null ? '—' : kg(s.fuel),
      s.liftToDrag === null ? '—' : s.liftToDrag.toFixed(1),
      formatQuantity(s.speed, 'speed', system),
      formatQuantity(s.altitude, 'altitude', system),
    ]),
    { numeric: [1, 2, 3, 4, 5] },
  );
  const drivers = table(
    ['Input', 'Elasticity', 'Field'],
    mass.drivers.map((d) => [d.name, `${d.elasticity >= 0 ? '+' : '−'}${Math.abs(d.elasticity).toFixed(2)}`, d.field]),
    { numeric: [1] },
  );
  const body = [
    inlineSvg(massBar(mass, system), 'mass', `Take-off mass of ${design.name} by part`),
    breakdown,
    segments,
    paragraph('What moves the take-off mass: per cent change of take-off mass per per cent change of each input.', 'small muted'),
    drivers,
    paragraph(
      `Closed by bracketing in ${mass.iterations} evaluations at the ${ctx.evaluation.designPoint ? 'design point' : 'optimum'}’s wing loading; lift-to-drag ratios from the concept’s clean polar on the sized wing (methods reference, Mission and weight).`,
      'small muted',
    ),
  ].join('\n');
  return section('mass', 'Take-off mass from the mission', body);
}
