/**
 * Zod fields for values written with a unit ("45 kt"). The check and its
 * message come from parseQuantity, so the file and the UI say the same thing.
 */
import * as z from 'zod';
import { EXAMPLE, SI_UNIT, parseQuantity, type Dimension, type QuantityOptions } from '../units/quantity';

/** Limits in SI; `above`/`below` exclude the value, `from`/`to` include it. */
interface QuantityBounds {
  above?: number;
  from?: number;
  below?: number;
  to?: number;
}

const shown = (value: number): string => String(Number(value.toPrecision(6)));

function withUnit(value: number, dimension: Dimension): string {
  // Angles read better in degrees than in the radians they are stored in.
  if (dimension === 'angle') return `${shown((value * 180) / Math.PI)} deg`;
  const unit = SI_UNIT[dimension];
  return unit ? `${shown(value)} ${unit}` : shown(value);
}

function got(input: unknown, value: number, dimension: Dimension): string {
  const written = JSON.stringify(input);
  const si = withUnit(value, dimension);
  return typeof input === 'string' && input.trim() !== si ? `${written} = ${si}` : written;
}

/** The message for a bad value, or undefined when the value is fine. */
export function quantityProblem(
  input: unknown,
  dimension: Dimension,
  bounds: QuantityBounds = {},
  options: QuantityOptions = {},
): string | undefined {
  if (input === undefined) return `is required, e.g. "${EXAMPLE[dimension]}"`;
  const parsed = parseQuantity(input, dimension, options);
  // A Mach number's speed depends on the altitude, so only its sign is checked here.
  if (parsed.ok && parsed.mach !== undefined) return undefined;
  if (!parsed.ok) return parsed.message;
  const v = parsed.value;
  const { above, from, below, to } = bounds;
  const limit = (text: string) => `must be ${text} (got ${got(input, v, dimension)})`;
  if (above !== undefined && !(v > above)) return limit(above === 0 ? 'greater than 0' : `greater than ${withUnit(above, dimension)}`);
  if (from !== undefined && !(v >= from)) return limit(from === 0 ? 'at least 0' : `at least ${withUnit(from, dimension)}`);
  if (below !== undefined && !(v < below)) return limit(`less than ${withUnit(below, dimension)}`);
  if (to !== undefined && !(v <= to)) return limit(`at most ${withUnit(to, dimension)}`);
  return undefined;
}

/** A field that must carry a unit of this dimension. */
export function quantityField(dimension: Dimension, bounds?: QuantityBounds, options?: QuantityOptions) {
  return z.custom<string>((input) => quantityProblem(input, dimension, bounds, options) === undefined, {
    error: (issue) => quantityProblem(issue.input, dimension, bounds, options) ?? 'is not valid',
  });
}

/** A dimensionless field that may also be written as "2.4 %". */
export function ratioField(dimension: 'fraction' | 'thrustToWeight', bounds?: QuantityBounds) {
  return z.custom<number | string>((input) => quantityProblem(input, dimension, bounds) === undefined, {
    error: (issue) => quantityProblem(issue.input, dimension, bounds) ?? 'is not valid',
  });
}
