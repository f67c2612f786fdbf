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

/** One column as JSON.stringify writes an array of [w, y] pairs at the given indentation. */
function pointsText(ws: Float64Array, column: Float64Array, indent: string): string {
  if (column.length === 0) return '[]';
  const pair = `${indent}  [\n${indent}    `;
  const middle = `,\n${indent}    `;
  const close = `\n${indent}  ]`;
  const parts: string[] = new Array(column.length);
  for (let i = 0; i < column.length; i++) {
    const y = column[i];
    // JSON writes a number as Number.prototype.toString does (ECMA-262, SerializeJSONProperty), null for NaN.
    parts[i] = `${pair}${ws[i]}${middle}${y === y ? y : 'null'}${close}`;
  }
  return `[\n${parts.join(',\n')}\n${indent}]`;
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
  let from = 0;
  for (let j = 0; j < curve; j++) {
    const needle = `"points": ${JSON.stringify(`${MARK}${j}`)}`;
    const at = text.indexOf(needle, from);
    if (at < 0) return JSON.stringify(evaluation, null, 2);
    const lineStart = text.lastIndexOf('\n', at) + 1;
    const indent = text.slice(lineStart, at);
    pieces.push(text.slice(from, at), '"points": ', pointsText(columns.wingLoadingsPa, columns.curves[j], indent));
    from = at + needle.length;
  }
  pieces.push(text.slice(from));
  text = pieces.join('');
  return text;
}
