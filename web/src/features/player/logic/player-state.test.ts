import { describe, expect, it } from 'vitest';
import type { CheckpointGradeDto } from '@core/contracts';
import { initialPlayerState, isStopActive, isStopDone, playerReducer, type PlayerState } from './player-state';
import { buildStops } from './stops';
import { mcAt, predictionAt, viewOf } from './test-view';

const stops = buildStops(
  viewOf([mcAt('pause1', 1000), mcAt('gate01', 2000, 'gate'), mcAt('aside1', 3000, 'aside'), predictionAt('pred01', 4000, 6000)]),
);
const stop = (id: string) => {
  const found = stops.find((s) => s.id === id);
  if (!found) throw new Error(`no stop ${id}`);
  return found;
};
const wrong: CheckpointGradeDto = {
  correct: false,
  score: 0,
  feedback: 'No.',
  mistake: null,
  invalid: false,
  attemptsLeft: 1,
  hints: ['Look again.'],
  reveal: null,
};
const unread: CheckpointGradeDto = { ...wrong, invalid: true, feedback: 'Choose an option.', hints: [] };
const mc = { kind: 'multiple-choice' as const, optionIds: ['a'] };

const run = (state: PlayerState, ...events: Parameters<typeof playerReducer>[1][]) => events.reduce(playerReducer, state);

describe('playerReducer', () => {
  it('waits for the safety notes when there are some', () => {
    expect(initialPlayerState(true).started).toBe(false);
    expect(run(initialPlayerState(true), { type: 'start' }).started).toBe(true);
  });

  it('lets a pause pin be skipped, which hands it over', () => {
    const state = run(initialPlayerState(false), { type: 'reach', stop: stop('pause1'), reason: 'reached' }, { type: 'skip' });
    expect(state.overlay).toBeNull();
    expect(isStopDone(state, stop('pause1'))).toBe(true);
  });

  it('refuses to skip a gate or continue past it unanswered', () => {
    const open = run(initialPlayerState(false), { type: 'reach', stop: stop('gate01'), reason: 'reached' });
    expect(run(open, { type: 'skip' }).overlay).not.toBeNull();
    expect(run(open, { type: 'continue', answerable: true }).overlay).not.toBeNull();
    const answered = run(open, { type: 'graded', key: 'gate01', attempt: 1, answer: mc, grade: wrong });
    expect(answered.overlay?.phase).toBe('graded');
    const passed = run(answered, { type: 'continue', answerable: true });
    expect(passed.overlay).toBeNull();
    expect(isStopDone(passed, stop('gate01'))).toBe(true);
  });

  it('keeps an unread answer in the form without counting it', () => {
    const state = run(
      initialPlayerState(false),
      { type: 'reach', stop: stop('gate01'), reason: 'reached' },
      { type: 'graded', key: 'gate01', attempt: 1, answer: mc, grade: unread },
    );
    expect(state.overlay?.phase).toBe('asking');
    expect(isStopDone(state, stop('gate01'))).toBe(false);
  });

  it('goes back to the form on "Try again"', () => {
    const state = run(
      initialPlayerState(false),
      { type: 'reach', stop: stop('pause1'), reason: 'reached' },
      { type: 'graded', key: 'pause1', attempt: 1, answer: mc, grade: wrong },
      { type: 'try-again' },
    );
    expect(state.overlay?.phase).toBe('asking');
  });

  it('shows an aside without an overlay, once, until dismissed', () => {
    const shown = run(initialPlayerState(false), { type: 'reach', stop: stop('aside1'), reason: 'reached' });
    expect(shown.overlay).toBeNull();
    expect(shown.asides).toEqual(['aside1']);
    expect(isStopActive(shown, stop('aside1'))).toBe(false);
    const gone = run(shown, { type: 'dismiss-aside', key: 'aside1' });
    expect(gone.asides).toEqual([]);
    expect(isStopActive(gone, stop('aside1'))).toBe(false);
  });

  it('arms a prediction reveal only once a prediction was made', () => {
    const fresh = initialPlayerState(false);
    expect(isStopActive(fresh, stop('pred01:reveal'))).toBe(false);
    const predicted = run(fresh, {
      type: 'graded',
      key: 'pred01',
      attempt: 1,
      answer: { kind: 'prediction', optionId: 'p1', text: null, explanation: null },
      grade: { ...wrong, correct: null, attemptsLeft: 0 },
    });
    expect(isStopActive(predicted, stop('pred01:reveal'))).toBe(true);
    const revealed = run(
      predicted,
      { type: 'reach', stop: stop('pred01:reveal'), reason: 'reached' },
      { type: 'continue', answerable: true },
    );
    expect(isStopActive(revealed, stop('pred01:reveal'))).toBe(false);
  });

  it('opens a graded checkpoint from the list on its result', () => {
    const state = run(
      initialPlayerState(false),
      { type: 'graded', key: 'pause1', attempt: 1, answer: mc, grade: wrong },
      { type: 'reach', stop: stop('pause1'), reason: 'opened' },
    );
    expect(state.overlay?.phase).toBe('graded');
  });

  it('counts stops the student saw before as handled, once each', () => {
    const state = run(initialPlayerState(false), { type: 'seen', ids: ['pause1', 'pause1'] }, { type: 'seen', ids: ['pause1'] });
    expect(state.handled).toEqual(['pause1']);
    expect(isStopDone(state, stop('pause1'))).toBe(true);
    expect(isStopActive(state, stop('pause1'))).toBe(false);
  });
});
