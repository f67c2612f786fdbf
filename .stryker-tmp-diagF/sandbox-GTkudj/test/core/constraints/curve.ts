/**
 * Narrowing helpers for boundary tests.
 */
// @ts-nocheck

import type { Boundary } from '../../../core/model';

export function curveOf(boundary: Boundary): Extract<Boundary, { type: 'curve' }> {
  if (boundary.type !== 'curve') throw new Error(`expected a curve for ${boundary.id}, got a limit`);
  return boundary;
}

export function limitOf(boundary: Boundary): number {
  if (boundary.type !== 'limit') throw new Error(`expected a limit for ${boundary.id}, got a curve`);
  return boundary.wingLoadingMaxPa;
}
