/**
 * A requirement's main values in display units, as a design engineer reads
 * them: "45.0 kt CAS · landing configuration", "250 m ground roll · 800 ft,
 * ISA+15 K · μ 0.05". Resolved (SI) values, so defaults show too.
 */
import { formatQuantity, type PropulsionKind, type Requirement, type UnitSystem } from '../../core';

const PROPELLER_KINDS: ReadonlySet<PropulsionKind> = new Set(['piston', 'turbocharged-piston', 'turboprop', 'electric']);

function plain(value: number, digits = 2): string {
  return Number.isFinite(value) ? String(Number(value.toFixed(digits))) : '—';
}

function percent(fraction: number): string {
  return Number.isFinite(fraction) ? `${Number((fraction * 100).toFixed(2))} %` : '—';
}

/** "ISA+15 K" (SI) or "ISA+27 °F" (US); "ISA" when there is no offset. */
export function isaText(offsetK: number, system: UnitSystem): string {
  if (!Number.isFinite(offsetK) || offsetK === 0) return 'ISA';
  // A temperature difference of 1 K is 1.8 degF (NIST SP 811, Appendix B).
  const shown = system === 'us' ? `${plain(Math.abs(offsetK) * 1.8, 1)} °F` : `${plain(Math.abs(offsetK), 1)} K`;
  return `ISA${offsetK > 0 ? '+' : '−'}${shown}`;
}

function main(r: Requirement, system: UnitSystem): string[] {
  const speed = (v: number) => formatQuantity(v, 'speed', system);
  switch (r.kind) {
    case 'stall':
      return [`${speed(r.speedMps)} CAS`];
    case 'landing-ground-roll':
      return [`${formatQuantity(r.distanceM, 'length', system)} ground roll`, `μ braking ${plain(r.brakingFriction)}`];
    case 'takeoff-ground-roll':
      return [`${formatQuantity(r.distanceM, 'length', system)} ground roll`, `μ rolling ${plain(r.rollingFriction, 3)}`, `CL ground run ${plain(r.clGroundRun)}`];
    case 'cruise':
      return [`${speed(r.speedMps)} TAS`];
    case 'climb-rate':
      return [`${formatQuantity(r.rateMps, 'climbRate', system)}`, r.speedMps === undefined ? 'at the best-rate speed' : `at ${speed(r.speedMps)} TAS`];
    case 'climb-gradient':
      return [`gradient ${percent(r.gradient)}`, ...(r.enginesInoperative > 0 ? [`${r.enginesInoperative} engine${r.enginesInoperative === 1 ? '' : 's'} out`] : []), `at ${plain(r.speedFactor)} × stall speed`];
    case 'ceiling':
      return [`${formatQuantity(r.rateMps, 'climbRate', system)} at ${formatQuantity(r.altitudeM, 'altitude', system)}`];
    case 'sustained-turn':
      return [`n ${plain(r.loadFactor)} at ${speed(r.speedMps)} TAS`];
  }
}

/** Where and how: altitude, day, weight, power setting, propeller efficiency, configuration. */
function conditions(r: Requirement, kind: PropulsionKind): string[] {
  const out: string[] = [];
  if (r.massFraction !== 1) out.push(`at ${percent(r.massFraction)} of take-off mass`);
  if (r.powerSetting !== 1) out.push(`${percent(r.powerSetting)} ${kind === 'turbofan' ? 'thrust' : 'power'}`);
  const usesPropeller = PROPELLER_KINDS.has(kind) && r.kind !== 'stall' && r.kind !== 'landing-ground-roll';
  if (usesPropeller) out.push(`η prop ${plain(r.propellerEfficiency)}`);
  out.push(`${r.configuration} configuration`);
  return out;
}

export function requirementValues(r: Requirement, kind: PropulsionKind, system: UnitSystem): string {
  const where = r.kind === 'ceiling' ? [] : r.altitudeM !== 0 || r.temperatureOffsetK !== 0 ? [`${formatQuantity(r.altitudeM, 'altitude', system)}, ${isaText(r.temperatureOffsetK, system)}`] : [];
  if (r.kind === 'ceiling' && r.temperatureOffsetK !== 0) where.push(isaText(r.temperatureOffsetK, system));
  return [...main(r, system), ...where, ...conditions(r, kind)].join(' · ');
}
