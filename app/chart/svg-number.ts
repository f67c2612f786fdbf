/** Numbers in SVG markup: pixel values with at most two decimals. */
export function n(value: number): string {
  return String(Math.round(value * 100) / 100);
}
