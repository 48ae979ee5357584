/** Measures named phases so the scripts can print where the time went. */
export interface PhaseTime {
  name: string;
  ms: number;
}

export class Stopwatch {
  readonly phases: PhaseTime[] = [];

  async time<T>(name: string, run: () => Promise<T>): Promise<T> {
    const started = performance.now();
    try {
      return await run();
    } finally {
      this.phases.push({ name, ms: performance.now() - started });
    }
  }
}

/** "850 ms", "12.3 s", "2 min 05 s". */
export function formatDuration(ms: number): string {
  if (ms < 1000) return `${Math.round(ms)} ms`;
  const seconds = ms / 1000;
  if (seconds < 60) return `${seconds.toFixed(1)} s`;
  const total = Math.round(seconds);
  const minutes = Math.floor(total / 60);
  const rest = total % 60;
  return `${minutes} min ${String(rest).padStart(2, '0')} s`;
}
