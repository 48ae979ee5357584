export type ParsedNumber = { ok: true; value: number | null } | { ok: false; message: string };

/**
 * A number as a teacher types it: digits with a decimal point or a single decimal comma, an optional
 * sign and exponent. Empty is null when the field may be empty.
 */
export function parseNumber(raw: string, { nullable = false }: { nullable?: boolean } = {}): ParsedNumber {
  const text = raw.trim().replace(/\s+/g, '');
  if (text === '') return nullable ? { ok: true, value: null } : { ok: false, message: 'Enter a number.' };
  const normalised = /^[-+]?\d*,\d+$/.test(text) ? text.replace(',', '.') : text;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(normalised)) {
    return { ok: false, message: `“${raw.trim()}” is not a number: use digits with a decimal point, such as 2.5 or -0.04.` };
  }
  const value = Number(normalised);
  if (!Number.isFinite(value)) return { ok: false, message: 'That number is too large.' };
  return { ok: true, value };
}

/** How a stored number shows in its input. */
export function showNumber(value: number | null | undefined): string {
  return value === null || value === undefined || Number.isNaN(value) ? '' : String(value);
}
