/**
 * Warnings about the diagram as a whole: where the optimum fell, the design
 * point, and characteristic speeds that cannot be flown.
 */
import { polarOf, type Polar } from '../aero/drag-polar';
import { minimumDragLiftCoefficient, minimumPowerLiftCoefficient } from '../aero/lift-coefficients';
import type { WarningJson } from '../evaluation';
import type { Design } from '../model';
import { PSF_PA } from '../units/factors';
import { messageNumber } from '../units/message-number';
import type { Optimum } from './optimum';

/** An optimum on an edge of the plot, none at all, or nothing that sets power. */
export function optimumWarnings(
  found: Optimum | null,
  range: readonly [number, number],
  curveCount: number,
  requirementCount: number,
): WarningJson[] {
  if (requirementCount === 0) {
    return [{ code: 'no-requirements', field: 'requirements', message: 'No requirement is enabled, so there is no optimum; enable or add a requirement.' }];
  }
  if (!found) {
    return [{ code: 'no-feasible-point', field: 'requirements', message: 'No plotted wing loading meets every enabled requirement; see the requirements flagged above, or widen the range.' }];
  }
  const out: WarningJson[] = [];
  if (found.unbounded) {
    out.push({ code: 'optimum-at-edge', field: 'diagram.wingLoading', message: 'The least power sits on the right edge of the plotted range: no requirement caps wing loading there. Widen the range or add a stall or landing requirement.' });
  } else if (curveCount > 0 && found.wingLoadingPa <= range[0] * (1 + 1e-6)) {
    out.push({ code: 'optimum-at-edge', field: 'diagram.wingLoading', message: 'The least power sits on the left edge of the plotted range; widen the range to lower wing loadings.' });
  }
  if (curveCount === 0) {
    out.push({ code: 'no-power-requirement', field: 'requirements', message: 'No enabled requirement sets power or thrust; installed power is reported as zero.' });
  }
  return out;
}

export function designPointWarnings(wingLoadingPa: number, range: readonly [number, number]): WarningJson[] {
  const out: WarningJson[] = [];
  if (wingLoadingPa < range[0] || wingLoadingPa > range[1]) {
    out.push({ code: 'design-point-outside-range', field: 'designPoint.wingLoading', message: `The design point's wing loading ${messageNumber(wingLoadingPa)} N/m^2 is outside the plotted range.` });
  }
  if (wingLoadingPa < PSF_PA || wingLoadingPa > 150 * PSF_PA) {
    out.push({ code: 'assumption-outside-typical-range', field: 'designPoint.wingLoading', message: `Wing loading ${messageNumber(wingLoadingPa)} N/m^2 is outside the typical 1-150 psf (48-7200 N/m^2) (common practice).` });
  }
  return out;
}

export function speedWarnings(design: Design): WarningJson[] {
  const clean = polarOf(design.aircraft, 'clean') as Polar;
  const out: WarningJson[] = [];
  for (const [name, cl] of [['minimum-drag', minimumDragLiftCoefficient(clean)], ['minimum-power', minimumPowerLiftCoefficient(clean)]] as const) {
    if (cl > clean.clMax) {
      out.push({
        code: 'speed-below-stall',
        field: 'aircraft.aero.configurations.clean.clMax',
        message: `The ${name} speed needs C_L ${messageNumber(cl)}, above the clean C_Lmax ${messageNumber(clean.clMax)}: it is below the stall speed and shown for reference only.`,
      });
    }
  }
  return out;
}
