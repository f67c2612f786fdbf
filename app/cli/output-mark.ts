/**
 * The mark Loftpoint writes into each kind of output file, and the test for
 * it: an existing file is replaced without --force only when it carries the
 * mark, so a page, a note or another program's drawing that happens to share
 * the extension is never overwritten.
 *   SVG  an XML comment after the declaration (XML 1.0, section 2.5 "Comments")
 *   HTML <meta name="generator" content="Loftpoint"> (HTML Living Standard, "Standard metadata names")
 *   CSV  a first comment line "# Written by Loftpoint" (the CSV already starts with # comment lines)
 *   PNG  a tEXt chunk with the keyword "Software" (PNG specification, 11.3.4 "Textual information")
 *   PDF  a comment line after the last %%EOF (ISO 32000-1, 7.2.3 "Comments"; readers look for the
 *        last %%EOF near the end of the file)
 */

export const MARK_TEXT = 'Written by Loftpoint';
const SVG_MARK = `<!-- ${MARK_TEXT}: preliminary sizing output -->`;
const PDF_MARK = `%${MARK_TEXT}\n`;
const CSV_MARK = `# ${MARK_TEXT}\n`;

export function markSvg(svg: string): string {
  const declaration = /^<\?xml[^>]*\?>\n?/.exec(svg);
  if (!declaration) return `${SVG_MARK}\n${svg}`;
  const end = declaration[0].length;
  return `${svg.slice(0, end)}${declaration[0].endsWith('\n') ? '' : '\n'}${SVG_MARK}\n${svg.slice(end)}`;
}

export function markCsv(csv: string): string {
  return `${CSV_MARK}${csv}`;
}

export function markPdf(pdf: Buffer): Buffer {
  const newline = pdf.length > 0 && pdf[pdf.length - 1] !== 0x0a ? '\n' : '';
  return Buffer.concat([pdf, Buffer.from(`${newline}${PDF_MARK}`, 'latin1')]);
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** Inserts a tEXt "Software" chunk right after IHDR (signature 8 bytes, IHDR 25 bytes). */
export function markPng(png: Buffer): Buffer {
  if (!png.subarray(0, 8).equals(PNG_SIGNATURE) || png.subarray(12, 16).toString('latin1') !== 'IHDR') return png;
  const afterHeader = 8 + 12 + png.readUInt32BE(8);
  const data = Buffer.from(`Software\0${MARK_TEXT}`, 'latin1');
  const typeAndData = Buffer.concat([Buffer.from('tEXt', 'latin1'), data]);
  const chunk = Buffer.alloc(12 + data.length);
  chunk.writeUInt32BE(data.length, 0);
  typeAndData.copy(chunk, 4);
  // zlib loads only here: every command that writes no PNG starts without it.
  const { crc32 } = process.getBuiltinModule('node:zlib');
  chunk.writeUInt32BE(crc32(typeAndData) >>> 0, 8 + data.length);
  return Buffer.concat([png.subarray(0, afterHeader), chunk, png.subarray(afterHeader)]);
}

const text = (bytes: Buffer) => bytes.toString('latin1');

export const hasMark = {
  svg: (head: Buffer) => /<svg[\s>]/.test(text(head)) && text(head).includes(SVG_MARK),
  html: (head: Buffer) => /<meta name="generator" content="Loftpoint">/i.test(text(head)),
  csv: (head: Buffer) => text(head).startsWith(CSV_MARK),
  png: (head: Buffer) => head.subarray(0, 8).equals(PNG_SIGNATURE) && text(head).includes(`tEXtSoftware\0${MARK_TEXT}`),
  pdf: (head: Buffer, tail: Buffer) => text(head).startsWith('%PDF-') && text(tail).endsWith(PDF_MARK),
};
