import type { Logger } from 'pino';
import type { Db } from '../db/knex';
import { raiseProgress } from './processing.repository';

/** At most one progress write a second: ffmpeg reports many times a second, the library polls every few. */
const MIN_INTERVAL_MS = 1000;

/**
 * Turns ffmpeg's frequent percentages into occasional, ordered writes of `recordings.progress`.
 * `flush()` waits for the last write so none lands after the job has finished.
 */
export function createProgressWriter(db: Db, recordingId: string, logger: Logger) {
  let written = 0;
  let lastAt = 0;
  let chain: Promise<void> = Promise.resolve();

  return {
    report(percent: number): void {
      // 100 is the ready state's own; processing shows at most 99.
      const value = Math.max(0, Math.min(99, Math.floor(percent)));
      const now = Date.now();
      if (value <= written || now - lastAt < MIN_INTERVAL_MS) return;
      written = value;
      lastAt = now;
      chain = chain
        .then(() => raiseProgress(db, recordingId, value))
        .catch((error: unknown) => logger.warn({ err: error, recordingId }, 'could not write processing progress'));
    },
    flush(): Promise<void> {
      return chain;
    },
  };
}
