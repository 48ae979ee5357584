import { describe, expect, it, vi } from 'vitest';
import { MAX_REFRESH_DELAY_MS, MIN_REFRESH_DELAY_MS, msUntilRefresh, PlaybackKeeper, REFRESH_MARGIN_MS } from './playback-keeper';

function media(overrides: Partial<{ currentTime: number; paused: boolean; ended: boolean }> = {}) {
  return { currentTime: 0, paused: true, ended: false, play: vi.fn(() => Promise.resolve()), ...overrides };
}

describe('playback URL refresh', () => {
  it('refreshes a margin before the URLs expire, never in a tight loop', () => {
    const now = Date.parse('2025-03-03T10:00:00.000Z');
    expect(msUntilRefresh('2025-03-03T12:00:00.000Z', now)).toBe(2 * 3600_000 - REFRESH_MARGIN_MS);
    expect(msUntilRefresh('2025-03-03T09:00:00.000Z', now)).toBe(MIN_REFRESH_DELAY_MS);
    expect(msUntilRefresh('not a date', now)).toBe(MIN_REFRESH_DELAY_MS);
    // Timer delays are 32-bit signed milliseconds: larger ones fire at once (Node.js docs, timers: setTimeout;
    // browsers convert the delay as a WebIDL `long`).
    expect(msUntilRefresh('2099-01-01T00:00:00.000Z', now)).toBe(MAX_REFRESH_DELAY_MS);
  });

  it('resumes a playing video at the same moment, and plays on', () => {
    const keeper = new PlaybackKeeper();
    keeper.beforeSwap(media({ currentTime: 754.3, paused: false }));
    const fresh = media();
    keeper.afterLoad(fresh);
    expect(fresh.currentTime).toBe(754.3);
    expect(fresh.play).toHaveBeenCalledTimes(1);
  });

  it('a paused video stays paused at its moment; an ended one does not start again', () => {
    const keeper = new PlaybackKeeper();
    keeper.beforeSwap(media({ currentTime: 12, paused: true }));
    const fresh = media();
    keeper.afterLoad(fresh);
    expect(fresh.currentTime).toBe(12);
    expect(fresh.play).not.toHaveBeenCalled();

    keeper.beforeSwap(media({ currentTime: 41, paused: false, ended: true }));
    const again = media();
    keeper.afterLoad(again);
    expect(again.play).not.toHaveBeenCalled();
  });

  it('keeps the first resume point when a second refresh comes before the load', () => {
    const keeper = new PlaybackKeeper();
    keeper.beforeSwap(media({ currentTime: 300, paused: false }));
    keeper.beforeSwap(media({ currentTime: 0, paused: true })); // the element after an error, already reset
    const fresh = media();
    keeper.afterLoad(fresh);
    expect(fresh.currentTime).toBe(300);
    expect(fresh.play).toHaveBeenCalled();
  });

  it('asks for fresh URLs after the first media error only, until a load succeeds', () => {
    const keeper = new PlaybackKeeper();
    expect(keeper.onError()).toBe(true);
    expect(keeper.onError()).toBe(false);
    keeper.afterLoad(media());
    expect(keeper.onError()).toBe(true);
  });
});
