/**
 * The tornado chart as a standalone SVG document: for each ranged
 * assumption (largest swing first) how far the optimum's wing loading and
 * its power- or thrust-to-weight move when the assumption sits at the low
 * and at the high end of its range, the others nominal, with the numbers at
 * the bar ends. Two panels share the rows; display units throughout.
 */
// @ts-nocheck

import { scaleLinear } from 'd3';
import type { Tornado } from '../../core/studies/tornado';
import { displayUnit, type DisplayQuantity, type UnitSystem } from '../../core/units/display';
import { SIZING_CAUTION } from './caution';
import { signedChange } from './change-text';
import { CHART_INKS } from './palette';
import { n } from './svg-number';
import { escapeXml, formatDisplayed, shorten, wrapText } from './text';
import { plainNumber, tornadoData, type TornadoRow, type TornadoSide } from './tornado-data';

export interface TornadoSvgOptions {
  system?: UnitSystem;
  title?: string;
  width?: number;
  /** Leave out the rows of assumptions that do not move the optimum at all, and name them in a line below. */
  hideNoEffect?: boolean;
}

export const TORNADO_INKS = { low: '#9db4cc', high: '#2f5573', infeasible: '#b3365b' } as const;

const FONT = "'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif";
const ROW = 30;
const LABELS = 250;
const GAP = 28;
const NUMBER_ROOM = 58;

interface Panel {
  key: 'wingLoading' | 'loading';
  quantity: DisplayQuantity;
  title: string;
  left: number;
  width: number;
}

type Scale = (value: number) => number;

function panelDomain(rows: readonly TornadoRow[], key: Panel['key']): number {
  const sizes = rows.flatMap((row) => [row.low, row.high]).filter((s) => s.feasible).map((s) => Math.abs(s[key])).filter(Number.isFinite);
  const largest = Math.max(0, ...sizes);
  return largest > 0 ? largest : 1;
}

