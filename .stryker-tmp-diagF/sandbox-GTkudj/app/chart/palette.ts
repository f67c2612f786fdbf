/**
 * Loftpoint's diagram colours: calm, print-friendly inks on white, one per
 * requirement kind, shared by the SVG writer and the designer window so a
 * boundary looks the same wherever it is drawn.
 */
// @ts-nocheck

import type { RequirementKind } from '../../core/model';
import { findRequirementKind, REQUIREMENT_DESCRIPTORS } from '../../core/requirements';

/** One colour per requirement kind, from its descriptor (core/requirements). */
export const KIND_COLOURS: Readonly<Record<RequirementKind, string>> = Object.fromEntries(
  REQUIREMENT_DESCRIPTORS.map((d) => [d.kind, d.colour]),
) as Record<RequirementKind, string>;

/** Dash patterns that tell apart two boundaries of the same kind (first one solid). */
export const KIND_DASHES: readonly string[] = ['', '7 4', '2 3', '10 3 2 3'];

export const CHART_INKS = {
  background: '#ffffff',
  text: '#1f2933',
  mutedText: '#52606d',
  axis: '#3e4c59',
  grid: '#e4e7eb',
  plotFrame: '#9aa5b1',
  feasibleFill: '#d9ebdf',
  feasibleEdge: '#8fbf9f',
  optimum: '#1f2933',
  designPoint: '#b3365b',
  overlay: '#8a94a0',
  caution: '#7b4b00',
} as const;

/** Colour for a requirement kind; an unknown kind (a newer file) draws in the axis ink. */
export function kindColour(kind: string): string {
  return findRequirementKind(kind)?.colour ?? CHART_INKS.axis;
}

/** Dash pattern for the n-th boundary (0-based) of one kind. */
export function kindDash(indexWithinKind: number): string {
  return KIND_DASHES[indexWithinKind % KIND_DASHES.length];
}

/** Requirement kinds as people say them, for legends and reports (from the descriptors). */
export const KIND_TITLES: Readonly<Record<RequirementKind, string>> = Object.fromEntries(
  REQUIREMENT_DESCRIPTORS.map((d) => [d.kind, d.title]),
) as Record<RequirementKind, string>;

/** The kind's title; an unknown kind (a newer file) shows as written. */
export function kindTitle(kind: string): string {
  return findRequirementKind(kind)?.title ?? kind;
}
