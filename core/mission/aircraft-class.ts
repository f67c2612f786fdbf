/**
 * Aircraft classes for the empty-mass regression, in plain trade words, and
 * the class a concept gets when it names none (from its propulsion).
 */
import type { PropulsionKind } from '../aircraft';

export const AIRCRAFT_CLASSES = [
  'sailplane',
  'powered-sailplane',
  'homebuilt',
  'composite-homebuilt',
  'single-engine-general-aviation',
  'twin-engine-general-aviation',
  'agricultural',
  'twin-turboprop',
  'flying-boat',
  'jet-trainer',
  'jet-fighter',
  'military-cargo',
  'jet-transport',
  'uncrewed-tactical',
  'uncrewed-high-altitude',
  'uncrewed-small',
] as const;

export type AircraftClass = (typeof AIRCRAFT_CLASSES)[number];

/** In words, for reports. */
export const AIRCRAFT_CLASS_TITLES: Record<AircraftClass, string> = {
  sailplane: 'sailplane',
  'powered-sailplane': 'powered sailplane',
  homebuilt: 'homebuilt (metal or wood)',
  'composite-homebuilt': 'homebuilt (composite)',
  'single-engine-general-aviation': 'general aviation, single engine',
  'twin-engine-general-aviation': 'general aviation, twin engine',
  agricultural: 'agricultural aircraft',
  'twin-turboprop': 'twin turboprop',
  'flying-boat': 'flying boat',
  'jet-trainer': 'jet trainer',
  'jet-fighter': 'jet fighter',
  'military-cargo': 'military cargo or bomber',
  'jet-transport': 'jet transport',
  'uncrewed-tactical': 'uncrewed, tactical reconnaissance',
  'uncrewed-high-altitude': 'uncrewed, high altitude',
  'uncrewed-small': 'uncrewed, small',
};

/** The class used when a mission names none: by propulsion kind and engine count. */
export function defaultAircraftClass(kind: PropulsionKind, engines: number): AircraftClass {
  if (kind === 'turbofan') return 'jet-transport';
  if (kind === 'turboprop') return 'twin-turboprop';
  return engines > 1 ? 'twin-engine-general-aviation' : 'single-engine-general-aviation';
}
