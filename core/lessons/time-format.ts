/** A time on the recording as people read it in messages: 62 500 ms → "1:02.5" (minutes may pass 59). */
export function formatTime(ms: number): string {
  const tenths = Math.round(Math.max(0, ms) / 100);
  const minutes = Math.floor(tenths / 600);
  const seconds = (tenths % 600) / 10;
  return `${minutes}:${seconds.toFixed(1).padStart(4, '0')}`;
}

/** A gap in seconds for messages: 200 → "0.2 s", 1500 → "1.5 s". */
export function formatGap(ms: number): string {
  return `${Number((ms / 1000).toFixed(3))} s`;
}
