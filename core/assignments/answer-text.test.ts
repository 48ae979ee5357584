import { describe, expect, it } from 'vitest';
import { multipleChoice, note, numeric, prediction, shortText, sign } from '../lessons/fixtures.test-support';
import { answerText } from './answer-text';

// Hand-written expectations for the answer as results and the answer distribution show it.
describe('answerText', () => {
  it('shows numbers and short text as typed, ends trimmed', () => {
    expect(answerText(numeric(), { kind: 'numeric', text: ' 63 uT ' })).toBe('63 uT');
    expect(answerText(shortText(), { kind: 'short-text', text: 'biot savart law' })).toBe('biot savart law');
  });

  it('shows the chosen options in the question order, joined with +, without Markdown', () => {
    const mc = multipleChoice({
      allowSeveral: true,
      options: [
        { id: 'a', text: '**Clockwise**', correct: true, feedback: '' },
        { id: 'b', text: 'Anticlockwise', correct: false, feedback: '' },
        { id: 'c', text: 'It stays still', correct: true, feedback: '' },
      ],
    });
    expect(answerText(mc, { kind: 'multiple-choice', optionIds: ['a'] })).toBe('Clockwise');
    expect(answerText(mc, { kind: 'multiple-choice', optionIds: ['c', 'a'] })).toBe('Clockwise + It stays still');
    expect(answerText(mc, { kind: 'multiple-choice', optionIds: ['a', 'zz'] })).toBe('Clockwise + option zz (no longer in the lesson)');
  });

  it('shows a sign choice by its label', () => {
    expect(answerText(sign(), { kind: 'sign', choice: 'into' })).toBe('Into the page');
    expect(answerText(sign({ choiceSet: 'axis' }), { kind: 'sign', choice: '-x' })).toBe('−x direction');
  });

  it('shows a prediction, with the explanation given at the reveal', () => {
    expect(answerText(prediction(), { kind: 'prediction', optionId: 'p1', text: null, explanation: null })).toBe('Turn further');
    expect(answerText(prediction(), { kind: 'prediction', optionId: 'p1', text: null, explanation: ' the current doubled ' })).toBe(
      'Turn further — because the current doubled',
    );
    const textMode = prediction({ response: { mode: 'text' } });
    expect(answerText(textMode, { kind: 'prediction', optionId: null, text: 'It swings back', explanation: '' })).toBe('It swings back');
  });

  it('refuses an answer of another kind and a checkpoint that takes none', () => {
    expect(() => answerText(numeric(), { kind: 'short-text', text: 'x' })).toThrow(
      'This checkpoint is a numeric answer question; the answer is for short answer.',
    );
    expect(() => answerText(note(), { kind: 'short-text', text: 'x' })).toThrow('Note checkpoints take no answer.');
  });
});
