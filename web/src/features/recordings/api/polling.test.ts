import { describe, expect, it } from 'vitest';
import { BUSY_POLL_MS, IDLE_POLL_MS, pollInterval } from './polling';

describe('library polling', () => {
  it('asks often while something uploads or processes, rarely otherwise', () => {
    expect(pollInterval([{ state: 'ready' }, { state: 'processing' }])).toBe(BUSY_POLL_MS);
    expect(pollInterval([{ state: 'uploading' }])).toBe(BUSY_POLL_MS);
    expect(pollInterval([{ state: 'ready' }, { state: 'failed' }])).toBe(IDLE_POLL_MS);
    expect(pollInterval(undefined)).toBe(IDLE_POLL_MS);
  });
});
