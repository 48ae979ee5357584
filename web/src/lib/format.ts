/** Dates are shown in the active school's time zone and locale, whatever the viewer's computer is set to. */
export type SchoolClock = { timeZone: string; locale: string };

export function formatDate(iso: string, clock: SchoolClock): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  try {
    return new Intl.DateTimeFormat(clock.locale, { dateStyle: 'medium', timeZone: clock.timeZone }).format(date);
  } catch {
    // An unknown zone or locale must not break the page: fall back to the browser's defaults.
    return new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' }).format(date);
  }
}

export function formatDateTime(iso: string, clock: SchoolClock): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  try {
    return new Intl.DateTimeFormat(clock.locale, { dateStyle: 'medium', timeStyle: 'short', timeZone: clock.timeZone }).format(date);
  } catch {
    return new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' }).format(date);
  }
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
