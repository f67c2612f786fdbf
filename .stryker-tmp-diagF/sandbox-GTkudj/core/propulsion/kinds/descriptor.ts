/**
 * What a propulsion kind is, in one object: its lapse of rated power or
 * thrust with altitude, whether it drives a propeller, its names and typical
 * ranges, and its section of the methods reference.
 * core/propulsion/kinds/index.ts lists every kind.
 */
// @ts-nocheck

import type { TypicalRange } from '../../assumptions/typical-range';
import type { LapseModel } from '../turbine-lapse';

/** The propulsion inputs a lapse model may read (SI). */
export interface LapseInputs {
  /** m in sigma^m, where the kind uses one. */
  lapseExponent: number;
  /** Pressure altitude up to which rated power is held [m], where the kind uses one. */
  criticalAltitudeM?: number;
}

export interface PropulsionDescriptor<Kind extends string = string> {
  kind: Kind;
  /** As the window's list shows it: "Turbocharged piston". */
  title: string;
  /** True: the diagram is shaft power per weight and propeller efficiency applies; false: thrust per weight. */
  propeller: boolean;
  /** Fraction of rated sea-level power or thrust at density ratio sigma (ISA offset included), before throttle. */
  lapse(sigma: number, inputs: LapseInputs): number;
  /** The lapse exponent's default and typical range; null: the kind uses no exponent. */
  lapseExponent: { default: number; typical: TypicalRange } | null;
  /**
   * The lapse models the propulsion block may name (`lapseModel`); the first is the
   * default when the file names neither a model nor a lapse exponent (a file
   * that gives an exponent keeps the density model).
   */
  lapseModels: readonly LapseModel[];
  /** True: the concept must give aircraft.propulsion.criticalAltitude. */
  needsCriticalAltitude: boolean;
  /** Which clean CD0 class of the typical-range table the studies try first (index into its bands). */
  cd0Band: number;
  /** Its row of the methods reference (core/methods.md, section 5), Markdown. */
  methods: string;
}

export function definePropulsion<Kind extends string>(descriptor: PropulsionDescriptor<Kind>): PropulsionDescriptor<Kind> {
  return descriptor;
}
