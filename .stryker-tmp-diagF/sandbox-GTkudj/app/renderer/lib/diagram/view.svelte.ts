/**
 * What part of the diagram is shown: null for the automatic view, or the
 * wing-loading and loading ranges after a zoom or pan (display units of the
 * plotted quantity). Switching units or the loading axis returns to the
 * automatic view, since the old ranges would mean something else.
 */
// @ts-nocheck

import type { Domains } from './geometry';

/** Smallest part of the automatic range a zoom may show, so the axes keep readable ticks. */
const MIN_FRACTION = 0.02;

export class DiagramView {
  #domains = $state.raw<Domains | null>(null);

  get current(): Domains | null {
    return this.#domains;
  }

  get zoomed(): boolean {
    return this.#domains !== null;
  }

  reset(): void {
    this.#domains = null;
  }

  /** Zooms by `factor` (< 1 zooms in) about a point given in data units. */
  zoom(from: Domains, factor: number, about: { x: number; y: number }, limits: Domains): void {
    const scale = (range: [number, number], centre: number, full: [number, number]): [number, number] => {
      const minSpan = (full[1] - full[0]) * MIN_FRACTION;
      const span = Math.max((range[1] - range[0]) * factor, minSpan);
      const t = range[1] === range[0] ? 0.5 : (centre - range[0]) / (range[1] - range[0]);
      return [centre - t * span, centre + (1 - t) * span];
    };
    this.#domains = { x: scale(from.x, about.x, limits.x), y: scale(from.y, about.y, limits.y) };
  }

  /** Moves the view by a distance in data units. */
  pan(from: Domains, dx: number, dy: number): void {
    this.#domains = { x: [from.x[0] + dx, from.x[1] + dx], y: [from.y[0] + dy, from.y[1] + dy] };
  }
}
