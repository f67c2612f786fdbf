/**
 * Where the window was: its size, position and whether it was maximised,
 * kept in a small JSON file in the user's data folder and given back on the
 * next start. A file that cannot be read, or a place no longer on any screen,
 * gives the default size centred by the system.
 */
// @ts-nocheck

import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';

export interface Bounds {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface WindowPlacement {
  bounds: Bounds;
  maximized: boolean;
}

export const DEFAULT_SIZE = { width: 1440, height: 900 } as const;
export const MIN_SIZE = { width: 1000, height: 620 } as const;

const isBounds = (value: unknown): value is Bounds =>
  typeof value === 'object' &&
  value !== null &&
  ['x', 'y', 'width', 'height'].every((key) => Number.isFinite((value as Record<string, unknown>)[key]));

/** True when at least a 100 px square of the window's top part lies on one of the screens. */
function onScreen(bounds: Bounds, screens: readonly Bounds[]): boolean {
  return screens.some((area) => {
    const left = Math.max(bounds.x, area.x);
    const right = Math.min(bounds.x + bounds.width, area.x + area.width);
    const top = Math.max(bounds.y, area.y);
    const bottom = Math.min(bounds.y + 100, area.y + area.height);
    return right - left >= 100 && bottom - top >= 50;
  });
}

/** The saved placement, or null for the default. `screens` are the work areas of the displays now attached. */
export function readPlacement(file: string, screens: readonly Bounds[]): WindowPlacement | null {
  try {
    const parsed = JSON.parse(readFileSync(file, 'utf8')) as { bounds?: unknown; maximized?: unknown };
    if (!isBounds(parsed.bounds)) return null;
    const bounds = {
      x: Math.round(parsed.bounds.x),
      y: Math.round(parsed.bounds.y),
      width: Math.max(MIN_SIZE.width, Math.round(parsed.bounds.width)),
      height: Math.max(MIN_SIZE.height, Math.round(parsed.bounds.height)),
    };
    if (!onScreen(bounds, screens)) return null;
    return { bounds, maximized: parsed.maximized === true };
  } catch {
    return null;
  }
}

export function writePlacement(file: string, placement: WindowPlacement): void {
  try {
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, `${JSON.stringify(placement, null, 2)}\n`, 'utf8');
  } catch {
    // Not kept: the next start uses the default size.
  }
}
