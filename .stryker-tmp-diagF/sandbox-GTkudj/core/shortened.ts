/**
 * A value the user wrote, for a one-line message: text longer than `max`
 * characters is cut with an ellipsis and its length is given, so a 100 KB
 * mistake is named without being repeated in full.
 */
// @ts-nocheck

export function shortened(text: string, max = 60): string {
  const characters = Array.from(text);
  if (characters.length <= max) return text;
  return `${characters.slice(0, max - 1).join('')}… (${characters.length.toLocaleString('en-US')} characters)`;
}
