/**
 * The constraint diagram of a trade study as a standalone SVG document: the
 * plain diagram with each requirement's band behind its nominal line and the
 * 50, 90 and 95 % contours of the chance of meeting every requirement.
 */
import type { Evaluation } from '../../core/evaluation';
import type { BoundaryBand } from '../../core/studies/bands';
import { PROBABILITY_LEVELS } from '../../core/studies/probability-grid';
import { bandHasWidth, bandSeries } from './bands';
import { probabilityContours, type ProbabilityGridValues } from './contours';
import { bandLayer, contourLabels, contourLayer, studyLegendRows } from './svg-study';
import { constraintDiagramSvg, type SvgOptions } from './svg';

export interface StudySvgOptions extends Omit<SvgOptions, 'layers'> {
  bands?: readonly BoundaryBand[];
  /** The Monte Carlo map, on a grid covering the diagram's domains (see diagramGrid). */
  map?: ProbabilityGridValues;
  levels?: readonly number[];
  /** One line under the contour legend, e.g. "Monte Carlo: 10,000 samples, seed 1". */
  runNote?: string;
}

export function studyDiagramSvg(evaluation: Evaluation, options: StudySvgOptions = {}): string {
  const system = options.system ?? 'si';
  const bands = bandSeries(options.bands ?? [], evaluation.axis, system).filter(bandHasWidth);
  const contours = options.map ? probabilityContours(options.map, evaluation.axis, system, options.levels ?? PROBABILITY_LEVELS) : [];
  const what = evaluation.axis === 'thrustToWeight' ? 'thrust-to-weight' : 'power-to-weight';
  const units = system === 'us' ? 'US customary units' : 'SI units';
  const shows = [bands.length > 0 ? 'boundary bands' : '', contours.length > 0 ? 'probability contours' : ''].filter(Boolean).join(' and ');
  const { bands: _bands, map: _map, levels: _levels, runNote, ...plain } = options;
  return constraintDiagramSvg(evaluation, {
    ...plain,
    layers: {
      subtitle: `Constraint diagram with ${shows || 'no study layers'}: ${what} against wing loading · ${units}`,
      behind: (_data, scales) => bandLayer(bands, scales),
      above: (_data, scales) => contourLayer(contours, scales),
      top: (_data, scales, labels) => contourLabels(contours, scales, labels),
      legend: () => studyLegendRows({ bands: bands.length > 0, contours, ...(runNote ? { runNote } : {}) }),
    },
  });
}
