import { describe, expect, it } from 'vitest';
import { AnswerMismatchError, CheckpointNotGradableError, gradeCheckpoint } from './grade-checkpoint';
import { equation, multipleChoice, note, numeric, prediction, shortText, sign } from './fixtures.test-support';
import { sampleExpected } from './numeric-spec';

const opts = (attempt: number) => ({ seed: 'student-7', attempt });

describe('gradeCheckpoint: multiple choice', () => {
  it('grades one correct option with its feedback, and reveals on a right answer', () => {
    const grade = gradeCheckpoint(multipleChoice(), { kind: 'multiple-choice', optionIds: ['a'] }, opts(1));
    expect(grade).toMatchObject({ correct: true, score: 1, invalid: false, attemptsLeft: 2, hints: [] });
    expect(grade.feedback).toBe('Yes: the coil field points east here.');
    expect(grade.reveal).toEqual({ answer: 'Towards east', explanation: 'Because of the right-hand rule.' });
  });

  it('unlocks a hint per wrong attempt and never reveals before the last attempt', () => {
    const first = gradeCheckpoint(multipleChoice(), { kind: 'multiple-choice', optionIds: ['b'] }, opts(1));
    expect(first).toMatchObject({ correct: false, score: 0, attemptsLeft: 2, hints: ['First hint'], reveal: null });
    expect(first.feedback).toBe('SECRET-FEEDBACK-B');
    const second = gradeCheckpoint(multipleChoice(), { kind: 'multiple-choice', optionIds: ['c'] }, opts(2));
    expect(second).toMatchObject({ attemptsLeft: 1, hints: ['First hint', 'Second hint'], reveal: null });
    expect(second.feedback).toMatch(/Not this one/);
    const last = gradeCheckpoint(multipleChoice(), { kind: 'multiple-choice', optionIds: ['c'] }, opts(3));
    expect(last.attemptsLeft).toBe(0);
    expect(last.reveal?.answer).toBe('Towards east');
  });

  it('needs the exact set when several options are correct', () => {
    const several = multipleChoice({
      allowSeveral: true,
      options: [
        { id: 'a', text: 'More turns', correct: true, feedback: 'More turns: yes.' },
        { id: 'b', text: 'More current', correct: true, feedback: '' },
        { id: 'c', text: 'A larger radius', correct: false, feedback: 'A larger radius weakens it.' },
      ],
    });
    expect(gradeCheckpoint(several, { kind: 'multiple-choice', optionIds: ['b', 'a'] }, opts(1)).correct).toBe(true);
    const partial = gradeCheckpoint(several, { kind: 'multiple-choice', optionIds: ['a'] }, opts(1));
    expect(partial.correct).toBe(false);
    expect(gradeCheckpoint(several, { kind: 'multiple-choice', optionIds: ['a', 'b', 'c'] }, opts(1)).feedback).toBe(
      'More turns: yes.\n\nA larger radius weakens it.',
    );
    expect(gradeCheckpoint(several, { kind: 'multiple-choice', optionIds: ['a', 'b'] }, opts(1)).reveal?.answer).toBe(
      '- More turns\n- More current',
    );
  });

  it('treats no choice as unread, keeping the attempt', () => {
    expect(gradeCheckpoint(multipleChoice(), { kind: 'multiple-choice', optionIds: [] }, opts(3))).toMatchObject({
      invalid: true,
      attemptsLeft: 1,
      reveal: null,
      feedback: 'Choose an option.',
    });
  });

  it('refuses unknown options, several options for a one-answer question, and another kind', () => {
    expect(() => gradeCheckpoint(multipleChoice(), { kind: 'multiple-choice', optionIds: ['zz'] }, opts(1))).toThrow(AnswerMismatchError);
    expect(() => gradeCheckpoint(multipleChoice(), { kind: 'multiple-choice', optionIds: ['a', 'b'] }, opts(1))).toThrow(/one option only/);
    expect(() => gradeCheckpoint(multipleChoice(), { kind: 'short-text', text: 'a' }, opts(1))).toThrow(AnswerMismatchError);
    expect(() => gradeCheckpoint(note(), { kind: 'short-text', text: 'a' }, opts(1))).toThrow(/take no answer/);
    expect(() => gradeCheckpoint(equation(), { kind: 'numeric', text: '1' }, opts(1))).toThrow(AnswerMismatchError);
  });
});

