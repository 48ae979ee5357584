import { describe, expect, it } from 'vitest';
import { canRedo, canUndo, COALESCE_MS, createHistory, HISTORY_LIMIT, record, redo, undo } from './history';

describe('history', () => {
  it('undoes and redoes steps in order', () => {
    let h = createHistory('a');
    h = record(h, 'b', { at: 0 });
    h = record(h, 'c', { at: 5000 });
    expect(h.present).toBe('c');
    h = undo(h);
    expect(h.present).toBe('b');
    h = undo(h);
    expect(h.present).toBe('a');
    expect(canUndo(h)).toBe(false);
    expect(undo(h)).toBe(h);
    h = redo(h);
    expect(h.present).toBe('b');
    h = redo(h);
    expect(h.present).toBe('c');
    expect(canRedo(h)).toBe(false);
    expect(redo(h)).toBe(h);
  });

  it('a new edit after undo drops the redo steps', () => {
    let h = record(record(createHistory(1), 2, { at: 0 }), 3, { at: 5000 });
    h = undo(h);
    h = record(h, 4, { at: 9000 });
    expect(canRedo(h)).toBe(false);
    expect(undo(h).present).toBe(2);
  });

  it('coalesces a typing burst in one field into one step', () => {
    let h = createHistory('');
    h = record(h, 'H', { group: 'cp:k1:prompt', at: 1000 });
    h = record(h, 'He', { group: 'cp:k1:prompt', at: 1200 });
    h = record(h, 'Hel', { group: 'cp:k1:prompt', at: 1200 + COALESCE_MS });
    expect(h.past).toEqual(['']);
    expect(undo(h).present).toBe('');
  });

  it('starts a new step after a pause, in another field, or without a group', () => {
    let h = createHistory('');
    h = record(h, 'a', { group: 'g', at: 0 });
    h = record(h, 'ab', { group: 'g', at: COALESCE_MS + 1 });
    expect(h.past).toEqual(['', 'a']);
    h = record(h, 'abc', { group: 'other', at: COALESCE_MS + 2 });
    h = record(h, 'abcd', { at: COALESCE_MS + 3 });
    h = record(h, 'abcde', { at: COALESCE_MS + 4 });
    expect(h.past).toEqual(['', 'a', 'ab', 'abc', 'abcd']);
  });

  it('does not coalesce into a step reached by undo', () => {
    let h = record(createHistory('x'), 'xy', { group: 'g', at: 0 });
    h = record(h, 'xyz', { group: 'g2', at: 10 });
    h = undo(h);
    h = record(h, 'xyq', { group: 'g', at: 20 });
    expect(h.past).toEqual(['x', 'xy']);
  });

  it('ignores an edit that changes nothing and forgets the oldest steps past the limit', () => {
    const h = createHistory('same');
    expect(record(h, 'same', { at: 0 })).toBe(h);
    let long = createHistory(0);
    for (let i = 1; i <= HISTORY_LIMIT + 10; i++) long = record(long, i, { at: i * 10_000 });
    expect(long.past).toHaveLength(HISTORY_LIMIT);
    expect(long.past[0]).toBe(10);
  });
});
