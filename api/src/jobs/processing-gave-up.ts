import type { Knex } from 'knex';
import type { Logger } from 'pino';
import { FAILURE_CODES, type FailureCode } from '@core/contracts';
import { recordingPrefix } from '@core/recordings';
import type { ObjectStorage } from '../storage/object-storage';
import { findRecordingForProcessing, markFailed } from './processing.repository';
import type { QueueSettings } from './queue-settings';

export interface GaveUpContext {
  db: Knex;
  storage: ObjectStorage;
  logger: Logger;
  settings: QueueSettings;
}

interface FailedJobOutput {
  failureCode?: unknown;
  failureMessage?: unknown;
  message?: unknown;
  value?: unknown;
}

function isFailureCode(value: unknown): value is FailureCode {
  return typeof value === 'string' && (FAILURE_CODES as readonly string[]).includes(value);
}

function limitText(seconds: number): string {
  return seconds % 60 === 0 ? `${seconds / 60}-minute` : `${seconds}-second`;
}

/**
 * The teacher's reason, from the output pg-boss stored for the last attempt: our own error carries
 * a failure code; pg-boss's expiry (a stuck or dead worker) and its in-process time limit carry
 * only a message naming the timeout. Always a code the library offers Retry for (retry-rule.ts):
 * the original is kept precisely so that Retry can work.
 */
export function failureFromOutput(output: unknown, settings: QueueSettings): { code: 'timed_out' | 'processing_error'; message: string } {
  const out = (output ?? {}) as FailedJobOutput;
  const value = (out.value ?? {}) as { message?: unknown };
  const text = [out.message, typeof out.value === 'string' ? out.value : value.message].filter((m) => typeof m === 'string').join(' ');
  const kept = 'The original file is kept: press Retry to try again.';
  if (out.failureCode === 'timed_out' || (!isFailureCode(out.failureCode) && /timeout|exceeded/i.test(text))) {
    return {
      code: 'timed_out',
      message: `Processing did not finish within the ${limitText(settings.expireInSeconds)} time limit. ${kept}`,
    };
  }
  // A retryable failure with a code of its own has a sentence that says more than the generic one.
  if (
    isFailureCode(out.failureCode) &&
    out.failureCode !== 'processing_error' &&
    typeof out.failureMessage === 'string' &&
    out.failureMessage
  ) {
    return { code: 'processing_error', message: `${out.failureMessage} ${kept}` };
  }
  return { code: 'processing_error', message: `Processing did not succeed after ${settings.retryLimit + 1} attempts. ${kept}` };
}

/**
 * Runs for a processing job that used its last attempt (or expired on it, e.g. its worker died):
 * the recording ends failed with a reason, its original kept for Retry, its half-made objects deleted.
 */
export async function markProcessingGaveUp(ctx: GaveUpContext, recordingId: string, output: unknown): Promise<{ marked: boolean }> {
  const recording = await findRecordingForProcessing(ctx.db, recordingId);
  if (!recording || recording.state !== 'processing') return { marked: false };
  const failure = failureFromOutput(output, ctx.settings);
  // Half-made objects go before the row changes: if storage is down this job is retried, the row still processing.
  const prefix = recordingPrefix(recording.schoolId, recording.id);
  const derived = (await ctx.storage.listKeys(prefix)).filter((key) => key !== recording.originalKey);
  if (derived.length > 0) await ctx.storage.deleteKeys(derived);
  if (!(await markFailed(ctx.db, recordingId, failure))) return { marked: false };
  ctx.logger.warn(
    { recordingId, code: failure.code, removedObjects: derived.length },
    'processing gave up: recording marked failed, original kept',
  );
  return { marked: true };
}
