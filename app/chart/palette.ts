/**
 * Loftpoint's diagram colours: calm, print-friendly inks on white, one per
 * requirement kind, shared by the SVG writer and the designer window so a
 * boundary looks the same wherever it is drawn.
 */
import type { RequirementKind } from '../../core/model';
import { findRequirementKind, REQUIREMENT_DESCRIPTORS } from '../../core/requirements';

/** One colour per requirement kind, from its descriptor (core/requirements). */
export const KIND_COLOURS: Readonly<Record<RequirementKind, string>> = Object.fromEntries(
  REQUIREMENT_DESCRIPTORS.map((d) => [d.kind, d.colour]),
) as Record<RequirementKind, string>;

/**
 * Shades of a kind's colour for its second, third... boundary: darker, then
 * lighter, then darker still (mixed with black or white), so two boundaries of
 * one kind differ in colour as well as dash.
 */
export const KIND_SHADES: readonly number[] = [0, -0.38, 0.4, -0.6];

/** The kind's colour for its n-th boundary (0-based): the colour itself, then its shades. */
export function kindShade(colour: string, indexWithinKind: number): string {
  const amount = KIND_SHADES[indexWithinKind % KIND_SHADES.length];
  const match = /^#([0-9a-f]{6})$/i.exec(colour);
  if (amount === 0 || !match) return colour;
  const towards = amount < 0 ? 0 : 255;
  const t = Math.abs(amount);
  const channels = [0, 2, 4].map((i) => parseInt(match[1].slice(i, i + 2), 16)).map((c) => Math.round(c + (towards - c) * t));
  return `#${channels.map((c) => c.toString(16).padStart(2, '0')).join('')}`;
}

/** Each boundary's colour by id: its kind's colour, or a shade of it for the second, third... of that kind, in the order given. */
export function boundaryColours(boundaries: ReadonlyArray<{ id: string; kind: string }>): Map<string, string> {
  const seen = new Map<string, number>();
  const colours = new Map<string, string>();
  for (const { id, kind } of boundaries) {
    const nth = seen.get(kind) ?? 0;
    seen.set(kind, nth + 1);
    colours.set(id, kindShade(kindColour(kind), nth));
  }
  return colours;
}

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

/**
 * Inks of design alternatives drawn over the diagram, in the order they are
 * switched on: darker than the boundary inks' mid-tones and far from the
 * region's green, so an outline reads as another concept, not a boundary.
 */
export const ALTERNATIVE_INKS: readonly string[] = ['#6b3fa0', '#0f6f8f', '#b0480f', '#8a1f5a', '#3f6a12', '#5a4632'];

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
