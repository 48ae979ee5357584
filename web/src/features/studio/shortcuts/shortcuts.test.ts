import { describe, expect, it } from 'vitest';
import { isTypingTarget, matchShortcut, type KeyLike } from './shortcuts';

const key = (k: string, extra: Partial<KeyLike> = {}): KeyLike => ({
  key: k,
  code: '',
  shiftKey: false,
  ctrlKey: false,
  metaKey: false,
  altKey: false,
  ...extra,
});

describe('studio shortcuts', () => {
  it('pins a kind with P then a digit', () => {
    expect(matchShortcut(key('p'), false)).toEqual({ type: 'pin-prefix' });
    expect(matchShortcut(key('2', { code: 'Digit2' }), true)).toEqual({ type: 'pin', kind: 'numeric' });
    expect(matchShortcut(key('7'), true)).toEqual({ type: 'pin', kind: 'note' });
    expect(matchShortcut(key('2', { code: 'Digit2' }), false)).toBeNull();
    expect(matchShortcut(key('8', { code: 'Digit8' }), true)).toBeNull();
  });

  it('nudges by a frame and, with Shift, by a second, on any layout', () => {
    expect(matchShortcut(key(',', { code: 'Comma' }), false)).toEqual({ type: 'nudge', frames: -1 });
    expect(matchShortcut(key('.', { code: 'Period' }), false)).toEqual({ type: 'nudge', frames: 1 });
    expect(matchShortcut(key('<', { code: 'Comma', shiftKey: true }), false)).toEqual({ type: 'nudge-seconds', seconds: -1 });
    expect(matchShortcut(key(';', { code: 'Comma', shiftKey: true }), false)).toEqual({ type: 'nudge-seconds', seconds: -1 });
    expect(matchShortcut(key('>', { shiftKey: true }), false)).toEqual({ type: 'nudge-seconds', seconds: 1 });
  });

  it('undoes and redoes with Ctrl or Cmd', () => {
    expect(matchShortcut(key('z', { ctrlKey: true }), false)).toEqual({ type: 'undo' });
    expect(matchShortcut(key('Z', { metaKey: true, shiftKey: true }), false)).toEqual({ type: 'redo' });
    expect(matchShortcut(key('y', { ctrlKey: true }), false)).toEqual({ type: 'redo' });
    expect(matchShortcut(key('p', { ctrlKey: true }), false)).toBeNull();
    expect(matchShortcut(key('c', { altKey: true }), false)).toBeNull();
  });

  it('knows the other keys and ignores the rest', () => {
    expect(matchShortcut(key('?', { shiftKey: true }), false)).toEqual({ type: 'help' });
    expect(matchShortcut(key('Delete'), false)).toEqual({ type: 'delete' });
    expect(matchShortcut(key('='), false)).toEqual({ type: 'zoom', direction: 'in' });
    expect(matchShortcut(key(']'), false)).toEqual({ type: 'step-playhead', frames: 1 });
    expect(matchShortcut(key('x'), false)).toBeNull();
  });

  it('treats text fields as typing, buttons and checkboxes not', () => {
    const text = document.createElement('input');
    const box = Object.assign(document.createElement('input'), { type: 'checkbox' });
    expect(isTypingTarget(text)).toBe(true);
    expect(isTypingTarget(document.createElement('textarea'))).toBe(true);
    expect(isTypingTarget(document.createElement('select'))).toBe(true);
    expect(isTypingTarget(box)).toBe(false);
    expect(isTypingTarget(document.createElement('button'))).toBe(false);
    expect(isTypingTarget(null)).toBe(false);
  });
});
