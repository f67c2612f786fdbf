/**
 * A requirement's main values in display units, as a design engineer reads
 * them: "45.0 kt CAS · landing configuration", "250 m ground roll · 800 ft,
 * ISA+15 K · μ 0.05". Resolved (SI) values, so defaults show too.
 */
// @ts-nocheck

import { formatQuantity, type PropulsionKind, type Requirement, type UnitSystem } from '../../core';
import { propulsionKind } from '../../core/propulsion/kinds';
import { requirementKind } from '../../core/requirements';
import { percent, plain } from '../../core/requirements/fields';

/** "ISA+15 K" (SI) or "ISA+27 °F" (US); "ISA" when there is no offset. */
export function isaText(offsetK: number, system: UnitSystem): string {
  if (!Number.isFinite(offsetK) || offsetK === 0) return 'ISA';
  // A temperature difference of 1 K is 1.8 degF (NIST SP 811, Appendix B).
  const shown = system === 'us' ? `${plain(Math.abs(offsetK) * 1.8, 1)} °F` : `${plain(Math.abs(offsetK), 1)} K`;
  return `ISA${offsetK > 0 ? '+' : '−'}${shown}`;
}

/** How: weight, power setting, propeller efficiency, configuration. */
function conditions(r: Requirement, kind: PropulsionKind): string[] {
  const out: string[] = [];
  if (r.massFraction !== 1) out.push(`${percent(r.massFraction)} of take-off mass`);
  if (r.powerSetting !== 1) out.push(`${percent(r.powerSetting)} ${propulsionKind(kind).propeller ? 'power' : 'thrust'}`);
  const usesPropeller = propulsionKind(kind).propeller && requirementKind(r.kind).propeller !== null;
  if (usesPropeller) out.push(`η prop ${plain(r.propellerEfficiency)}`);
  out.push(`${r.configuration} configuration`);
  return out;
}

/**
 * The requirement in one line, as an engineer says it: its kind's own values
 * (from the descriptor) at the altitude, then the day, weight, power and
 * configuration: "110 kt TAS at FL060, ISA, 75 % power, clean configuration".
 */
export function requirementValues(r: Requirement, kind: PropulsionKind, system: UnitSystem): string {
  const descriptor = requirementKind(r.kind);
  // A kind whose own field is the altitude (a ceiling) states it in its summary.
  const ownAltitude = 'altitude' in descriptor.shape;
  const [first, ...rest] = descriptor.summary(r, system);
  const altitude = !ownAltitude && r.altitudeM !== 0 ? formatQuantity(r.altitudeM, 'altitude', system) : '';
  // "n 1.41 at 31 kt TAS, 2,034 ft" rather than two "at"s in a row.
  const at = altitude === '' ? '' : (first ?? '').includes(' at ') ? `, ${altitude}` : ` at ${altitude}`;
  return [`${first ?? ''}${at}`, ...rest, isaText(r.temperatureOffsetK, system), ...conditions(r, kind)].join(', ');
}

/** "ground roll 420 m + rotation 150 m + ... = 900 m". */
export function segmentsText(segments: Record<string, number>, system: UnitSystem): string {
  const words = (key: string) => key.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
  const parts = Object.entries(segments).map(([key, metres]) => `${words(key)} ${formatQuantity(metres, 'length', system)}`);
  const total = Object.values(segments).reduce((a, b) => a + b, 0);
  return `${parts.join(' + ')} = ${formatQuantity(total, 'length', system)}`;
}
