/**
 * Engine-out scaling of installed power or thrust.
 */
// @ts-nocheck


/** f_N = N/(N - k) with k engines inoperative (core/methods.md section 6); NaN when no engine is left. */
export function engineOutFactor(engines: number, enginesInoperative: number): number {
  if (!(enginesInoperative >= 0) || !(enginesInoperative < engines)) return NaN;
  return engines / (engines - enginesInoperative);
}
