import { describe, expect, it } from 'vitest';
import { studentState, type StudentStateInput } from './student-state';

// Hand-worked table of the home's states.
const fresh: StudentStateInput = { phase: 'open', opened: false, answered: 0, watchedSeconds: 0, done: false };

describe('studentState', () => {
  it.each([
    ['not started while open and untouched', fresh, 'not-started'],
    ['in progress once opened', { ...fresh, opened: true }, 'in-progress'],
    ['in progress once watched', { ...fresh, watchedSeconds: 3 }, 'in-progress'],
    ['in progress once answered', { ...fresh, answered: 1 }, 'in-progress'],
    ['upcoming before the opening', { ...fresh, phase: 'upcoming' }, 'upcoming'],
    ['late while only late answers are taken', { ...fresh, phase: 'late', opened: true }, 'late'],
    ['late also when untouched', { ...fresh, phase: 'late' }, 'late'],
    ['closed after the close when not done', { ...fresh, phase: 'closed', answered: 2 }, 'closed'],
    ['done while open', { ...fresh, opened: true, done: true }, 'done'],
    ['done wins over late', { ...fresh, phase: 'late', done: true }, 'done'],
    ['done wins over closed', { ...fresh, phase: 'closed', done: true }, 'done'],
  ] as const)('%s', (_name, input, expected) => {
    expect(studentState(input)).toBe(expected);
  });
});
