/**
 * Small builders for the report's markup. Every piece of text passes through
 * `text()` (escaped), so user strings never become markup; numbers come in
 * already formatted (core's formatQuantity and formatMargin show "—", never NaN).
 */
// @ts-nocheck

import { escapeXml } from '../chart/text';

/** Text safe inside an HTML element or a quoted attribute. */
export function text(value: string): string {
  return escapeXml(value);
}

export interface Cell {
  /** Markup already built (escaped). */
  html: string;
  className?: string;
}

/** A cell from plain text, escaped. */
export function cell(value: string, className?: string): Cell {
  return { html: text(value), ...(className ? { className } : {}) };
}

/** A cell from markup built with these helpers. */
export function markup(html: string, className?: string): Cell {
  return { html, ...(className ? { className } : {}) };
}

function td(entry: Cell | string, tag: 'td' | 'th'): string {
  const c = typeof entry === 'string' ? cell(entry) : entry;
  return `<${tag}${c.className ? ` class="${text(c.className)}"` : ''}>${c.html}</${tag}>`;
}

/** A table with a header row; `numeric` names the columns to right-align. */
export function table(header: ReadonlyArray<string>, rows: ReadonlyArray<ReadonlyArray<Cell | string>>, options: { className?: string; numeric?: number[]; caption?: string } = {}): string {
  const numeric = new Set(options.numeric ?? []);
  const head = `<thead><tr>${header.map((h, i) => td(cell(h, numeric.has(i) ? 'num' : undefined), 'th')).join('')}</tr></thead>`;
  const body = rows
    .map((row) => `<tr>${row.map((entry, i) => {
      const c = typeof entry === 'string' ? cell(entry) : entry;
      return td(numeric.has(i) ? { ...c, className: [c.className, 'num'].filter(Boolean).join(' ') } : c, 'td');
    }).join('')}</tr>`)
    .join('\n');
  const caption = options.caption ? `<caption>${text(options.caption)}</caption>` : '';
  return `<table${options.className ? ` class="${text(options.className)}"` : ''}>${caption}${head}<tbody>\n${body}\n</tbody></table>`;
}

/** Two columns of name and value, no header. */
export function facts(rows: ReadonlyArray<readonly [string, Cell | string]>, className = 'facts'): string {
  const body = rows.map(([name, value]) => `<tr><th scope="row">${text(name)}</th>${td(value, 'td')}</tr>`).join('\n');
  return `<table class="${text(className)}"><tbody>\n${body}\n</tbody></table>`;
}

export function paragraph(value: string, className?: string): string {
  return `<p${className ? ` class="${text(className)}"` : ''}>${text(value)}</p>`;
}

/** A report section; `newPage` starts it on a new printed page, `keep` keeps it on one page when it fits. */
export function section(id: string, title: string, body: string, options: { newPage?: boolean; keep?: boolean } = {}): string {
  const classes = ['report-section', options.newPage ? 'new-page' : '', options.keep ? 'keep' : ''].filter(Boolean).join(' ');
  return `<section id="${text(id)}" class="${classes}">\n<h2>${text(title)}</h2>\n${body}\n</section>`;
}

/**
 * A standalone SVG document made fit to sit inside the page: the XML
 * declaration dropped and its ids (and the references to them) prefixed, so
 * two diagrams in one page never share a clip path.
 */
export function inlineSvg(svg: string, prefix: string, label: string): string {
  const body = svg
    .replace(/^<\?xml[^>]*\?>\s*/, '')
    .replace(/\sid="([^"]+)"/g, (_, id: string) => ` id="${prefix}-${id}"`)
    .replace(/url\(#([^)]+)\)/g, (_, id: string) => `url(#${prefix}-${id})`)
    .replace(/^<svg /, `<svg role="img" aria-label="${text(label)}" `);
  return `<figure class="chart">${body.trim()}</figure>`;
}

/** A CSS string literal for any text: every character outside a small safe set written as a hex escape. */
export function cssString(value: string): string {
  const escaped = [...value].map((ch) => (/[A-Za-z0-9 .,:;()_-]/.test(ch) ? ch : `\\${ch.codePointAt(0)!.toString(16)} `)).join('');
  return `"${escaped}"`;
}
