import { describe, expect, it } from 'vitest';
import { hotkeyAction, stepRate } from './player-hotkeys';

// Hand-computed cases.
describe('player hotkeys', () => {
  it('maps the arrow and letter keys to seeks, rates and captions', () => {
    expect(hotkeyAction('ArrowLeft')).toEqual({ type: 'seek-by', seconds: -5 });
    expect(hotkeyAction('ArrowRight')).toEqual({ type: 'seek-by', seconds: 5 });
    expect(hotkeyAction('J')).toEqual({ type: 'seek-by', seconds: -10 });
    expect(hotkeyAction('l')).toEqual({ type: 'seek-by', seconds: 10 });
    expect(hotkeyAction('Home')).toEqual({ type: 'seek-to-start' });
    expect(hotkeyAction('>')).toEqual({ type: 'rate-step', step: 1 });
    expect(hotkeyAction('c')).toEqual({ type: 'toggle-captions' });
    expect(hotkeyAction(' ')).toEqual({ type: 'video.js' });
    expect(hotkeyAction('Tab')).toBeNull();
  });

  it('steps through the rate list and stops at its ends', () => {
    const rates = [0.5, 0.75, 1, 1.25, 1.5, 2];
    expect(stepRate(rates, 1, 1)).toBe(1.25);
    expect(stepRate(rates, 1.5, 1)).toBe(2);
    expect(stepRate(rates, 2, 1)).toBe(2);
    expect(stepRate(rates, 0.5, -1)).toBe(0.5);
    // A rate not on the list (set elsewhere) moves to the neighbour in that direction.
    expect(stepRate(rates, 1.1, 1)).toBe(1.25);
    expect(stepRate(rates, 1.1, -1)).toBe(1);
    expect(stepRate(rates, 3, -1)).toBe(2);
    expect(stepRate(rates, 3, 1)).toBe(2);
  });
});
