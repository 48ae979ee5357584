/**
 * `{{name}}` placeholders in a numeric prompt: each student sees their own drawn value there.
 * Spaces inside the braces are allowed (`{{ a }}`); anything between the braces counts as a name, so a
 * mistyped `{{ 2a }}` is reported as undeclared rather than silently shown as text.
 */
const PLACEHOLDER = /\{\{([^{}]*)\}\}/g;

/** The names used in `text`, trimmed, each once, in order of first use. */
export function placeholderNames(text: string): string[] {
  const names: string[] = [];
  for (const match of text.matchAll(PLACEHOLDER)) {
    const name = (match[1] ?? '').trim();
    if (!names.includes(name)) names.push(name);
  }
  return names;
}

/** Replaces each `{{name}}` that has a value; placeholders without one are left as written. */
export function fillPlaceholders(text: string, values: Readonly<Record<string, string | number>>): string {
  return text.replace(PLACEHOLDER, (whole, inner: string) => {
    const name = inner.trim();
    return Object.hasOwn(values, name) ? String(values[name]) : whole;
  });
}
