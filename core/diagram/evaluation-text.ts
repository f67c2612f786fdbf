/**
 * The evaluation as JSON text (format `loftpoint-evaluation/1`, indented by
 * two spaces), with the curves' points written straight from the engine's
 * columns: the same text as JSON.stringify(evaluation, null, 2) without a
 * [w, y] pair per sample.
 */
import type { Evaluation } from '../evaluation';
import { columnsOf } from './curve-columns';

/** Stands in for a curve's points while the rest is stringified; never in the output. */
const MARK = '\u0001loftpoint-columns:';

/**
 * Each number of a column as JSON writes it (null for NaN), converted by the
 * JSON serializer itself in one call, which is faster than one String() per
 * number. The columns are never empty (at least two samples).
 */
function numberTexts(column: Float64Array): string[] {
  return JSON.stringify(Array.from(column)).slice(1, -1).split(',');
}

/** One column (never empty) as JSON.stringify writes an array of [w, y] pairs at the given indentation. */
function pointsText(wsTexts: readonly string[], column: Float64Array, indent: string): string {
  const ys = numberTexts(column);
  const open = `${indent}  [\n${indent}    `;
  const middle = `,\n${indent}    `;
  const close = `\n${indent}  ]`;
  const parts: string[] = new Array(ys.length);
  for (let i = 0; i < ys.length; i++) parts[i] = wsTexts[i] + middle + ys[i];
  return `[\n${open}${parts.join(`${close},\n${open}`)}${close}\n${indent}]`;
}

/** JSON.stringify(evaluation, null, 2), written from the columns when this process made the evaluation. */
export function evaluationJsonText(evaluation: Evaluation): string {
  const columns = columnsOf(evaluation);
  if (!columns) return JSON.stringify(evaluation, null, 2);
  let curve = 0;
  const boundaries = evaluation.boundaries.map((boundary) => {
    if (!('points' in boundary)) return boundary;
    // Copied key by key so the points are not read (and so not built) here.
    const copy: Record<string, unknown> = {};
    for (const key of Object.keys(boundary)) copy[key] = key === 'points' ? `${MARK}${curve}` : boundary[key as keyof typeof boundary];
    curve++;
    return copy;
  });
  if (curve !== columns.curves.length) return JSON.stringify(evaluation, null, 2);
  let text = JSON.stringify({ ...evaluation, boundaries }, null, 2);
  const pieces: string[] = [];
  const wsTexts = numberTexts(columns.wingLoadingsPa);
  let from = 0;
  for (let j = 0; j < curve; j++) {
    const needle = `"points": ${JSON.stringify(`${MARK}${j}`)}`;
    const at = text.indexOf(needle, from);
    if (at < 0) return JSON.stringify(evaluation, null, 2);
    const lineStart = text.lastIndexOf('\n', at) + 1;
    const indent = text.slice(lineStart, at);
    pieces.push(text.slice(from, at), '"points": ', pointsText(wsTexts, columns.curves[j], indent));
    from = at + needle.length;
  }
  pieces.push(text.slice(from));
  text = pieces.join('');
  return text;
}