export function tornadoSvg(tornado: Tornado, options: TornadoSvgOptions = {}): string {
  const system = options.system ?? 'si';
  const width = options.width ?? 1000;
  const all = tornadoData(tornado, system);
  const quiet = options.hideNoEffect ? all.rows.filter((row) => hasNoEffect(row, all.axis, system)) : [];
  const data = { ...all, rows: all.rows.filter((row) => !quiet.includes(row)) };
  const thrust = data.axis === 'thrustToWeight';
  const loadingUnit = displayUnit(data.axis, system).unit;
  const top = 118;
  const quietLines = quiet.length > 0 ? wrapText(`No effect on the optimum across their ranges: ${quiet.map((row) => row.label).join(', ')}.`, Math.floor((width - 32) / 6.8)) : [];
  // The caution wraps rather than run past a narrow chart's edges.
  const cautionLines = wrapText(SIZING_CAUTION, Math.floor((width - 32) / 7));
  const height = top + Math.max(1, data.rows.length) * ROW + 50 + quietLines.length * 15 + cautionLines.length * 15;
  const panelWidth = (width - LABELS - 24 - GAP) / 2;
  const panels: Panel[] = [
    { key: 'wingLoading', quantity: 'wingLoading', title: `Optimum wing loading: change [${displayUnit('wingLoading', system).unit}]`, left: LABELS + 12, width: panelWidth },
    {
      key: 'loading',
      quantity: data.axis,
      title: thrust ? 'Optimum thrust-to-weight: change [–]' : `Optimum power-to-weight: change [${loadingUnit}]`,
      left: LABELS + 12 + panelWidth + GAP,
      width: panelWidth,
    },
  ];
  const scales = panels.map((panel) => scaleOf(panel, data.rows));
  const nominal = data.nominal
    ? `Nominal optimum ${formatDisplayed(data.nominal.wingLoading, 'wingLoading', system)} · ${thrust ? 'T/W ' : ''}${formatDisplayed(data.nominal.loading, data.axis, system)}`
    : 'No nominal optimum: nothing on the diagram meets every requirement';
  const title = options.title?.trim() || 'Untitled concept';
  const parts = [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="${escapeXml(FONT)}" font-size="12">`,
    `<title>${escapeXml(`${title} — what moves the optimum`)}</title>`,
    `<desc>${escapeXml(SIZING_CAUTION)}</desc>`,
    `<rect width="${width}" height="${height}" fill="${CHART_INKS.background}"/>`,
    `<text x="16" y="28" font-size="17" font-weight="700" fill="${CHART_INKS.text}">${escapeXml(shorten(`${title}: what moves the optimum`, 90))}</text>`,
    `<text x="16" y="48" fill="${CHART_INKS.mutedText}">${escapeXml(`Each assumption at the low and the high end of its range, the others nominal; largest swing first. ${nominal}.`)}</text>`,
    key(16, 72),
    ...data.rows.map((row, i) => rowMarkup(row, i, top, panels, scales, system)),
    ...panels.map((panel) => panelFrame(panel, data.rows.length, top)),
    data.rows.length === 0
      ? `<text x="${LABELS + 12}" y="${top + 20}" fill="${CHART_INKS.mutedText}">${quiet.length > 0 ? 'No ranged assumption moves the optimum.' : 'No assumption carries a range.'}</text>`
      : '',
    ...quietLines.map(
      (line, i) => `<text class="no-effect-list" x="16" y="${top + Math.max(1, data.rows.length) * ROW + 22 + i * 15}" fill="${CHART_INKS.mutedText}">${escapeXml(line)}</text>`,
    ),
    ...cautionLines.map(
      (line, i) =>
        `<text class="caution" x="${width / 2}" y="${height - 14 - (cautionLines.length - 1 - i) * 15}" text-anchor="middle" font-weight="600" fill="${CHART_INKS.caution}">${escapeXml(line)}</text>`,
    ),
    `</svg>`,
  ];
  return `${parts.filter((part) => part !== '').join('\n')}\n`;
}

function key(x: number, y: number): string {
  const swatch = (at: number, colour: string, text: string) =>
    `<rect x="${at}" y="${y - 9}" width="18" height="10" fill="${colour}"/><text x="${at + 24}" y="${y}" fill="${CHART_INKS.text}">${escapeXml(text)}</text>`;
  return [
    swatch(x, TORNADO_INKS.low, 'assumption at the low end of its range'),
    swatch(x + 270, TORNADO_INKS.high, 'at the high end'),
    `<text x="${x + 400}" y="${y}" fill="${CHART_INKS.mutedText}">Numbers at the bar ends: change of the optimum, display units.</text>`,
  ].join('\n');
}

/** One scale per panel, shared by every row, symmetric about no change. */
function scaleOf(panel: Panel, rows: readonly TornadoRow[]): Scale {
  const extent = panelDomain(rows, panel.key);
  return scaleLinear()
    .domain([-extent, extent])
    .range([panel.left + NUMBER_ROOM, panel.left + panel.width - NUMBER_ROOM]);
}

function panelFrame(panel: Panel, count: number, top: number): string {
  const bottom = top + Math.max(1, count) * ROW;
  const mid = panel.left + panel.width / 2;
  return [
    `<text x="${n(mid)}" y="${top - 14}" text-anchor="middle" font-weight="600" fill="${CHART_INKS.text}">${escapeXml(panel.title)}</text>`,
    `<rect x="${n(panel.left)}" y="${top}" width="${n(panel.width)}" height="${bottom - top}" fill="none" stroke="${CHART_INKS.grid}"/>`,
    `<line x1="${n(mid)}" y1="${top}" x2="${n(mid)}" y2="${bottom}" stroke="${CHART_INKS.axis}" stroke-width="1"/>`,
  ].join('\n');
}

function rowMarkup(row: TornadoRow, index: number, top: number, panels: Panel[], scales: Scale[], system: UnitSystem): string {
  const y = top + index * ROW;
  const range = `${plainNumber(row.low.value)} to ${plainNumber(row.high.value)}, nominal ${plainNumber(row.nominal)}`;
  const parts = [
    `<g class="tornado-row" data-field="${escapeXml(row.field)}" data-swing="${Number.isFinite(row.swing) ? row.swing : 'Infinity'}">`,
    index % 2 === 1 ? `<rect x="8" y="${y}" width="${n(panels[1].left + panels[1].width - 8)}" height="${ROW}" fill="#f5f7f9"/>` : '',
    `<text x="16" y="${y + 13}" fill="${CHART_INKS.text}">${escapeXml(shorten(row.label, 38))}</text>`,
    `<text x="16" y="${y + 25}" font-size="10.5" fill="${CHART_INKS.mutedText}">${escapeXml(shorten(range, 44))}</text>`,
  ];
  panels.forEach((panel, i) => parts.push(...bars(row, panel, y, system, scales[i])));
  parts.push('</g>');
  return parts.filter((part) => part !== '').join('');
}

function bars(row: TornadoRow, panel: Panel, y: number, system: UnitSystem, x: Scale): string[] {
  const zero = x(0);
  const ends: Array<{ side: TornadoSide; colour: string; y0: number }> = [
    { side: row.low, colour: TORNADO_INKS.low, y0: y + 5 },
    { side: row.high, colour: TORNADO_INKS.high, y0: y + 15 },
  ];
  if (panelShowsNoEffect(row, panel.key, panel.quantity, system)) {
    return [`<text class="no-effect" x="${n(zero + 6)}" y="${y + 19}" font-size="10.5" fill="${CHART_INKS.mutedText}">no effect</text>`];
  }
  return ends.map(({ side, colour, y0 }) => {
    if (!side.feasible) {
      const edge = panel.left + panel.width - 4;
      return `<rect class="bar infeasible" x="${n(zero)}" y="${y0}" width="${n(edge - zero)}" height="9" fill="none" stroke="${TORNADO_INKS.infeasible}" stroke-dasharray="3 2"/><text x="${n(zero + 6)}" y="${y0 + 8}" font-size="10" fill="${TORNADO_INKS.infeasible}">nothing feasible at this end</text>`;
    }
    const value = side[panel.key];
    const end = x(value);
    const [left, right] = end >= zero ? [zero, end] : [end, zero];
    const text = signedChange(value, panel.quantity, system);
    const anchor = end >= zero ? 'start' : 'end';
    const tx = end >= zero ? end + 4 : end - 4;
    return `<rect class="bar" x="${n(left)}" y="${y0}" width="${n(Math.max(right - left, 0.5))}" height="9" fill="${colour}"/><text class="bar-value" x="${n(tx)}" y="${y0 + 8}" font-size="10.5" text-anchor="${anchor}" fill="${CHART_INKS.text}">${escapeXml(text)}</text>`;
  });
}


function panelShowsNoEffect(row: TornadoRow, key: Panel['key'], quantity: DisplayQuantity, system: UnitSystem): boolean {
  return [row.low, row.high].every((side) => side.feasible && signedChange(side[key], quantity, system) === '0');
}

/** Neither the wing loading nor the loading of the optimum moves, at either end, to the digits shown. */
function hasNoEffect(row: TornadoRow, axis: DisplayQuantity, system: UnitSystem): boolean {
  return panelShowsNoEffect(row, 'wingLoading', 'wingLoading', system) && panelShowsNoEffect(row, 'loading', axis, system);
}
