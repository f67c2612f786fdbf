/** A placed label and a note to place beside a marked point: what the label placement returns and takes. */
// @ts-nocheck

import type { Box } from './boxes';
import type { MarkedPoint } from './series-types';

export interface LabelPlacement {
  id: string;
  /** One or more lines of text, drawn top to bottom. */
  lines: string[];
  colour: string;
  /** Anchor of the first line's baseline, px. */
  x: number;
  y: number;
  anchor: 'start' | 'middle' | 'end';
  /** 0, or -90 for a label that reads upwards along a wing-loading limit. */
  rotate: 0 | -90;
  /** The space the text takes, px, for hit tests and collision checks. */
  box: Box;
  /** False when the boundary has no visible part on the plot; the legend still names it. */
  onPlot: boolean;
}

export interface PointNote {
  id: string;
  lines: string[];
  colour: string;
  at: MarkedPoint;
}
