import { describe, expect, it } from 'vitest';
import { FakeClock, type FakeClockOptions } from './fake-clock';
import { PinScheduler } from './pin-scheduler';
import type { OverlayReason } from './player-state';
import { buildStops, type Stop } from './stops';
import { mcAt, viewOf } from './test-view';

function setUp(checkpoints: Parameters<typeof viewOf>[0], options: FakeClockOptions & { holding?: () => boolean } = {}) {
  const clock = new FakeClock(options);
  const done = new Set<string>();
  const reached: { id: string; reason: OverlayReason; atMs: number }[] = [];
  const scheduler = new PinScheduler(
    clock,
    buildStops(viewOf(checkpoints)),
    {
      isActive: (stop: Stop) => !done.has(stop.id),
      isDone: (stop: Stop) => done.has(stop.id),
      isHolding: options.holding ?? (() => false),
      onStop: (stop, reason) => {
        reached.push({ id: stop.id, reason, atMs: clock.ms });
        // Like the player: an aside is shown once.
        if (!stop.pauses) done.add(stop.id);
      },
    },
    clock,
  );
  return { clock, done, reached, scheduler };
}

describe('PinScheduler', () => {
  it.each([1, 2])('pauses exactly at the pin with timers only, at %sx', (rate) => {
    const { clock, reached } = setUp([mcAt('pause1', 5010)]);
    clock.playbackRate = rate;
    clock.play();
    clock.advance(8000);
    expect(reached).toEqual([{ id: 'pause1', reason: 'reached', atMs: 5010 }]);
    expect(clock.playing).toBe(false);
    expect(clock.ms).toBe(5010);
    // Paused early, never past the pin, then moved onto it.
    expect(clock.pausedAt[0]).toBeLessThanOrEqual(5010);
  });

  it.each([1, 2])('pauses on the pinned frame with per-frame checks, at %sx', (rate) => {
    const { clock, reached } = setUp([mcAt('pause1', 5010)], { frames: true });
    clock.playbackRate = rate;
    clock.play();
    clock.advance(8000);
    expect(reached.map((r) => r.id)).toEqual(['pause1']);
    expect(clock.ms).toBe(5010);
    const pausedAt = clock.pausedAt[0] ?? Infinity;
    expect(pausedAt).toBeLessThanOrEqual(5010);
    expect(clock.maxPresentedMs).toBeLessThanOrEqual(5010);
    // Callbacks on time, one per 1/30 s frame: paused within twice that gap of wall time (at the
    // rate) before the pin, plus the frame it was checked on (hand-computed bound).
    expect(5010 - pausedAt).toBeLessThanOrEqual(2 * (1000 / 30) * rate + (1000 / 30) * rate);
  });

  it('pauses earlier after late callbacks than after punctual ones', () => {
    // Late callbacks early on only (within the remembered gaps), punctual ones near the pin.
    const earliness = (rate: number, late: boolean) => {
      const { clock } = setUp([mcAt('pause1', 1500)], {
        frames: true,
        fps: 24,
        callbackDelay: (n) => (late && n < 8 && n % 3 === 1 ? 40 : 0),
      });
      clock.playbackRate = rate;
      clock.play();
      clock.advance(3000 / rate);
      expect(clock.ms).toBe(1500);
      return 1500 - (clock.pausedAt[0] ?? Infinity);
    };
    // Gaps of 82 ms against 42 ms (hand-computed from the fake's 24 fps frames and 40 ms delays).
    expect(earliness(1, true)).toBeGreaterThan(earliness(1, false));
    expect(earliness(2, true)).toBeGreaterThan(earliness(2, false));
  });

  // A loaded machine (hand-made pattern): most frame callbacks on time, some up to 60 ms late, as a
  // busy main thread makes them. Frames go on reaching the screen meanwhile.
  const LATE = [0, 4, 0, 28, 0, 0, 45, 2, 0, 18, 0, 60];
  it.each([1, 2])('never shows a frame past the pin when frame callbacks come late, at %sx', (rate) => {
    // Pins at many offsets from the 24 fps frame grid, so every phase of frame against pin is met.
    for (let i = 0; i < 24; i += 1) {
      const pin = 3000 + i * 7;
      const { clock, reached } = setUp([mcAt('pause1', pin)], { frames: true, fps: 24, callbackDelay: (n) => LATE[n % LATE.length] ?? 0 });
      clock.playbackRate = rate;
      clock.play();
      clock.advance(6000 / rate);
      expect(
        reached.map((r) => r.id),
        `pin at ${pin} ms`,
      ).toEqual(['pause1']);
      expect(clock.maxPresentedMs, `a frame past the pin at ${pin} ms was shown`).toBeLessThanOrEqual(pin);
      expect(clock.pausedAt[0] ?? Infinity, `paused past the pin at ${pin} ms`).toBeLessThanOrEqual(pin);
      // Then moved exactly onto the pin.
      expect(clock.ms).toBe(pin);
      expect(clock.playing).toBe(false);
    }
  });

  it('seeks back to the pin when playback overshot (no timer or frame came)', () => {
    const { clock, reached } = setUp([mcAt('pause1', 1100)]);
    clock.busy = true;
    clock.play();
    clock.advance(1250);
    expect(reached).toEqual([{ id: 'pause1', reason: 'reached', atMs: 1100 }]);
    expect(clock.ms).toBe(1100);
  });

  it('shows an aside while playing on, then stops at the next pause pin', () => {
    const { clock, reached } = setUp([mcAt('aside1', 1000, 'aside'), mcAt('pause1', 3000)]);
    clock.play();
    clock.advance(1500);
    expect(reached.map((r) => r.id)).toEqual(['aside1']);
    expect(clock.playing).toBe(true);
    clock.advance(3000);
    expect(reached.map((r) => r.id)).toEqual(['aside1', 'pause1']);
    expect(clock.ms).toBe(3000);
  });

  it('goes on to the next pin after the player marks the first one done', () => {
    const { clock, done, reached, scheduler } = setUp([mcAt('pause1', 1000), mcAt('pause2', 2000)]);
    clock.play();
    clock.advance(1500);
    done.add('pause1');
    clock.play();
    scheduler.arm();
    clock.advance(2000);
    expect(reached.map((r) => [r.id, r.atMs])).toEqual([
      ['pause1', 1000],
      ['pause2', 2000],
    ]);
  });

  it('refuses a seek past an unanswered gate and returns to it', () => {
    const { clock, reached, scheduler } = setUp([mcAt('gate01', 5000, 'gate')]);
    scheduler.seekTo(7000);
    expect(clock.ms).toBe(5000);
    expect(reached).toEqual([{ id: 'gate01', reason: 'returned', atMs: 5000 }]);
  });

  it('allows the seek once the gate is done', () => {
    const { clock, done, reached, scheduler } = setUp([mcAt('gate01', 5000, 'gate')]);
    done.add('gate01');
    scheduler.seekTo(7000);
    expect(clock.ms).toBe(7000);
    expect(reached).toEqual([]);
  });

  it('shows a jumped-over pause pin where the viewer landed', () => {
    const { clock, reached, scheduler } = setUp([mcAt('pause1', 2000)]);
    clock.play();
    scheduler.seekTo(4000);
    expect(clock.ms).toBe(4000);
    expect(clock.playing).toBe(false);
    expect(reached).toEqual([{ id: 'pause1', reason: 'passed', atMs: 4000 }]);
  });

  it('keeps the video still while an overlay holds it', () => {
    const { clock } = setUp([mcAt('pause1', 2000)], { holding: () => true });
    clock.play();
    expect(clock.playing).toBe(false);
  });

  it('stops listening when disposed', () => {
    const { clock, reached, scheduler } = setUp([mcAt('pause1', 500)]);
    scheduler.dispose();
    clock.play();
    clock.advance(1000);
    expect(reached).toEqual([]);
    expect(clock.ms).toBe(1000);
  });
});
