/**
 * Words and numbers on the diagram: XML escaping for user text (concept
 * names and labels go into markup), shortening for tight spots, and display
 * numbers with the same units and digits as the rest of Loftpoint.
 */
import { displayUnit, fixedDecimals, type DisplayQuantity, type UnitSystem } from '../../core/units/display';

// Characters XML 1.0 does not allow at all (C0 controls other than tab, LF, CR; lone surrogates; U+FFFE/U+FFFF).
const NOT_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/** Anything escapeXml changes: markup characters, and any character outside the ASCII range or below a space. */
const MAY_CHANGE = /[&<>"'\u0000-\u001F\u007F-\uFFFF]/;

/** Text safe inside an XML element or a double- or single-quoted attribute. */
export function escapeXml(text: string): string {
  // Most of the drawing's text (paths, numbers, colours) has nothing to escape: one scan instead of six.
  if (!MAY_CHANGE.test(text)) return text;
  return text
    .replace(NOT_XML, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/** At most `max` characters, ending in an ellipsis when cut. */
export function shorten(text: string, max: number): string {
  const chars = [...text];
  return chars.length <= max ? text : `${chars.slice(0, Math.max(1, max - 1)).join('').trimEnd()}…`;
}

/** A value already in display units, with its unit: "812 N/m²", "0.0483 hp/lb", "0.312". */
export function formatDisplayed(value: number, quantity: DisplayQuantity, system: UnitSystem): string {
  if (!Number.isFinite(value)) return '—';
  const { unit, digits } = displayUnit(quantity, system);
  const shown = fixedDecimals(value, digits);
  return unit ? `${shown} ${unit}` : shown;
}

/** Words filled into lines of at most `width` characters; past `maxLines` the last line ends in an ellipsis. */
export function wrapText(text: string, width: number, maxLines = Infinity): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(/\s+/).filter((part) => part !== '')) {
    const joined = current === '' ? word : `${current} ${word}`;
    if ([...joined].length <= width || current === '') {
      current = joined;
    } else {
      lines.push(current);
      current = word;
    }
  }
  if (current !== '') lines.push(current);
  const fitted = lines.map((line) => shorten(line, width));
  if (fitted.length <= maxLines) return fitted;
  const kept = fitted.slice(0, maxLines);
  kept[maxLines - 1] = shorten(`${kept[maxLines - 1]} ${fitted.slice(maxLines).join(' ')}`, width);
  if (!kept[maxLines - 1].endsWith('…')) kept[maxLines - 1] = `${shorten(kept[maxLines - 1], width - 1)}…`;
  return kept;
}
