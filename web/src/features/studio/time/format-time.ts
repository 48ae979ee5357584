/** 62500 -> "1:02.500"; an hour or more -> "1:02:03.040". The studio shows every time to the millisecond. */
export function formatTime(ms: number): string {
  const total = Math.max(0, Math.round(ms));
  const h = Math.floor(total / 3_600_000);
  const m = Math.floor((total % 3_600_000) / 60_000);
  const s = Math.floor((total % 60_000) / 1000);
  const milli = total % 1000;
  const tail = `${String(s).padStart(2, '0')}.${String(milli).padStart(3, '0')}`;
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${tail}` : `${m}:${tail}`;
}

/** A short time for ruler ticks and transcript lines: "1:02" (or "1:02.5" when the step needs tenths). */
export function formatClock(ms: number, withTenths = false): string {
  const total = Math.max(0, ms);
  const m = Math.floor(total / 60_000);
  const seconds = (total % 60_000) / 1000;
  const s = withTenths ? seconds.toFixed(1).padStart(4, '0') : String(Math.floor(seconds)).padStart(2, '0');
  return `${m}:${s}`;
}

export type ParsedTime = { ok: true; ms: number } | { ok: false; message: string };

const TIME = /^(?:(\d+):)?(?:(\d+):)?(\d+)(?:\.(\d{1,3}))?$/;

/**
 * Reads what a teacher types in a time field: "1:02.500", "1:02", "62.5", "1:02:03.040".
 * Minutes and seconds after the first part must be below 60, so a slip like "1:75" is caught.
 */
export function parseTime(text: string): ParsedTime {
  const value = text.trim();
  if (value === '') return { ok: false, message: 'Enter a time, for example 1:02.500.' };
  const match = TIME.exec(value);
  if (!match) return { ok: false, message: 'Write the time as minutes:seconds.milliseconds, for example 1:02.500.' };
  const [, first, second, secondsText, fraction] = match;
  let hours = 0;
  let minutes = 0;
  if (first !== undefined && second !== undefined) {
    hours = Number(first);
    minutes = Number(second);
    if (minutes >= 60) return { ok: false, message: 'Minutes after the hours must be below 60.' };
  } else if (first !== undefined) {
    minutes = Number(first);
  }
  const seconds = Number(secondsText);
  if (first !== undefined && seconds >= 60) return { ok: false, message: 'Seconds after the minutes must be below 60.' };
  const milli = fraction === undefined ? 0 : Number(fraction.padEnd(3, '0'));
  return { ok: true, ms: ((hours * 60 + minutes) * 60 + seconds) * 1000 + milli };
}
