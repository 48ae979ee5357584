/**
 * JSON with object keys sorted at every level and no spaces, so equal content always gives the same
 * text (the API hashes it for draft_hash and content_hash). Follows JSON.stringify otherwise:
 * undefined, functions and symbols are dropped from objects and become null in arrays, non-finite
 * numbers become null, toJSON() is honoured.
 */
export function canonicalJson(value: unknown): string {
  return write(value) ?? 'null';
}

function write(value: unknown): string | undefined {
  if (value !== null && typeof value === 'object' && typeof (value as { toJSON?: unknown }).toJSON === 'function') {
    return write((value as { toJSON: () => unknown }).toJSON());
  }
  if (value === null) return 'null';
  switch (typeof value) {
    case 'string':
      return JSON.stringify(value);
    case 'number':
      return Number.isFinite(value) ? JSON.stringify(value) : 'null';
    case 'boolean':
      return value ? 'true' : 'false';
    case 'bigint':
      throw new TypeError('canonicalJson cannot write a bigint.');
    case 'object':
      break;
    default:
      return undefined;
  }
  if (Array.isArray(value)) return `[${value.map((item) => write(item) ?? 'null').join(',')}]`;
  const entries: string[] = [];
  for (const key of Object.keys(value).sort()) {
    const text = write((value as Record<string, unknown>)[key]);
    if (text !== undefined) entries.push(`${JSON.stringify(key)}:${text}`);
  }
  return `{${entries.join(',')}}`;
}
