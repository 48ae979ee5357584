import { describe, expect, it } from 'vitest';
import { answerlessPinsBefore, buildStops, nextStop, revealId, timerDecision, TIMER_LEAD_MS, wallMsUntil } from './stops';
import { mcAt, noteAt, predictionAt, viewOf } from './test-view';

describe('buildStops', () => {
  it('adds a reveal stop for a prediction and sorts by time', () => {
    const stops = buildStops(viewOf([mcAt('bbbbbb', 9000), predictionAt('aaaaaa', 2000, 12000), mcAt('cccccc', 500, 'aside')]));
    expect(stops.map((s) => [s.id, s.atMs, s.pauses])).toEqual([
      ['cccccc', 500, false],
      ['aaaaaa', 2000, true],
      ['bbbbbb', 9000, true],
      [revealId('aaaaaa'), 12000, true],
    ]);
  });

  it('puts a pin before a reveal at the same moment', () => {
    const stops = buildStops(viewOf([predictionAt('aaaaaa', 1000, 5000), mcAt('bbbbbb', 5000)]));
    expect(stops.slice(1).map((s) => s.id)).toEqual(['bbbbbb', 'aaaaaa:reveal']);
  });
});

describe('nextStop', () => {
  const stops = buildStops(viewOf([mcAt('aaaaaa', 1000), mcAt('bbbbbb', 3000)]));
  it('finds the first active stop at or after the time', () => {
    expect(nextStop(stops, 0, () => true)?.id).toBe('aaaaaa');
    expect(nextStop(stops, 1000, () => true)?.id).toBe('aaaaaa');
    expect(nextStop(stops, 1001, () => true)?.id).toBe('aaaaaa');
    expect(nextStop(stops, 1002, () => true)?.id).toBe('bbbbbb');
    expect(nextStop(stops, 0, (s) => s.id !== 'aaaaaa')?.id).toBe('bbbbbb');
    expect(nextStop(stops, 3500, () => true)).toBeNull();
  });
});

describe('answerlessPinsBefore', () => {
  it('lists the notes and equation cards before the point, not answerable ones nor those at or after it', () => {
    const view = viewOf([noteAt('note01', 1000), mcAt('pause1', 2000), noteAt('gnote1', 3000, 'gate'), noteAt('note02', 5000)]);
    const stops = buildStops(view);
    expect(answerlessPinsBefore(view, stops, 5000)).toEqual(['note01', 'gnote1']);
    expect(answerlessPinsBefore(view, stops, 5002)).toEqual(['note01', 'gnote1', 'note02']);
    expect(answerlessPinsBefore(view, stops, 0)).toEqual([]);
  });
});

describe('timers', () => {
  it('turns media time left into wall-clock time at the playback rate', () => {
    expect(wallMsUntil(1000, 3000, 1)).toBe(2000);
    expect(wallMsUntil(1000, 3000, 2)).toBe(1000);
    expect(wallMsUntil(4000, 3000, 1)).toBe(0);
    expect(wallMsUntil(1000, 3000, 0)).toBe(2000);
  });
  it('aims a lead before the pin, and stops once inside it', () => {
    expect(timerDecision(0, 2000, 2)).toEqual({ stop: false, waitMs: 1000 - TIMER_LEAD_MS });
    expect(timerDecision(1950, 2000, 1)).toEqual({ stop: true });
  });
});
