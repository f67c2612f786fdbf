/** Marks as SVG markup: the one drawing as the SVG writer and the window's Marks.svelte both put it on the page. */
import type { Mark } from './marks';
import { escapeXml } from './text';

/** Attributes a front end adds to a mark for its own tools (the window's test handles); none in the SVG files. */
export type MarkHandles = (mark: Mark) => Readonly<Record<string, string>> | undefined;

/** One mark and its children as markup; its role is written as data-role (parts carry none). */
export function markSvg(mark: Mark, handles?: MarkHandles): string {
  const role = mark.role === 'part' ? '' : ` data-role="${mark.role}"`;
  const attrs = [...Object.entries(handles?.(mark) ?? {}), ...Object.entries(mark.attrs)]
    .map(([name, value]) => ` ${name}="${escapeXml(String(value))}"`)
    .join('');
  const inner = `${mark.text !== undefined ? escapeXml(mark.text) : ''}${(mark.children ?? []).map((child) => markSvg(child, handles)).join('')}`;
  return inner === '' ? `<${mark.tag}${role}${attrs}/>` : `<${mark.tag}${role}${attrs}>${inner}</${mark.tag}>`;
}

export function marksSvg(marks: readonly Mark[], handles?: MarkHandles, separator = '\n'): string {
  return marks.map((mark) => markSvg(mark, handles)).join(separator);
}
