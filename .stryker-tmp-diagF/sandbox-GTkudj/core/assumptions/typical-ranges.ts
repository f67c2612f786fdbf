/**
 * The typical ranges of the assumptions, each with its source (methods
 * reference core/methods.md, section 9). The engine's warnings, the window's
 * marks and the studies' starting ranges all read this table; the ranges of a
 * requirement kind's own assumptions live in its descriptor and use the
 * propeller-efficiency rows from here.
 */
// @ts-nocheck

import { band, type TypicalRange } from './typical-range';
import type { ConfigurationRole } from './configuration-role';

export const ASPECT_RATIO: TypicalRange = {
  low: 4,
  high: 40,
  text: '4-5 delta, 6-8 light aircraft, about 10 transports, 20+ sailplanes (common practice)',
  note: 'light aircraft 6–8; transports ≈ 10; sailplanes 20+',
  bands: [
    band(6, 8, 'aspect ratio 6-8 for general aviation (common practice)'),
    band(4, 5, 'aspect ratio 4-5 for deltas (common practice)'),
    band(9, 11, 'aspect ratio about 10 for transports, taken as 9-11 (common practice)'),
  ],
};

const OSWALD_ALL = band(0.7, 0.95, 'e 0.7-0.95 (common practice)');

const OSWALD_TEXT = '0.7-0.95, about 0.8 (common practice)';

/** Oswald efficiency: one warning range; take-off and landing flaps start the studies from their own band. */
export const OSWALD: Readonly<Record<ConfigurationRole, TypicalRange>> = {
  clean: { low: 0.7, high: 0.95, text: OSWALD_TEXT, note: '≈ 0.8 typical', bands: [OSWALD_ALL] },
  takeoff: {
    low: 0.7,
    high: 0.95,
    text: OSWALD_TEXT,
    note: 'take-off flaps 0.75–0.80',
    bands: [band(0.75, 0.8, 'take-off flaps e 0.75-0.80 (Roskam, Airplane Design I, Table 3.6, from memory)'), OSWALD_ALL],
  },
  landing: {
    low: 0.7,
    high: 0.95,
    text: OSWALD_TEXT,
    note: 'landing flaps 0.70–0.75',
    bands: [band(0.7, 0.75, 'landing flaps e 0.70-0.75 (Roskam, Airplane Design I, Table 3.6, from memory)'), OSWALD_ALL],
  },
  other: { low: 0.7, high: 0.95, text: OSWALD_TEXT, note: '≈ 0.8 typical', bands: [OSWALD_ALL] },
};

export const CD0_CLEAN: TypicalRange = {
  low: 0.006,
  high: 0.05,
  text: '0.006 sailplane to 0.05 small UAV (common practice)',
  note: 'light aircraft 0.025–0.035; jets 0.015–0.025',
  bands: [
    band(0.025, 0.035, 'CD0 of light aircraft 0.025-0.035 (common practice)'),
    band(0.018, 0.025, 'CD0 of business jets 0.018-0.025 (common practice)'),
    band(0.015, 0.02, 'CD0 of transports 0.015-0.020 (common practice)'),
    band(0.03, 0.05, 'CD0 of small UAVs 0.03-0.05 (common practice)'),
    band(0.006, 0.012, 'CD0 of sailplanes 0.006-0.012 (common practice)'),
  ],
};

/** Zero-lift drag added by flaps and gear; the engine warns only when it is below zero (less drag than clean). */
export const CD0_INCREMENT: Readonly<Record<ConfigurationRole, TypicalRange>> = {
  clean: { low: 0, high: 0, text: 'none (clean is the reference)', note: '', bands: [] },
  takeoff: {
    low: 0,
    high: 0.045,
    text: 'take-off flaps 0.010-0.020, plus gear 0.015-0.025 (Roskam, Airplane Design I, Table 3.6, from memory)',
    note: 'take-off flaps 0.010–0.020, plus gear',
    bands: [
      band(0.01, 0.02, 'take-off flaps 0.010-0.020 (Roskam, Airplane Design I, Table 3.6, from memory)'),
      band(0.025, 0.045, 'take-off flaps plus gear 0.010-0.020 + 0.015-0.025 (Roskam, Table 3.6, from memory)'),
    ],
  },
  landing: {
    low: 0.04,
    high: 0.1,
    text: 'landing flaps 0.055-0.075, plus gear 0.015-0.025 (Roskam, Airplane Design I, Table 3.6, from memory)',
    note: 'landing flaps 0.055–0.075, plus gear',
    bands: [
      band(0.055, 0.075, 'landing flaps 0.055-0.075 (Roskam, Airplane Design I, Table 3.6, from memory)'),
      band(0.07, 0.1, 'landing flaps plus gear 0.055-0.075 + 0.015-0.025 (Roskam, Table 3.6, from memory)'),
    ],
  },
  other: {
    low: 0,
    high: 0.045,
    text: 'engine-out windmilling and trim 0.003-0.005 (common practice)',
    note: 'engine-out windmilling and trim 0.003–0.005',
    bands: [band(0.003, 0.005, 'engine-out windmilling and trim 0.003-0.005 (common practice)')],
  },
};

