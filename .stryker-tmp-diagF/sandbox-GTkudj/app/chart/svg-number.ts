/** Numbers in SVG markup: pixel values with at most two decimals. */
// @ts-nocheck

export function n(value: number): string {
  // Never Infinity or NaN in the markup: a coordinate that is not finite is a fault, refused here.
  if (!Number.isFinite(value)) throw new RangeError(`the diagram has a coordinate that is not a finite number (${value}); no SVG was written`);
  return String(Math.round(value * 100) / 100);
}
