import { formatSchoolTime, instantToLocal, localToInstant } from '@core/assignments/local-time';
import { formatDateTime } from '@/lib/format';

/**
 * Dates of assignments as the school reads them. Teachers type wall-clock times in the school's zone
 * (datetime-local inputs); the API stores instants and sends them back with the zone they were typed in.
 */

const LOCAL = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;

/** 'Thu, 3 Dec 2026, 17:00 GMT': an instant in school time, with the zone's abbreviation. */
export function schoolDateTime(iso: string, timeZone: string, locale: string): string {
  try {
    return formatSchoolTime(iso, timeZone, locale);
  } catch {
    // An unknown zone must not break the page: the shared formatter falls back to the browser's defaults.
    return formatDateTime(iso, { timeZone, locale });
  }
}

/**
 * A typed wall-clock time read back as the school reads it ('Wed, 9 Dec 2026, 17:00 GMT'): the input shows
 * it in the browser's own format (12/09/2026 in some), this says which day and time it is. null until complete.
 */
export function readBackLocal(local: string, timeZone: string, locale: string): string | null {
  if (!LOCAL.test(local)) return null;
  try {
    return formatSchoolTime(localToInstant(local, timeZone), timeZone, locale);
  } catch {
    return null;
  }
}

/** The wall-clock time `days` later, same time of day ('2026-12-03T17:00' + 2 → '2026-12-05T17:00'); null for malformed text. */
export function addDaysToLocal(local: string, days: number): string | null {
  const match = LOCAL.exec(local);
  if (!match) return null;
  const [year, month, day, hour, minute] = match.slice(1).map(Number) as [number, number, number, number, number];
  // Wall-clock arithmetic in UTC, where no day is 23 or 25 hours long.
  return new Date(Date.UTC(year, month - 1, day + days, hour, minute)).toISOString().slice(0, 16);
}

export type AssignmentDefaults = { opensAt: string; dueAt: string };

/** A new assignment opens now and is due a week from today at 17:00, in school time. */
export function defaultDates(now: Date, timeZone: string): AssignmentDefaults {
  const opensAt = instantToLocal(now, timeZone);
  const dueDay = addDaysToLocal(`${opensAt.slice(0, 10)}T17:00`, 7);
  return { opensAt, dueAt: dueDay ?? opensAt };
}

/** When late answers close if the teacher turns them on: two days after the due time. */
export function defaultLateUntil(dueAt: string): string {
  return addDaysToLocal(dueAt, 2) ?? '';
}

/**
 * What a typed wall-clock time means around a clock change in the school's zone: a time skipped when the
 * clocks go forward moves on by the gap; a time that happens twice when they go back takes the first.
 * null when the time is ordinary (or not a complete date and time yet).
 */
export function clockChangeNote(local: string, timeZone: string): string | null {
  if (!LOCAL.test(local)) return null;
  let instant: Date;
  try {
    instant = localToInstant(local, timeZone);
  } catch {
    return null;
  }
  const meant = instantToLocal(instant, timeZone);
  if (meant !== local) {
    return `${local.slice(11)} does not exist on that day in ${timeZone} (the clocks go forward): it will be ${meant.slice(11)}.`;
  }
  // Zones move their clocks back by an hour or, in a few places, half an hour.
  const repeated = [30, 60].some((minutes) => instantToLocal(new Date(instant.getTime() + minutes * 60_000), timeZone) === local);
  return repeated
    ? `${local.slice(11)} happens twice on that day in ${timeZone} (the clocks go back): Pinfield takes the first, before the change.`
    : null;
}
