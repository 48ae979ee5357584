import { TZDate, tzOffset } from '@date-fns/tz';

/**
 * Wall-clock times in a school's zone ('2026-12-03T09:00', as <input type="datetime-local"> gives
 * them) and the instants they name. Teachers type dates in school time; the server keeps instants.
 */

const LOCAL_PATTERN = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;
const MINUTE_MS = 60_000;
const DAY_MS = 24 * 60 * 60 * 1000;

/** Throws a RangeError naming the zone unless the runtime knows it. */
export function assertTimeZone(timeZone: string): void {
  try {
    new Intl.DateTimeFormat('en', { timeZone });
  } catch {
    throw new RangeError(`Unknown time zone "${timeZone}": expected an IANA zone such as Europe/London.`);
  }
}

function offsetMs(timeZone: string, instantMs: number): number {
  return tzOffset(timeZone, new Date(instantMs)) * MINUTE_MS;
}

/**
 * The instant a wall-clock time names in a zone. A time inside a spring-forward gap (01:30 in
 * Europe/London on the last Sunday of March) moves forward by the gap (02:30 summer time); a time
 * that happens twice in the autumn takes the earlier (summer-time) one. Throws a RangeError for a
 * malformed or impossible date ('2026-02-30T09:00') or an unknown zone.
 */
export function localToInstant(local: string, timeZone: string): Date {
  const match = LOCAL_PATTERN.exec(local);
  if (!match) throw new RangeError(`Expected a date and time like 2026-12-03T09:00, got "${local}".`);
  assertTimeZone(timeZone);
  const [year, month, day, hour, minute] = match.slice(1).map(Number) as [number, number, number, number, number];
  const wallMs = Date.UTC(year, month - 1, day, hour, minute);
  const check = new Date(wallMs);
  if (check.getUTCFullYear() !== year || check.getUTCMonth() !== month - 1 || check.getUTCDate() !== day || hour > 23 || minute > 59) {
    throw new RangeError(`There is no such date and time as ${local}.`);
  }
  // The zone's offsets a day either side cover any one transition around this wall time.
  const offsets = [...new Set([offsetMs(timeZone, wallMs - DAY_MS), offsetMs(timeZone, wallMs + DAY_MS)])];
  const candidates = offsets.map((offset) => wallMs - offset).filter((instant) => instant + offsetMs(timeZone, instant) === wallMs);
  if (candidates.length > 0) return new Date(Math.min(...candidates));
  // In a gap: read with the offset before the jump, which lands the same distance past it.
  return new Date(wallMs - offsetMs(timeZone, wallMs - DAY_MS));
}

const pad = (value: number, width = 2) => String(value).padStart(width, '0');

/** The wall-clock time of an instant in a zone, 'YYYY-MM-DDTHH:mm' (seconds dropped), for form inputs. */
export function instantToLocal(instant: Date | string, timeZone: string): string {
  const ms = new Date(instant).getTime();
  if (Number.isNaN(ms)) throw new RangeError(`Expected an instant (a date-time), got "${String(instant)}".`);
  assertTimeZone(timeZone);
  const local = new TZDate(ms, timeZone);
  return `${pad(local.getFullYear(), 4)}-${pad(local.getMonth() + 1)}-${pad(local.getDate())}T${pad(local.getHours())}:${pad(local.getMinutes())}`;
}

/** An instant as people read it in school time: 'Thu, 3 Dec 2026, 09:00 GMT' (en-GB), in the locale's own order. */
export function formatSchoolTime(instant: Date | string, timeZone: string, locale: string): string {
  const date = new Date(instant);
  if (Number.isNaN(date.getTime())) throw new RangeError(`Expected an instant (a date-time), got "${String(instant)}".`);
  assertTimeZone(timeZone);
  return new Intl.DateTimeFormat(locale, {
    timeZone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZoneName: 'short',
  }).format(date);
}