describe('gradeCheckpoint: numeric', () => {
  const expectedText = () => sampleExpected(numeric(), 'student-7').expectedText ?? '';

  it("grades against this student's drawn values and reveals the value in the asked unit", () => {
    // B = μ0 N I / (2a) at the centre of a flat coil (OpenStax University Physics Vol. 2, §12.4).
    const grade = gradeCheckpoint(numeric(), { kind: 'numeric', text: expectedText() }, opts(1));
    expect(grade).toMatchObject({ correct: true, score: 1, invalid: false, reveal: { answer: expectedText() } });
    expect(expectedText()).toMatch(/ µT$/);
    const other = gradeCheckpoint(
      numeric(),
      { kind: 'numeric', text: expectedText() },
      { seed: 'another-student-with-other-values', attempt: 1 },
    );
    expect(other.correct).toBe(sampleExpected(numeric(), 'another-student-with-other-values').expectedText === expectedText());
  });

  it('does not use the attempt for an answer it cannot read', () => {
    for (const text of ['', '3 cm', '62 furlongs', '62']) {
      const grade = gradeCheckpoint(numeric(), { kind: 'numeric', text }, opts(3));
      expect(grade).toMatchObject({ invalid: true, correct: false, attemptsLeft: 1, hints: ['First hint', 'Second hint'], reveal: null });
      expect(grade.feedback.length).toBeGreaterThan(5);
    }
  });

  it('gives the distractor feedback and mistake, and reveals on the last attempt', () => {
    const values = sampleExpected({ ...numeric(), expected: 'mu0*N*I/(2*pi*a)' }, 'student-7').expectedText ?? '';
    const grade = gradeCheckpoint(numeric(), { kind: 'numeric', text: values }, opts(3));
    expect(grade).toMatchObject({ correct: false, mistake: 'distractor:d1', feedback: 'That is the formula for a long straight wire.' });
    expect(grade.reveal?.answer).toBe(expectedText());
  });

  it('reads a bare number in the asked unit when no unit is required', () => {
    const noUnit = numeric({ requireUnit: false });
    const number = expectedText().split(' ')[0] ?? '';
    expect(gradeCheckpoint(noUnit, { kind: 'numeric', text: number }, opts(1)).correct).toBe(true);
  });

  it('reads a decimal comma in a comma locale', () => {
    const text = expectedText().replace('.', ',');
    expect(gradeCheckpoint(numeric(), { kind: 'numeric', text }, { seed: 'student-7', attempt: 1, locale: 'fr-FR' }).correct).toBe(true);
  });

  it('refuses to grade a checkpoint whose formula does not evaluate', () => {
    expect(() => gradeCheckpoint(numeric({ expected: 'mu0*(' }), { kind: 'numeric', text: '1 T' }, opts(1))).toThrow(
      CheckpointNotGradableError,
    );
  });
});

describe('gradeCheckpoint: short text', () => {
  it('applies NFC, case and spacing rules', () => {
    const decomposed = 'ampe\u0300re’s   law ';
    expect(gradeCheckpoint(shortText(), { kind: 'short-text', text: decomposed }, opts(1)).correct).toBe(true);
    expect(gradeCheckpoint(shortText({ caseSensitive: true }), { kind: 'short-text', text: decomposed }, opts(1)).correct).toBe(false);
    expect(gradeCheckpoint(shortText({ spacing: 'exact' }), { kind: 'short-text', text: 'Biot  Savart law' }, opts(1)).correct).toBe(false);
    expect(gradeCheckpoint(shortText({ spacing: 'ignore' }), { kind: 'short-text', text: 'biotsavart LAW' }, opts(1)).correct).toBe(true);
  });

  it('reveals the first accepted answer only at the end', () => {
    expect(gradeCheckpoint(shortText(), { kind: 'short-text', text: 'Faraday' }, opts(2)).reveal).toBeNull();
    expect(gradeCheckpoint(shortText(), { kind: 'short-text', text: 'Faraday' }, opts(3)).reveal?.answer).toBe('Ampère’s law');
    expect(gradeCheckpoint(shortText(), { kind: 'short-text', text: '   ' }, opts(3)).invalid).toBe(true);
  });
});

describe('gradeCheckpoint: sign', () => {
  it('derives the answer from the geometry: an anticlockwise loop gives a field out of the page at its centre', () => {
    // Right-hand rule for a current loop (OpenStax University Physics Vol. 2, §12.4): anticlockwise seen from +z → B along +z.
    const right = gradeCheckpoint(sign(), { kind: 'sign', choice: 'out' }, opts(1));
    expect(right).toMatchObject({ correct: true, reveal: { answer: 'Out of the page' } });
    const wrong = gradeCheckpoint(sign(), { kind: 'sign', choice: 'into' }, opts(1));
    expect(wrong).toMatchObject({ correct: false, mistake: 'opposite', reveal: null });
  });

  it('uses a set answer and refuses choices outside the set', () => {
    const set = sign({ choiceSet: 'axis', answer: { source: 'set', choice: '-y' } });
    expect(gradeCheckpoint(set, { kind: 'sign', choice: '-y' }, opts(1)).correct).toBe(true);
    expect(gradeCheckpoint(set, { kind: 'sign', choice: '+x' }, opts(1)).mistake).toBeNull();
    expect(() => gradeCheckpoint(set, { kind: 'sign', choice: 'into' }, opts(1))).toThrow(AnswerMismatchError);
  });
});

describe('gradeCheckpoint: prediction', () => {
  const answer = (optionId: string | null) => ({ kind: 'prediction' as const, optionId, text: null, explanation: null });

  it('saves an unscored prediction neutrally, with what happens for the reveal', () => {
    const grade = gradeCheckpoint(prediction(), answer('p2'), opts(1));
    expect(grade).toMatchObject({ correct: null, score: 0, invalid: false, feedback: 'Prediction saved. Watch what happens next.' });
    expect(grade.reveal?.explanation).toMatch(/^SECRET-REVEAL/);
  });

  it('scores a scored prediction against the correct option', () => {
    expect(gradeCheckpoint(prediction({ scored: true }), answer('p1'), opts(1))).toMatchObject({
      correct: true,
      score: 1,
      reveal: { answer: 'Turn further' },
    });
    expect(gradeCheckpoint(prediction({ scored: true }), answer('p2'), opts(1))).toMatchObject({ correct: false, score: 0 });
  });

  it('needs a choice or a text, and refuses unknown options', () => {
    expect(gradeCheckpoint(prediction(), answer(null), opts(1))).toMatchObject({ invalid: true, attemptsLeft: 1, reveal: null });
    const text = prediction({ response: { mode: 'text' } });
    expect(gradeCheckpoint(text, { kind: 'prediction', optionId: null, text: '  ', explanation: null }, opts(1)).invalid).toBe(true);
    expect(gradeCheckpoint(text, { kind: 'prediction', optionId: null, text: 'It turns', explanation: null }, opts(1)).correct).toBeNull();
    expect(() => gradeCheckpoint(prediction(), answer('zz'), opts(1))).toThrow(AnswerMismatchError);
  });
});
