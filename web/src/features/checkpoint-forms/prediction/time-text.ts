/** A time on the recording as the teacher types it: 1:02.500 (m:ss.mmm), 62.5 (seconds) or 1:02. */
export function formatClock(ms: number): string {
  const whole = Math.max(0, Math.round(ms));
  const minutes = Math.floor(whole / 60_000);
  const seconds = Math.floor((whole % 60_000) / 1000);
  const millis = whole % 1000;
  return `${minutes}:${String(seconds).padStart(2, '0')}.${String(millis).padStart(3, '0')}`;
}

export type ParsedClock = { ok: true; ms: number } | { ok: false; message: string };

export function parseClock(raw: string): ParsedClock {
  const text = raw.trim();
  if (text === '') return { ok: false, message: 'Enter the reveal time, such as 1:05.250.' };
  const clock = /^(\d+):([0-5]\d)(?:[.,](\d{1,3}))?$/.exec(text);
  if (clock) {
    const millis = Number((clock[3] ?? '').padEnd(3, '0') || 0);
    return { ok: true, ms: Number(clock[1]) * 60_000 + Number(clock[2]) * 1000 + millis };
  }
  const seconds = /^(\d+)(?:[.,](\d{1,3}))?$/.exec(text);
  if (seconds) return { ok: true, ms: Number(seconds[1]) * 1000 + Number((seconds[2] ?? '').padEnd(3, '0') || 0) };
  return {
    ok: false,
    message: `“${text}” is not a time: write minutes:seconds.milliseconds, such as 1:05.250, or seconds, such as 65.25.`,
  };
}

/** Where the reveal may be: after the pin, and inside the recording when its length is known. */
export function revealProblem(revealAtMs: number, atMs: number, durationMs: number): string | null {
  if (revealAtMs <= atMs) return `The reveal must come after the prediction, which is pinned at ${formatClock(atMs)}.`;
  if (durationMs > 0 && revealAtMs > durationMs) return `The recording ends at ${formatClock(durationMs)}: reveal at or before then.`;
  return null;
}
