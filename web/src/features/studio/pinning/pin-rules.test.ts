import { describe, expect, it } from 'vitest';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { checkPlace, collisionAt, nearestFreeTime } from './pin-rules';

const rules = { minSpacingMs: 500, durationMs: 10_000, frameRate: 25 };

describe('pin rules', () => {
  const a = newCheckpoint('note', 2000);
  const b = newCheckpoint('numeric', 2600);

  it('finds the checkpoint closer than the spacing, ignoring the one being moved', () => {
    expect(collisionAt([a, b], 2300, 500)?.key).toBe(a.key);
    expect(collisionAt([a, b], 2400, 500)?.key).toBe(b.key);
    expect(collisionAt([a, b], 1500, 500)).toBeNull(); // exactly the spacing apart is allowed
    expect(collisionAt([a, b], 2000, 500, a.key)).toBeNull();
  });

  it('accepts a free moment, snapped to a frame', () => {
    expect(checkPlace([a, b], 5013, rules)).toEqual({ ok: true, atMs: 5000 });
  });

  it('refuses a moment too close to another checkpoint and offers the nearest free frame', () => {
    const check = checkPlace([a, b], 1800, rules);
    expect(check).toMatchObject({ ok: false, reason: 'too-close', nearestFreeMs: 1480 });
    if (!check.ok && check.reason === 'too-close') expect(check.neighbour.key).toBe(a.key);
    // Between a and b there is no room (600 ms apart, 500 ms spacing): the nearest is after b.
    expect(nearestFreeTime([a, b], 2400, rules)).toBe(3120);
  });

  it('refuses a moment past the end of the recording', () => {
    expect(checkPlace([a], 10_200, rules)).toEqual({ ok: false, reason: 'past-end', nearestFreeMs: 10_000 });
  });

  it('says when there is no free moment at all', () => {
    const crowded = { minSpacingMs: 500, durationMs: 800, frameRate: 25 };
    const only = newCheckpoint('note', 400);
    expect(checkPlace([only], 400, crowded)).toMatchObject({ ok: false, nearestFreeMs: null });
  });
});
