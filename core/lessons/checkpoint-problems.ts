import { SIGN_CHOICES, type Checkpoint, type CheckpointOf } from '../contracts/checkpoints';
import type { LessonProblem } from '../contracts/lessons';
import { signChoiceLabel } from './choice-labels';
import { latexProblem, markdownProblems } from './markdown-problems';
import { liveModelProblems } from './models/index';
import { numericProblems } from './numeric-problems';
import { deriveSignAnswer } from './sign-derivation';

type Add = (path: string, message: string) => void;

function duplicateIds(ids: string[], path: (j: number) => string, what: string, add: Add): void {
  const seen = new Set<string>();
  ids.forEach((id, j) => {
    if (seen.has(id)) add(path(j), `Two ${what} share the id ${id}.`);
    seen.add(id);
  });
}

function multipleChoice(checkpoint: CheckpointOf<'multiple-choice'>, add: Add): void {
  const { options } = checkpoint;
  if (options.length < 2) add('options', 'Give at least two options.');
  options.forEach((o, j) => {
    if (o.text.trim() === '') add(`options.${j}.text`, 'Write this option, or remove it.');
  });
  duplicateIds(
    options.map((o) => o.id),
    (j) => `options.${j}.id`,
    'options',
    add,
  );
  const correct = options.filter((o) => o.correct).length;
  if (correct === 0) add('options', 'Mark the correct option.');
  else if (correct > 1 && !checkpoint.allowSeveral) {
    add('options', `${correct} options are marked correct: mark one, or allow several correct options.`);
  }
}

function shortText(checkpoint: CheckpointOf<'short-text'>, add: Add): void {
  if (!checkpoint.accepted.some((a) => a.trim() !== '')) add('accepted', 'Add at least one accepted answer.');
}

function sign(checkpoint: CheckpointOf<'sign'>, add: Add): void {
  const choices: readonly string[] = SIGN_CHOICES[checkpoint.choiceSet];
  if (checkpoint.answer.source === 'set') {
    if (!choices.includes(checkpoint.answer.choice)) {
      add('answer.choice', `Choose the correct answer from this set: ${choices.map(signChoiceLabel).join(', ')}.`);
    }
    return;
  }
  const derived = deriveSignAnswer(checkpoint.answer.geometry, checkpoint.choiceSet);
  if (!derived.ok) add('answer.geometry', derived.message);
}

function prediction(checkpoint: CheckpointOf<'prediction'>, add: Add): void {
  const { response } = checkpoint;
  if (response.mode === 'choices') {
    if (response.options.length < 2) add('response.options', 'Give at least two choices to predict from.');
    response.options.forEach((o, j) => {
      if (o.text.trim() === '') add(`response.options.${j}.text`, 'Write this choice, or remove it.');
    });
    duplicateIds(
      response.options.map((o) => o.id),
      (j) => `response.options.${j}.id`,
      'choices',
      add,
    );
    if (response.correctOptionId !== null && !response.options.some((o) => o.id === response.correctOptionId)) {
      add('response.correctOptionId', 'The correct choice is no longer one of the choices: pick it again.');
    } else if (checkpoint.scored && response.correctOptionId === null) {
      add('response.correctOptionId', 'A scored prediction needs its correct choice: pick it, or turn scoring off.');
    }
  } else if (checkpoint.scored) {
    add('scored', 'Only a prediction with choices can be scored: give choices, or turn scoring off.');
  }
}

/** The Markdown fields of a checkpoint, with their paths inside it. */
function markdownFields(checkpoint: Checkpoint): [string, string][] {
  const fields: [string, string][] = [];
  const answered = (c: { hints: string[]; explanation: string }) => {
    c.hints.forEach((h, j) => fields.push([`hints.${j}`, h]));
    fields.push(['explanation', c.explanation]);
  };
  switch (checkpoint.kind) {
    case 'equation':
      fields.push(['caption', checkpoint.caption]);
      break;
    case 'note':
      fields.push(['body', checkpoint.body]);
      break;
    case 'multiple-choice':
      fields.push(['prompt', checkpoint.prompt]);
      checkpoint.options.forEach((o, j) => fields.push([`options.${j}.text`, o.text], [`options.${j}.feedback`, o.feedback]));
      answered(checkpoint);
      break;
    case 'numeric':
      fields.push(['prompt', checkpoint.prompt]);
      checkpoint.distractors.forEach((d, j) => fields.push([`distractors.${j}.feedback`, d.feedback]));
      answered(checkpoint);
      break;
    case 'prediction':
      fields.push(['prompt', checkpoint.prompt], ['revealText', checkpoint.revealText]);
      if (checkpoint.response.mode === 'choices')
        checkpoint.response.options.forEach((o, j) => fields.push([`response.options.${j}.text`, o.text]));
      answered(checkpoint);
      break;
    default:
      fields.push(['prompt', checkpoint.prompt]);
      answered(checkpoint);
  }
  return fields;
}

/**
 * The publish problems of one checkpoint that need nothing outside it, at paths inside the checkpoint
 * ('prompt', 'options.1.text', 'model.inputs.0.max'). Timing against the recording and the other
 * checkpoints is lessonProblems()'s part.
 */
export function checkpointProblems(checkpoint: Checkpoint): LessonProblem[] {
  const problems: LessonProblem[] = [];
  const add: Add = (path, message) => problems.push({ path, message });
  if (checkpoint.kind !== 'equation' && checkpoint.kind !== 'note' && checkpoint.prompt.trim() === '') {
    add('prompt', checkpoint.kind === 'prediction' ? 'Write what the students should predict.' : 'Write the question.');
  }
  if ('hints' in checkpoint) {
    checkpoint.hints.forEach((h, j) => {
      if (h.trim() === '') add(`hints.${j}`, 'This hint is empty: write it, or remove it.');
    });
  }
  switch (checkpoint.kind) {
    case 'multiple-choice':
      multipleChoice(checkpoint, add);
      break;
    case 'numeric':
      problems.push(...numericProblems(checkpoint));
      break;
    case 'short-text':
      shortText(checkpoint, add);
      break;
    case 'sign':
      sign(checkpoint, add);
      break;
    case 'prediction':
      prediction(checkpoint, add);
      break;
    case 'equation': {
      if (checkpoint.latex.trim() === '') add('latex', 'Write the equation in LaTeX.');
      else {
        const problem = latexProblem(checkpoint.latex, true);
        if (problem) add('latex', problem);
      }
      if (checkpoint.model)
        for (const p of liveModelProblems(checkpoint.model)) add(p.path === '' ? 'model' : `model.${p.path}`, p.message);
      break;
    }
    case 'note':
      if (checkpoint.body.trim() === '') add('body', checkpoint.tone === 'safety' ? 'Write the safety caution.' : 'Write the note.');
      break;
  }
  for (const [path, text] of markdownFields(checkpoint)) problems.push(...markdownProblems(text, path));
  return problems;
}
