import { mkdir, mkdtemp, readdir, rm, utimes, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { AttemptFailedError } from './attempt-failed';
import { failureFromOutput } from './processing-gave-up';
import { removeStaleTempFolders, TEMP_PREFIX } from './temp-folders';

const settings = { expireInSeconds: 3600, retryLimit: 3, retryDelaySeconds: 30 };
const kept = 'The original file is kept: press Retry to try again.';
/** What pg-boss stores as a failed job's output for a thrown error (serialize-error's plain object). */
const asOutput = (error: Error) => JSON.parse(JSON.stringify({ ...error, name: error.name, message: error.message }));

describe('the reason a recording fails with after its last attempt', () => {
  it('an attempt that kept failing: processing_error, naming the attempts', () => {
    const output = asOutput(new AttemptFailedError('processing_error', '', 'ffmpeg exited with code 1'));
    expect(failureFromOutput(output, settings)).toEqual({
      code: 'processing_error',
      message: `Processing did not succeed after 4 attempts. ${kept}`,
    });
  });

  it('our own deadline, pg-boss in-process limit and pg-boss expiry of a dead worker are all timed_out', () => {
    const expected = { code: 'timed_out', message: `Processing did not finish within the 60-minute time limit. ${kept}` };
    expect(
      failureFromOutput(asOutput(new AttemptFailedError('timed_out', '', 'Processing passed its time limit of 3600 s.')), settings),
    ).toEqual(expected);
    // Source: pg-boss 10.4.2 src/manager.js resolveWithinSeconds, and src/plans.js failJobsByTimeout.
    expect(failureFromOutput({ name: 'Error', message: 'handler execution exceeded 3600000ms' }, settings)).toEqual(expected);
    expect(failureFromOutput({ value: { message: 'job failed by timeout in active state' } }, settings)).toEqual(expected);
  });

  it('a retryable failure with a code of its own keeps its sentence, under a code Retry is offered for', () => {
    const output = asOutput(new AttemptFailedError('unreadable', 'This video could not be read.', 'probe failed'));
    expect(failureFromOutput(output, settings)).toEqual({ code: 'processing_error', message: `This video could not be read. ${kept}` });
  });

  it('a shutdown of pg-boss or an output it does not know falls back to processing_error', () => {
    // Source: pg-boss 10.4.2 src/manager.js failWip ("pg-boss shut down while active").
    expect(failureFromOutput({ value: 'pg-boss shut down while active' }, settings).code).toBe('processing_error');
    expect(failureFromOutput(null, settings).code).toBe('processing_error');
  });
});

describe('work folders a killed worker left', () => {
  it('are removed when older than the limit; fresh ones and folders of others stay', async () => {
    const root = await mkdtemp(path.join(tmpdir(), 'hjob-temp-root-'));
    try {
      const old = path.join(root, `${TEMP_PREFIX}old`);
      const fresh = path.join(root, `${TEMP_PREFIX}fresh`);
      const other = path.join(root, 'someone-else');
      for (const folder of [old, fresh, other]) await mkdir(folder);
      await writeFile(path.join(old, 'original'), 'bytes');
      const dayAgo = new Date(Date.now() - 24 * 3600_000);
      await utimes(old, dayAgo, dayAgo);
      await utimes(other, dayAgo, dayAgo);
      expect(await removeStaleTempFolders(2 * 3600_000, root)).toBe(1);
      expect((await readdir(root)).sort()).toEqual([`${TEMP_PREFIX}fresh`, 'someone-else']);
    } finally {
      await rm(root, { recursive: true, force: true });
    }
  });
});
