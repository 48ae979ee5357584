import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { describeUploadProblem, STORAGE_DOWN_MESSAGE } from './upload-problems';

function partError(status: number): Error {
  // The shape Uppy's S3 plugin gives a failed part PUT: the XMLHttpRequest as `source`.
  return Object.assign(new Error(status === 0 ? 'Unknown error' : 'Non 2xx'), { source: { status } });
}

describe('describeUploadProblem', () => {
  it('storage down: the API says so, or part PUTs get no answer or a 5xx', () => {
    const fromApi = new ApiError(503, 'storage_unavailable', 'File storage is not reachable right now.');
    const noRequest = Object.assign(new Error('Unknown error'), { source: null });
    for (const error of [fromApi, partError(0), partError(503), noRequest, new ApiError(0, 'network_error', 'offline')]) {
      expect(describeUploadProblem(error)).toEqual({ kind: 'storage', message: STORAGE_DOWN_MESSAGE, retryable: true });
    }
  });

  it('API refusals keep the API’s sentence; only a full quota can change by retrying', () => {
    expect(describeUploadProblem(new ApiError(400, 'not_video', 'This file is a PDF, not a video.'))).toEqual({
      kind: 'refused',
      message: 'This file is a PDF, not a video.',
      retryable: false,
    });
    expect(describeUploadProblem(new ApiError(400, 'too_large', 'The file is larger than the 2 GiB limit.')).retryable).toBe(false);
    expect(describeUploadProblem(new ApiError(400, 'quota_exceeded', 'Your 20 GiB are used.')).retryable).toBe(true);
  });

  it('a part refused by storage names the status; other errors say Retry continues', () => {
    expect(describeUploadProblem(partError(403)).message).toContain('status 403');
    expect(describeUploadProblem(new Error('boom'))).toEqual({
      kind: 'failed',
      message: 'The upload stopped unexpectedly (boom). Press Retry to continue from the parts already stored.',
      retryable: true,
    });
  });
});
