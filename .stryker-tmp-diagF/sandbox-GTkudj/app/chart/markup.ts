/** Marks as SVG markup: the SVG writer's half of the one drawing (the window's half is Marks.svelte). */
// @ts-nocheck

import type { Mark } from './marks';
import { escapeXml } from './text';

/** One mark and its children as markup; its role is written as data-role (parts carry none). */
export function markSvg(mark: Mark): string {
  const role = mark.role === 'part' ? '' : ` data-role="${mark.role}"`;
  const attrs = Object.entries(mark.attrs)
    .map(([name, value]) => ` ${name}="${escapeXml(String(value))}"`)
    .join('');
  const inner = `${mark.text !== undefined ? escapeXml(mark.text) : ''}${(mark.children ?? []).map(markSvg).join('')}`;
  return inner === '' ? `<${mark.tag}${role}${attrs}/>` : `<${mark.tag}${role}${attrs}>${inner}</${mark.tag}>`;
}

export function marksSvg(marks: readonly Mark[]): string {
  return marks.map(markSvg).join('\n');
}
