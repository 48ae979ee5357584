import { SIGN_CHOICES, type CheckpointOf } from '../contracts/checkpoints';
import type { CheckpointAnswer } from '../contracts/student-checkpoints';
import { GradingSetupError } from '../physics/grading/compile-spec';
import { gradeNumeric } from '../physics/grading/grade-numeric';
import { PhysicsError } from '../physics/units/errors';
import type { VariableValues } from '../physics/units/types';
import { parseQuantity } from '../physics/units/parse-quantity';
import { signChoiceLabel } from './choice-labels';
import { AnswerMismatchError, CheckpointNotGradableError } from './grade-errors';
import { formatInUnit, readAskedUnit } from './numeric-format';
import { drawnValuesFor, toNumericSpec } from './numeric-spec';
import { matchesAccepted } from './short-text-match';
import { deriveSignAnswer } from './sign-derivation';

/** One answer judged on its own; the attempt rules (hints, reveal, attempts left) are added by gradeCheckpoint. */
export interface Verdict {
  correct: boolean | null;
  score: number;
  feedback: string;
  mistake: string | null;
  /** The answer could not be read: the attempt does not count. */
  invalid: boolean;
  /** The right answer as the reveal states it. */
  answerText: string;
  /** Shown with the reveal; for a prediction this includes what happens at the reveal time. */
  explanation: string;
  /** A numeric answer's value in SI units, as read (stored with the response). */
  parsedSi?: number | null;
}

type AnswerOf<K extends CheckpointAnswer['kind']> = Extract<CheckpointAnswer, { kind: K }>;

const RIGHT = 'Correct.';
const unread = (feedback: string, answerText: string, explanation: string): Verdict => ({
  correct: false,
  score: 0,
  feedback,
  mistake: null,
  invalid: true,
  answerText,
  explanation,
});

export function gradeMultipleChoice(checkpoint: CheckpointOf<'multiple-choice'>, answer: AnswerOf<'multiple-choice'>): Verdict {
  const chosen = [...new Set(answer.optionIds)];
  for (const id of chosen) {
    if (!checkpoint.options.some((o) => o.id === id)) throw new AnswerMismatchError(`There is no option "${id}" in this question.`);
  }
  if (!checkpoint.allowSeveral && chosen.length > 1) throw new AnswerMismatchError('This question takes one option only.');
  const right = checkpoint.options.filter((o) => o.correct);
  const answerText = right.length === 1 ? (right[0]?.text ?? '') : right.map((o) => `- ${o.text}`).join('\n');
  if (chosen.length === 0) {
    return unread(checkpoint.allowSeveral ? 'Tick at least one option.' : 'Choose an option.', answerText, checkpoint.explanation);
  }
  const correct = right.length === chosen.length && right.every((o) => chosen.includes(o.id));
  const feedbacks = checkpoint.options.filter((o) => chosen.includes(o.id) && o.feedback.trim() !== '').map((o) => o.feedback);
  const fallback = correct
    ? RIGHT
    : checkpoint.allowSeveral
      ? 'Not quite: check each option you ticked, and the ones you left out.'
      : 'Not this one. Think again about what the demonstration shows.';
  return {
    correct,
    score: correct ? 1 : 0,
    feedback: feedbacks.length > 0 ? feedbacks.join('\n\n') : fallback,
    mistake: null,
    invalid: false,
    answerText,
    explanation: checkpoint.explanation,
  };
}

export function gradeNumericAnswer(
  checkpoint: CheckpointOf<'numeric'>,
  answer: AnswerOf<'numeric'>,
  options: { seed: string; locale?: string; values?: VariableValues },
): Verdict {
  const asked = readAskedUnit(checkpoint.askedUnit);
  if (!asked.ok) throw new CheckpointNotGradableError(`The asked unit cannot be read: ${asked.message}`);
  let text = answer.text;
  // Without a required unit a bare number is read in the asked unit (the engine alone would read it in SI).
  if (!checkpoint.requireUnit && asked.display !== '') {
    const bare = parseQuantity(text, options.locale === undefined ? {} : { locale: options.locale });
    if (bare.ok && bare.unit === '') text = `${text.trim()} ${asked.display}`;
  }
  let grade;
  try {
    const values = options.values ?? drawnValuesFor(checkpoint, options.seed);
    grade = gradeNumeric(toNumericSpec(checkpoint), text, options.locale === undefined ? { values } : { values, locale: options.locale });
  } catch (error) {
    if (error instanceof GradingSetupError || error instanceof PhysicsError) {
      throw new CheckpointNotGradableError(error.message);
    }
    throw error;
  }
  const answerText = formatInUnit(grade.expected.value, asked);
  if (grade.error) return unread(grade.error.message, answerText, checkpoint.explanation);
  let feedback = grade.feedback;
  if (grade.mistake?.startsWith('distractor:') && feedback.trim() === '') feedback = 'Not quite. Check your working and try again.';
  return {
    correct: grade.correct,
    score: grade.score,
    feedback,
    mistake: grade.mistake ?? null,
    invalid: false,
    answerText,
    explanation: checkpoint.explanation,
    parsedSi: grade.parsed?.value ?? null,
  };
}

