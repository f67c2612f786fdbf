/**
 * Every propulsion kind, in the order the concept file's error messages and
 * the window list them. Adding a kind: its file beside this one and a line here.
 */
// @ts-nocheck

import type { PropulsionDescriptor } from './descriptor';
import { electric } from './electric';
import { piston } from './piston';
import { turbochargedPiston } from './turbocharged-piston';
import { turbofan } from './turbofan';
import { turboprop } from './turboprop';

export const PROPULSION_DESCRIPTORS = [piston, turbochargedPiston, turboprop, turbofan, electric] as const;

export type PropulsionKind = (typeof PROPULSION_DESCRIPTORS)[number]['kind'];

export const PROPULSION_KINDS: readonly PropulsionKind[] = PROPULSION_DESCRIPTORS.map((d) => d.kind);

const BY_KIND: ReadonlyMap<string, PropulsionDescriptor<PropulsionKind>> = new Map(PROPULSION_DESCRIPTORS.map((d) => [d.kind, d]));

/** The descriptor of a propulsion kind (validated already, so a miss is a bug and throws). */
export function propulsionKind(kind: PropulsionKind): PropulsionDescriptor<PropulsionKind> {
  const found = BY_KIND.get(kind);
  if (!found) throw new Error(`unknown propulsion kind "${kind}"`);
  return found;
}

export type { PropulsionDescriptor, LapseInputs } from './descriptor';
