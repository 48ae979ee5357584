import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { ObjectStorage } from '../storage/object-storage';
import { abortAbandonedUploads } from '../features/uploads/abandoned-uploads';

/** Every hour, at a minute of its own so it does not start with everything else on the hour (UTC). */
export const CLEAN_UPLOADS_CRON = '17 * * * *';

/** The scheduled sweep: multipart uploads idle longer than UPLOAD_ABANDON_HOURS are aborted. */
export async function cleanAbandonedUploads(ctx: {
  db: Knex;
  storage: ObjectStorage;
  logger: Logger;
  olderThanHours: number;
}): Promise<{ aborted: number }> {
  try {
    const aborted = await abortAbandonedUploads({ db: ctx.db, storage: ctx.storage, olderThanHours: ctx.olderThanHours });
    if (aborted > 0) ctx.logger.info({ aborted, olderThanHours: ctx.olderThanHours }, 'abandoned uploads aborted');
    return { aborted };
  } catch (error) {
    // Not retried (the next hour's sweep tries again), so say it here.
    ctx.logger.error({ err: error }, 'the sweep of abandoned uploads failed; the next one tries again');
    throw error;
  }
}
