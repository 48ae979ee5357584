import { describe, expect, it } from 'vitest';
import { guardSeek } from './seek-guard';
import { buildStops } from './stops';
import { mcAt, viewOf } from './test-view';

const stops = buildStops(viewOf([mcAt('pause1', 2000), mcAt('gate01', 5000, 'gate'), mcAt('aside1', 6000, 'aside'), mcAt('pause2', 8000)]));
const none = () => false;

describe('guardSeek', () => {
  it('returns to an unanswered gate before the target', () => {
    expect(guardSeek(stops, 0, 7000, none)).toMatchObject({ action: 'return', stop: { id: 'gate01' } });
    // Even from a chapter jump that starts past it.
    expect(guardSeek(stops, 9000, 9500, none)).toMatchObject({ action: 'return', stop: { id: 'gate01' } });
  });
  it('lets the viewer land on the gate itself or before it', () => {
    expect(guardSeek(stops, 3000, 5000, (s) => s.id === 'pause1')).toEqual({ action: 'allow' });
    expect(guardSeek(stops, 3000, 4000, none)).toEqual({ action: 'allow' });
  });
  it('allows passing an answered gate', () => {
    expect(guardSeek(stops, 5000, 7000, (s) => s.id === 'gate01')).toEqual({ action: 'allow' });
  });
  it('shows a jumped-over pause checkpoint once, and not when it is done', () => {
    expect(guardSeek(stops, 0, 3000, none)).toMatchObject({ action: 'show', stop: { id: 'pause1' } });
    expect(guardSeek(stops, 5000, 9000, (s) => s.id === 'gate01')).toMatchObject({ action: 'show', stop: { id: 'pause2' } });
    expect(guardSeek(stops, 5000, 9000, () => true)).toEqual({ action: 'allow' });
  });
  it('never shows anything on a backward seek or for an aside', () => {
    expect(guardSeek(stops, 9000, 1000, none)).toEqual({ action: 'allow' });
    expect(guardSeek(stops, 5500, 7000, (s) => s.id === 'gate01')).toEqual({ action: 'allow' });
  });
});
