/**
 * The constraint diagram of a trade study as a standalone SVG document: the
 * plain diagram with each requirement's band behind its nominal line and the
 * 50, 90 and 95 % contours of the chance of meeting every requirement.
 */
// @ts-nocheck

import type { Evaluation } from '../../core/evaluation';
import type { BoundaryBand } from '../../core/studies/bands';
import { PROBABILITY_LEVELS } from '../../core/studies/probability-grid';
import { bandHasWidth, bandSeries } from './bands';
import { probabilityContours, type ProbabilityGridValues } from './contours';
import { marksSvg } from './markup';
import { bandMarks, contourMarks, type ContourMarks } from './study-marks';
import { studyLegendRows } from './study-style';
import { constraintDiagramSvg, type SvgOptions } from './svg';
import type { Geometry } from './geometry';

export interface StudySvgOptions extends Omit<SvgOptions, 'layers'> {
  bands?: readonly BoundaryBand[];
  /** The Monte Carlo map, on a grid covering the diagram's domains (see diagramGrid). */
  map?: ProbabilityGridValues;
  levels?: readonly number[];
  /** One line under the contour legend, e.g. "Monte Carlo: 10,000 samples, seed 1". */
  runNote?: string;
  /** The contours' ink, e.g. grey for a study older than the concept (as the window shows it). */
  contourInk?: string;
}

export function studyDiagramSvg(evaluation: Evaluation, options: StudySvgOptions = {}): string {
  const system = options.system ?? 'si';
  const bands = bandSeries(options.bands ?? [], evaluation.axis, system).filter(bandHasWidth);
  const contours = options.map ? probabilityContours(options.map, evaluation.axis, system, options.levels ?? PROBABILITY_LEVELS) : [];
  const what = evaluation.axis === 'thrustToWeight' ? 'thrust-to-weight' : options.powerLoading ? 'power loading W/P' : 'power-to-weight';
  const units = system === 'us' ? 'US customary units' : system === 'kt-ft' ? 'knots and feet, SI for mass, area, force and power' : 'SI units';
  const shows = [bands.length > 0 ? 'boundary bands' : '', contours.length > 0 ? 'probability contours' : ''].filter(Boolean).join(' and ');
  const { bands: _bands, map, levels: _levels, runNote, contourInk, ...plain } = options;
  let drawn: { geometry: Geometry; marks: ContourMarks } | null = null;
  const contoursOf = (geometry: Geometry): ContourMarks => {
    if (!map) return { lines: [], labels: [] };
    if (drawn?.geometry !== geometry) drawn = { geometry, marks: contourMarks(map, contours, geometry, { clipId: 'map-area', ...(contourInk ? { ink: contourInk } : {}) }) };
    return drawn.marks;
  };
  return constraintDiagramSvg(evaluation, {
    ...plain,
    layers: {
      // Without study layers, the plain diagram's own subtitle.
      ...(shows ? { subtitle: `Constraint diagram with ${shows}: ${what} against wing loading · ${units}` } : {}),
      behind: (geometry) => marksSvg(bandMarks(bands, geometry)),
      above: (geometry) => marksSvg(contoursOf(geometry).lines),
      top: (geometry) => marksSvg(contoursOf(geometry).labels),
      legend: () => studyLegendRows({ bands: bands.length > 0, contours, ...(runNote ? { runNote } : {}) }),
    },
  });
}
