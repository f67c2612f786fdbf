/** Changes written for people: a sign that is a true minus, the display unit's digits, "0" when it rounds away. */
import { displayUnit, fixedDecimals, type DisplayQuantity, type UnitSystem } from '../../core/units/display';

/** "+45", "−0.52", "0" for a change already in display units; "—" when not finite. */
export function signedChange(value: number, quantity: DisplayQuantity, system: UnitSystem): string {
  if (!Number.isFinite(value)) return '—';
  const { digits } = displayUnit(quantity, system);
  const size = fixedDecimals(Math.abs(value), digits);
  if (Number(size.replace(/,/g, '')) === 0) return '0';
  return `${value > 0 ? '+' : '−'}${size}`;
}
