/**
 * Every requirement kind, in the order the concept file's error messages, the
 * window's list and the rule templates use. Adding a kind: its descriptor
 * file beside this one (named after the kind) and a line in the list below.
 */
// @ts-nocheck

import type { z } from 'zod';
import { approachSpeed } from './approach-speed';
import { balancedFieldLength } from './balanced-field-length';
import { ceiling } from './ceiling';
import { climbGradient } from './climb-gradient';
import { climbRate } from './climb-rate';
import { cruise } from './cruise';
import type { RequirementDescriptor, ResolvedOf } from './descriptor';
import { landingDistance } from './landing-distance';
import { landingGroundRoll } from './landing-ground-roll';
import { maximumSpeed } from './maximum-speed';
import { stall } from './stall';
import { sustainedTurn } from './sustained-turn';
import { takeoffDistance } from './takeoff-distance';
import { takeoffGroundRoll } from './takeoff-ground-roll';

export const REQUIREMENT_DESCRIPTORS = [
  stall,
  landingGroundRoll,
  takeoffGroundRoll,
  cruise,
  climbRate,
  climbGradient,
  ceiling,
  sustainedTurn,
  takeoffDistance,
  balancedFieldLength,
  landingDistance,
  approachSpeed,
  maximumSpeed,
] as const;

type Descriptor = (typeof REQUIREMENT_DESCRIPTORS)[number];

export type RequirementKind = Descriptor['kind'];

/** A resolved requirement of any kind (SI), told apart by `kind`. */
export type Requirement = ResolvedOf<Descriptor>;

export const REQUIREMENT_KINDS: readonly RequirementKind[] = REQUIREMENT_DESCRIPTORS.map((d) => d.kind);

/**
 * A descriptor seen without its own kind's types, for code that handles
 * every kind alike (the resolved requirement it is given is of its kind).
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type KindDescriptor = RequirementDescriptor<RequirementKind, any, z.ZodRawShape>;

const BY_KIND: ReadonlyMap<string, KindDescriptor> = new Map(REQUIREMENT_DESCRIPTORS.map((d) => [d.kind, d as KindDescriptor]));

/** The descriptor of a kind; undefined for a kind this version does not know (a newer file). */
export function findRequirementKind(kind: string): KindDescriptor | undefined {
  return BY_KIND.get(kind);
}

/** The descriptor of a kind (validated already, so a miss is a bug and throws). */
export function requirementKind(kind: RequirementKind): KindDescriptor {
  const found = BY_KIND.get(kind);
  if (!found) throw new Error(`unknown requirement kind "${kind}"`);
  return found;
}

export type { RequirementCommon } from './common';
export type { EditorField, EditorValue, TemplateRow, RequirementDescriptor } from './descriptor';