export function gradeShortText(checkpoint: CheckpointOf<'short-text'>, answer: AnswerOf<'short-text'>): Verdict {
  const answerText = checkpoint.accepted.find((a) => a.trim() !== '') ?? '';
  if (answer.text.trim() === '') return unread('Type your answer first.', answerText, checkpoint.explanation);
  const correct = matchesAccepted(answer.text, checkpoint);
  return {
    correct,
    score: correct ? 1 : 0,
    feedback: correct ? RIGHT : 'That is not the answer we were looking for. Check the spelling and try again.',
    mistake: null,
    invalid: false,
    answerText,
    explanation: checkpoint.explanation,
  };
}

const OPPOSITE: Record<string, string> = {
  '+': '-',
  '-': '+',
  '+x': '-x',
  '-x': '+x',
  '+y': '-y',
  '-y': '+y',
  '+z': '-z',
  '-z': '+z',
  into: 'out',
  out: 'into',
  clockwise: 'anticlockwise',
  anticlockwise: 'clockwise',
};

/** The sign checkpoint's right choice: set by hand, or derived from its geometry by the engine. */
export function signAnswerOf(checkpoint: CheckpointOf<'sign'>): string {
  if (checkpoint.answer.source === 'set') return checkpoint.answer.choice;
  const derived = deriveSignAnswer(checkpoint.answer.geometry, checkpoint.choiceSet);
  if (!derived.ok) throw new CheckpointNotGradableError(derived.message);
  return derived.choice;
}

export function gradeSign(checkpoint: CheckpointOf<'sign'>, answer: AnswerOf<'sign'>): Verdict {
  const choices: readonly string[] = SIGN_CHOICES[checkpoint.choiceSet];
  if (!choices.includes(answer.choice)) throw new AnswerMismatchError(`"${answer.choice}" is not one of this question's choices.`);
  const right = signAnswerOf(checkpoint);
  const correct = answer.choice === right;
  const opposite = !correct && OPPOSITE[answer.choice] === right;
  return {
    correct,
    score: correct ? 1 : 0,
    feedback: correct
      ? RIGHT
      : opposite
        ? 'That is the opposite way round. Check the right-hand rule against the direction of the current.'
        : 'Not this one. Work out the direction with the right-hand rule and try again.',
    mistake: opposite ? 'opposite' : null,
    invalid: false,
    answerText: signChoiceLabel(right),
    explanation: checkpoint.explanation,
  };
}

export function gradePrediction(checkpoint: CheckpointOf<'prediction'>, answer: AnswerOf<'prediction'>): Verdict {
  const response = checkpoint.response;
  const explanation = [checkpoint.revealText, checkpoint.explanation].filter((t) => t.trim() !== '').join('\n\n');
  const correctOption = response.mode === 'choices' ? response.options.find((o) => o.id === response.correctOptionId) : undefined;
  const answerText = correctOption?.text ?? '';
  if (response.mode === 'choices') {
    if (answer.optionId === null) return unread('Choose what you predict first.', answerText, explanation);
    if (!response.options.some((o) => o.id === answer.optionId)) {
      throw new AnswerMismatchError(`There is no option "${answer.optionId}" in this prediction.`);
    }
  } else if ((answer.text ?? '').trim() === '') {
    return unread('Write your prediction first.', answerText, explanation);
  }
  // Scored only with choices and a correct option; a draft missing them is graded as unscored (publishing refuses it).
  if (!checkpoint.scored || correctOption === undefined) {
    return {
      correct: null,
      score: 0,
      feedback: 'Prediction saved. Watch what happens next.',
      mistake: null,
      invalid: false,
      answerText,
      explanation,
    };
  }
  const correct = answer.optionId === correctOption.id;
  return {
    correct,
    score: correct ? 1 : 0,
    feedback: correct
      ? 'Your prediction matches what happens. Watch to see why.'
      : 'Saved. Watch closely: it may not go the way you predicted.',
    mistake: null,
    invalid: false,
    answerText,
    explanation,
  };
}
