import { describe, expect, it, vi } from 'vitest';
import type { ViewingReport, ViewingResultDto } from '@core/contracts';
import { REPORT_EVERY_MS, ViewingReporter } from './viewing-reporter';
import { WatchedIntervals } from './watched-intervals';

const reply: ViewingResultDto = {
  completion: { watchedShare: 0.1, watchShareNeeded: 0.9, requiredAnswered: 0, requiredTotal: 1, done: false, completedAt: null },
  serverTime: '2026-12-01T10:00:00.000Z',
};

function setUp() {
  const watched = new WatchedIntervals(60_000);
  let position = 0;
  let tick: () => void = () => undefined;
  const send = vi.fn<(report: ViewingReport) => Promise<ViewingResultDto>>().mockResolvedValue(reply);
  const sendOnHide = vi.fn<(report: ViewingReport) => void>();
  const onResult = vi.fn();
  const reporter = new ViewingReporter({
    watched,
    positionMs: () => position,
    send,
    sendOnHide,
    onResult,
    timers: {
      every: (callback, ms) => {
        expect(ms).toBe(REPORT_EVERY_MS);
        tick = callback;
        return 1;
      },
      stop: () => undefined,
    },
  });
  return { watched, send, sendOnHide, onResult, reporter, setPosition: (ms: number) => (position = ms), tick: () => tick() };
}

describe('ViewingReporter', () => {
  it('sends what was watched every 10 s, and nothing when nothing changed', async () => {
    const { watched, send, onResult, reporter, setPosition, tick } = setUp();
    reporter.start();
    watched.play(0);
    for (let ms = 250; ms <= 9750; ms += 250) watched.progress(ms);
    setPosition(9750);
    tick();
    await vi.waitFor(() => expect(send).toHaveBeenCalledTimes(1));
    expect(send).toHaveBeenLastCalledWith({ intervals: [{ startMs: 0, endMs: 9750 }], positionMs: 9750 });
    await vi.waitFor(() => expect(onResult).toHaveBeenCalledWith(reply));
    watched.stop(9750);
    tick();
    await Promise.resolve();
    expect(send).toHaveBeenCalledTimes(1);
  });

  it('reports a moved position alone (a seek while paused), for the resume point', async () => {
    const { send, reporter, setPosition } = setUp();
    setPosition(42_000);
    await reporter.report();
    expect(send).toHaveBeenLastCalledWith({ intervals: [], positionMs: 42_000 });
  });

  it('keeps the intervals of a report that failed for the next one', async () => {
    const { watched, send, reporter, setPosition } = setUp();
    send.mockRejectedValueOnce(new Error('offline'));
    watched.play(0);
    watched.stop(3000);
    setPosition(3000);
    await reporter.report();
    watched.play(3000);
    watched.stop(5000);
    setPosition(5000);
    await reporter.report();
    expect(send).toHaveBeenLastCalledWith({
      intervals: [
        { startMs: 0, endMs: 3000 },
        { startMs: 3000, endMs: 5000 },
      ],
      positionMs: 5000,
    });
  });

  it('hands everything to the page-hide path at once', () => {
    const { watched, sendOnHide, reporter, setPosition } = setUp();
    watched.play(1000);
    watched.progress(1500);
    setPosition(1500);
    reporter.reportOnHide();
    expect(sendOnHide).toHaveBeenCalledWith({ intervals: [{ startMs: 1000, endMs: 1500 }], positionMs: 1500 });
    reporter.reportOnHide();
    expect(sendOnHide).toHaveBeenCalledTimes(1);
  });
});
