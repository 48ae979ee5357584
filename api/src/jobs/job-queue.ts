import type { Knex } from 'knex';

/** Queue names on the pg-boss queue in the app's own PostgreSQL. */
export const QUEUES = {
  processRecording: 'process-recording',
  cleanUploads: 'clean-abandoned-uploads',
  /** Dead letters of process-recording: a job that used its last attempt lands here, and the recording is marked failed. */
  processingFailed: 'process-recording-failed',
} as const;

export interface ProcessRecordingJob {
  recordingId: string;
}

/** What the API needs from the job queue: services depend on this, not on pg-boss. */
export interface JobQueue {
  /**
   * Queues processing of a recording. With `trx`, the job is written in that transaction, so it
   * exists exactly when the row change that asked for it commits. Queuing a recording that is
   * already queued is a no-op.
   */
  enqueueProcessing(recordingId: string, options?: { trx?: Knex.Transaction }): Promise<void>;
  stop(): Promise<void>;
}
