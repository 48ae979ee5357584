import type { FailureCode } from '@core/contracts';

/**
 * Thrown by an attempt that may succeed when tried again. pg-boss stores the serialised error as
 * the job's output; after the last attempt that output travels to the dead-letter queue, whose
 * handler reads `failureCode` and `failureMessage` to tell the teacher what happened.
 */
export class AttemptFailedError extends Error {
  constructor(
    readonly failureCode: FailureCode,
    readonly failureMessage: string,
    detail: string,
  ) {
    super(detail);
    this.name = 'AttemptFailedError';
  }
}

/** Why an attempt's AbortSignal fired. */
export class ShutdownAbort extends Error {
  constructor() {
    super('The worker stopped during processing; the job goes back to the queue.');
    this.name = 'ShutdownAbort';
  }
}

export class DeadlineAbort extends Error {
  constructor(seconds: number) {
    super(`Processing passed its time limit of ${seconds} s.`);
    this.name = 'DeadlineAbort';
  }
}
