/** The chance study's numbers as the window writes them; never "NaN" (a dash instead). */
// @ts-nocheck

import { formatQuantity, type DisplayQuantity, type Spread, type UnitSystem } from '../../../../core';

/** 0.8734 -> "87.3 %"; a dash when not a number. */
export function percentText(fraction: number | null | undefined, digits = 1): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return '—';
  return `${(fraction * 100).toFixed(digits)} %`;
}

/** "512 N/m² to 588 N/m²" from the 5th and 95th percentiles; a dash when there are none. */
export function spreadText(spread: Spread, quantity: DisplayQuantity, system: UnitSystem): string {
  if (!Number.isFinite(spread.p5) || !Number.isFinite(spread.p95)) return '—';
  return `${formatQuantity(spread.p5, quantity, system)} to ${formatQuantity(spread.p95, quantity, system)}`;
}
