/**
 * The methods reference (core/methods.md) as blocks the Help panel draws
 * with plain elements: headings, paragraphs, list items, equations and table
 * rows. No HTML is injected; the markers of generated parts are dropped.
 */
// @ts-nocheck


export type MethodsBlock =
  | { type: 'heading'; level: number; text: string; id: string }
  | { type: 'paragraph' | 'item' | 'equation' | 'quote'; text: string }
  | { type: 'row'; cells: string[]; header: boolean };

const slug = (text: string) =>
  text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');

/** Inline Markdown marks (*, `) read as plain text. */
const plainText = (text: string) => text.replace(/\*\*?|`/g, '');

export function methodsBlocks(markdown: string): MethodsBlock[] {
  const blocks: MethodsBlock[] = [];
  let paragraph: string[] = [];
  const flush = () => {
    if (paragraph.length) blocks.push({ type: 'paragraph', text: plainText(paragraph.join(' ')) });
    paragraph = [];
  };
  let tableRow = 0;
  for (const line of markdown.split('\n')) {
    const heading = /^(#{1,4})\s+(.*)$/.exec(line);
    if (line.trim() === '' || line.startsWith('<!--')) {
      flush();
      tableRow = 0;
    } else if (heading) {
      flush();
      const text = plainText(heading[2]);
      blocks.push({ type: 'heading', level: heading[1].length, text, id: `methods-${slug(text)}` });
    } else if (line.startsWith('    ')) {
      flush();
      blocks.push({ type: 'equation', text: line.trim() });
    } else if (line.startsWith('- ')) {
      flush();
      blocks.push({ type: 'item', text: plainText(line.slice(2)) });
    } else if (line.startsWith('> ')) {
      flush();
      // A quote written over several lines is one block.
      const last = blocks.at(-1);
      if (last?.type === 'quote') last.text = `${last.text} ${plainText(line.slice(2))}`;
      else blocks.push({ type: 'quote', text: plainText(line.slice(2)) });
    } else if (line.startsWith('|')) {
      flush();
      if (/^\|[-| ]+\|$/.test(line)) continue;
      blocks.push({ type: 'row', cells: line.slice(1, -1).split('|').map((cell) => plainText(cell.trim())), header: tableRow === 0 });
      tableRow++;
    } else paragraph.push(line.trim());
  }
  flush();
  return blocks;
}
