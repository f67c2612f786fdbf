/** A number as error and warning lines write it: four significant figures, no trailing zeros (0.04, 1.96, 2313). */
export function messageNumber(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(4))) : String(x);
}
