import { describe, expect, it } from 'vitest';
import { WatchedIntervals } from './watched-intervals';

// Hand-computed cases of a 60 s recording.
describe('WatchedIntervals', () => {
  it('records play to pause as one interval', () => {
    const watched = new WatchedIntervals(60_000);
    watched.play(0);
    for (let ms = 250; ms <= 5000; ms += 250) watched.progress(ms);
    watched.stop(5010);
    expect(watched.take(200)).toEqual([{ startMs: 0, endMs: 5010 }]);
    expect(watched.take(200)).toEqual([]);
  });

  it('ends the interval where playback was when a seek began, and opens another after it', () => {
    const watched = new WatchedIntervals(60_000);
    watched.play(1000);
    watched.progress(4000);
    watched.seeking();
    watched.play(20_000);
    watched.progress(22_500);
    watched.stop(22_600);
    expect(watched.take(200)).toEqual([
      { startMs: 1000, endMs: 4000 },
      { startMs: 20_000, endMs: 22_600 },
    ]);
  });

  it('splits a long stretch between reports without losing or repeating a millisecond', () => {
    const watched = new WatchedIntervals(60_000);
    watched.play(0);
    watched.progress(2000);
    watched.progress(4000);
    expect(watched.take(200)).toEqual([{ startMs: 0, endMs: 4000 }]);
    watched.progress(6000);
    watched.stop(6500);
    expect(watched.take(200)).toEqual([{ startMs: 4000, endMs: 6500 }]);
  });

  it('starts where the video stood when "play" arrives a little late, and counts the player’s small step onto a pin', () => {
    const watched = new WatchedIntervals(60_000);
    // The 'play' event came 12 ms into playback.
    watched.play(12);
    watched.progress(250);
    watched.progress(480);
    // Paused one frame early, reported, then moved onto the pin at 0:00.52.
    watched.stop(480);
    expect(watched.take(200)).toEqual([{ startMs: 0, endMs: 480 }]);
    watched.seeking();
    watched.seeked(520);
    watched.play(533);
    watched.progress(750);
    // A real seek is not bridged.
    watched.seeking();
    watched.seeked(9000);
    watched.play(9000);
    watched.stop(9250);
    expect(watched.take(200)).toEqual([
      { startMs: 480, endMs: 520 },
      { startMs: 520, endMs: 750 },
      { startMs: 9000, endMs: 9250 },
    ]);
  });

  it('does not stretch a start back across a long rest elsewhere', () => {
    const watched = new WatchedIntervals(60_000, 30_000);
    watched.play(2000);
    watched.stop(2500);
    expect(watched.take(200)).toEqual([{ startMs: 2000, endMs: 2500 }]);
  });

  it('treats a jump in timeupdates as a seek', () => {
    const watched = new WatchedIntervals(60_000);
    watched.play(0);
    watched.progress(1000);
    watched.progress(30_000);
    watched.progress(31_000);
    watched.stop(31_000);
    expect(watched.take(200)).toEqual([
      { startMs: 0, endMs: 1000 },
      { startMs: 30_000, endMs: 31_000 },
    ]);
  });

  it('drops empty intervals, clamps to the recording, and rounds to whole milliseconds', () => {
    const watched = new WatchedIntervals(60_000);
    watched.play(3000);
    watched.stop(3000);
    watched.play(59_000.4);
    watched.progress(60_200.7);
    watched.stop(60_200.7);
    expect(watched.take(200)).toEqual([{ startMs: 59_000, endMs: 60_000 }]);
  });

  it('hands over at most `max` intervals and keeps the rest; a failed report puts its intervals back first', () => {
    const watched = new WatchedIntervals(60_000);
    for (const start of [0, 10_000, 20_000]) {
      watched.play(start);
      watched.stop(start + 1000);
    }
    const sent = watched.take(2);
    expect(sent).toEqual([
      { startMs: 0, endMs: 1000 },
      { startMs: 10_000, endMs: 11_000 },
    ]);
    watched.restore(sent);
    expect(watched.take(200).map((i) => i.startMs)).toEqual([0, 10_000, 20_000]);
  });
});
