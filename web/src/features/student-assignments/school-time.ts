/** How a student's pages write an instant: in the school's zone and locale, short ('Thu 3 Dec, 17:00'). */
export type SchoolTime = { timeZone: string; locale: string; /** The server's clock, to leave out the current year. */ now: string };

function yearIn(date: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, year: 'numeric' }).format(date);
}

/** 24-hour locales write 09:00, 12-hour ones 9:00 AM. */
function hourStyle(locale: string): '2-digit' | 'numeric' {
  const cycle = new Intl.DateTimeFormat(locale, { hour: 'numeric' }).resolvedOptions().hourCycle;
  return cycle === 'h23' || cycle === 'h24' ? '2-digit' : 'numeric';
}

/** 'Thu 3 Dec, 17:00' in en-GB; the year is added when it is not the current one ('Thu, 3 Dec 2026, 17:00'). */
export function shortSchoolTime(iso: string, time: SchoolTime): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  const now = new Date(time.now);
  const parts: Intl.DateTimeFormatOptions = { weekday: 'short', day: 'numeric', month: 'short', minute: '2-digit' };
  try {
    const sameYear = !Number.isNaN(now.getTime()) && yearIn(date, time.timeZone) === yearIn(now, time.timeZone);
    const options: Intl.DateTimeFormatOptions = { ...parts, hour: hourStyle(time.locale), timeZone: time.timeZone };
    return new Intl.DateTimeFormat(time.locale, sameYear ? options : { ...options, year: 'numeric' }).format(date);
  } catch {
    // An unknown zone or locale must not break the page: the browser's own settings, with the year.
    return new Intl.DateTimeFormat(undefined, { ...parts, hour: 'numeric', year: 'numeric' }).format(date);
  }
}
