/**
 * The words on the SVG diagram as markup: boundary labels and point notes
 * with a white halo, and a leader line when a note had to move away from
 * its point.
 */
import type { LabelPlacement, PointNote } from './labels';
import type { ChartScales } from './scales';
import { n } from './svg-number';
import { escapeXml } from './text';

/** A thin line from a marked point to its note when the note had to move away from it. */
export function leader(label: LabelPlacement, notes: PointNote[], scales: ChartScales): string {
  const note = notes.find((candidate) => candidate.id === label.id);
  if (!note) return '';
  const px = scales.x(note.at.wingLoading);
  const py = scales.y(note.at.loading);
  const cx = Math.min(Math.max(px, label.box.x0), label.box.x1);
  const cy = Math.min(Math.max(py, label.box.y0), label.box.y1);
  if (Math.hypot(cx - px, cy - py) < 22) return '';
  const length = Math.hypot(cx - px, cy - py);
  const sx = px + ((cx - px) / length) * 8;
  const sy = py + ((cy - py) / length) * 8;
  return `<line x1="${n(sx)}" y1="${n(sy)}" x2="${n(cx)}" y2="${n(cy)}" stroke="${label.colour}" stroke-width="0.9" stroke-opacity="0.8"/>`;
}

export function labelText(label: LabelPlacement, role: 'note' | 'boundary'): string {
  const transform = label.rotate !== 0 ? ` transform="rotate(${label.rotate} ${n(label.x)} ${n(label.y)})"` : '';
  const weight = role === 'note' ? ' font-weight="600"' : '';
  const tspans = label.lines
    .map((text, i) =>
      i === 0
        ? `<tspan x="${n(label.x)}" y="${n(label.y)}">${escapeXml(text)}</tspan>`
        : `<tspan x="${n(label.x)}" dy="1.25em" font-weight="400">${escapeXml(text)}</tspan>`,
    )
    .join('');
  return `<text class="label ${role}" data-id="${escapeXml(label.id)}" text-anchor="${label.anchor}" fill="${label.colour}"${weight} stroke="#ffffff" stroke-width="3.5" stroke-linejoin="round" paint-order="stroke"${transform}>${tspans}</text>`;
}
