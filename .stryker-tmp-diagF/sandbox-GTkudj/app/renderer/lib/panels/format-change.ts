/** Short text for a value in a comparison: strings as written, numbers plainly, absent as "—". */
// @ts-nocheck

export function changeValue(value: unknown): string {
  if (value === undefined || value === null) return '—';
  if (typeof value === 'string') return value;
  if (typeof value === 'number') return Number.isFinite(value) ? String(Number(value.toPrecision(6))) : '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  const text = JSON.stringify(value);
  return text.length > 80 ? `${text.slice(0, 79)}…` : text;
}

/** "12 Mar 2025, 14:05" in the reader's locale; the ISO text when it is not a date. */
export function savedAt(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleString(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
}