/** Maximum lift coefficient by role; a configuration of no known role gets no range. */
export const CLMAX: Readonly<Record<ConfigurationRole, TypicalRange | null>> = {
  clean: {
    low: 0.8,
    high: 1.7,
    text: '0.8 thin wing to 1.2-1.5 typical (common practice)',
    note: '0.8 thin wing; 1.2–1.5 typical',
    bands: [band(1.2, 1.5, 'clean CLmax 1.2-1.5 typical (common practice)'), band(0.8, 1.2, 'clean CLmax from 0.8 for thin wings (common practice)')],
  },
  takeoff: {
    low: 1.4,
    high: 2.2,
    text: '1.4-2.2 (Roskam, Airplane Design I, Table 3.1)',
    note: 'take-off flaps 1.4–2.2',
    bands: [band(1.4, 2.2, 'take-off CLmax 1.4-2.2 (Roskam, Airplane Design I, Table 3.1, from memory)')],
  },
  landing: {
    low: 1.6,
    high: 2.8,
    text: '1.6-2.8, about 5 with powered lift (Roskam, Airplane Design I, Table 3.1)',
    note: 'landing flaps 1.6–2.8',
    bands: [band(1.6, 2.8, 'landing CLmax 1.6-2.8 (Roskam, Airplane Design I, Table 3.1, from memory)')],
  },
  other: null,
};

/** Propeller efficiency in the take-off run. */
export const PROPELLER_TAKEOFF: TypicalRange = {
  low: 0.45,
  high: 0.65,
  text: '0.5-0.6 in the take-off run (common practice)',
  note: 'take-off run 0.5–0.6',
  bands: [band(0.5, 0.6, 'take-off run eta_p 0.5-0.6 (common practice)')],
};

/** Propeller efficiency in cruise and in a sustained turn at cruise-like speed. */
export const PROPELLER_CRUISE: TypicalRange = {
  low: 0.7,
  high: 0.9,
  text: 'about 0.8 in cruise (common practice)',
  note: 'cruise ≈ 0.8',
  bands: [band(0.75, 0.85, 'cruise eta_p about 0.8, taken as 0.75-0.85 (common practice)')],
};

/** Propeller efficiency in climb. */
export const PROPELLER_CLIMB: TypicalRange = {
  low: 0.65,
  high: 0.85,
  text: '0.7-0.8 in climb (common practice)',
  note: 'climb 0.7–0.8',
  bands: [band(0.7, 0.8, 'climb eta_p 0.7-0.8 (common practice)')],
};

export const ROLLING_FRICTION: TypicalRange = {
  low: 0.02,
  high: 0.3,
  text: '0.02-0.05 paved, 0.05-0.1 grass, up to 0.3 soft ground (Brandt et al.; common practice)',
  note: 'paved 0.02–0.05; grass 0.05–0.1; soft ground to 0.3',
  bands: [
    band(0.02, 0.05, 'dry concrete or asphalt 0.02-0.05 (Brandt et al.; common practice)'),
    band(0.05, 0.1, 'short to long or wet grass 0.05-0.1 (Brandt et al.; common practice)'),
    band(0.1, 0.3, 'soft ground up to 0.3 (Brandt et al.; common practice)'),
  ],
};

export const BRAKING_FRICTION: TypicalRange = {
  low: 0.15,
  high: 0.5,
  text: '0.3-0.5 dry, 0.15-0.3 wet (Raymer, Table 17.1)',
  note: 'dry 0.3–0.5; wet 0.15–0.3',
  bands: [band(0.3, 0.5, 'dry runway 0.3-0.5 (Raymer, Table 17.1, from memory)'), band(0.15, 0.3, 'wet runway 0.15-0.3 (Raymer, Table 17.1, from memory)')],
};

export const CL_GROUND_RUN: TypicalRange = {
  low: 0.3,
  high: 0.8,
  text: '0.3-0.8 (common practice)',
  note: '0.3–0.8',
  bands: [band(0.3, 0.8, 'ground-run CL 0.3-0.8 (common practice)')],
};
