import { CHECKPOINT_KIND_LABELS, isAnswered, type Checkpoint } from '../contracts/checkpoints';
import type { CheckpointAnswer } from '../contracts/student-checkpoints';
import { signChoiceLabel } from '../lessons/choice-labels';
import { AnswerMismatchError } from '../lessons/grade-errors';
import { markdownToPlain } from '../lessons/plain-text';

type AnswerOf<K extends CheckpointAnswer['kind']> = Extract<CheckpointAnswer, { kind: K }>;

function optionText(options: readonly { id: string; text: string }[], id: string): string {
  const option = options.find((o) => o.id === id);
  return option === undefined ? `option ${id} (no longer in the lesson)` : markdownToPlain(option.text);
}

/**
 * An answer as the student gave it, for results and the answer distribution: numbers and text as
 * typed ('63 uT'), the chosen options' texts in the question's order (' + ' between several), a
 * sign choice's label ('Into the page'), a prediction's option or text, with ' — because …' when
 * the student explained it at the reveal. Throws AnswerMismatchError for an answer of another kind.
 */
export function answerText(checkpoint: Checkpoint, answer: CheckpointAnswer): string {
  if (!isAnswered(checkpoint)) throw new AnswerMismatchError(`${CHECKPOINT_KIND_LABELS[checkpoint.kind]} checkpoints take no answer.`);
  if (answer.kind !== checkpoint.kind) {
    throw new AnswerMismatchError(
      `This checkpoint is a ${CHECKPOINT_KIND_LABELS[checkpoint.kind].toLowerCase()} question; the answer is for ${CHECKPOINT_KIND_LABELS[answer.kind].toLowerCase()}.`,
    );
  }
  // The kinds match (checked above); TypeScript cannot narrow the two unions together.
  switch (checkpoint.kind) {
    case 'numeric':
    case 'short-text':
      return (answer as AnswerOf<'numeric' | 'short-text'>).text.trim();
    case 'sign':
      return signChoiceLabel((answer as AnswerOf<'sign'>).choice);
    case 'multiple-choice': {
      const chosen = new Set((answer as AnswerOf<'multiple-choice'>).optionIds);
      const known = checkpoint.options.filter((o) => chosen.has(o.id)).map((o) => markdownToPlain(o.text));
      const unknown = [...chosen].filter((id) => !checkpoint.options.some((o) => o.id === id)).map((id) => optionText([], id));
      return [...known, ...unknown].join(' + ');
    }
    case 'prediction': {
      const given = answer as AnswerOf<'prediction'>;
      const options = checkpoint.response.mode === 'choices' ? checkpoint.response.options : [];
      const predicted = given.optionId !== null ? optionText(options, given.optionId) : (given.text ?? '').trim();
      const because = (given.explanation ?? '').trim();
      return because === '' ? predicted : `${predicted} — because ${because}`;
    }
  }
}
