/**
 * Warnings about flight Mach numbers the methods do not cover: above 0.6
 * without the wing's compressibility data, and above 1 at all.
 */
// @ts-nocheck

import type { WarningJson } from '../evaluation';
import type { Design } from '../model';
import type { RequirementBoundary } from './boundaries';
import { flightMachAt } from './flight-mach';

/** Where compressibility drag starts to matter on a subsonic wing (common practice). */
export const COMPRESSIBILITY_MACH = 0.6;

/** One warning per requirement flown faster than the methods cover, at the given wing loading. */
export function compressibilityWarnings(entries: readonly RequirementBoundary[], design: Design, wingLoadingPa: number): WarningJson[] {
  const out: WarningJson[] = [];
  const modelled = design.aircraft.compressibility !== undefined;
  for (const entry of entries) {
    const mach = flightMachAt(entry, wingLoadingPa);
    if (mach === undefined) continue;
    const field = `requirements[${entry.index}]`;
    const shown = mach.toFixed(2);
    if (mach > 1) {
      out.push({
        code: 'supersonic',
        field,
        severity: 'error',
        message: `Requirement "${entry.requirement.id}" flies at Mach ${shown}, above Mach 1: the drag polar and lapse models are subsonic, so this boundary cannot be trusted; check the speed.`,
      });
    } else if (mach > COMPRESSIBILITY_MACH && !modelled) {
      out.push({
        code: 'compressibility-not-modelled',
        field,
        message: `Requirement "${entry.requirement.id}" flies at Mach ${shown}: compressibility (wave drag) is not modelled; give aircraft.aero thicknessRatio, quarterChordSweep and kornFactor to include it.`,
      });
    }
  }
  return out;
}
