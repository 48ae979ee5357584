import type { Chapter, Checkpoint, CheckpointKind, CheckpointOf } from '../contracts/checkpoints';
import { newKey } from './new-key';

const answered = { required: true, points: 1, attempts: 2, hints: [], explanation: '' };

/** A checkpoint of a kind with the defaults a teacher starts from, pinned at `atMs`. */
export function newCheckpoint<K extends CheckpointKind>(kind: K, atMs: number): CheckpointOf<K> {
  const base = { key: newKey(), atMs: Math.max(0, Math.round(atMs)), label: '' };
  const made: Record<CheckpointKind, () => Checkpoint> = {
    'multiple-choice': () => ({
      ...base,
      ...answered,
      kind: 'multiple-choice',
      behaviour: 'gate',
      prompt: '',
      options: [
        { id: newKey(6), text: '', correct: true, feedback: '' },
        { id: newKey(6), text: '', correct: false, feedback: '' },
      ],
      allowSeveral: false,
      shuffle: true,
    }),
    numeric: () => ({
      ...base,
      ...answered,
      attempts: 3,
      kind: 'numeric',
      behaviour: 'gate',
      prompt: '',
      expected: '',
      askedUnit: '',
      variables: [],
      relativeTolerancePercent: 2,
      absoluteTolerance: null,
      sigFigs: null,
      requireUnit: true,
      distractors: [],
    }),
    'short-text': () => ({
      ...base,
      ...answered,
      kind: 'short-text',
      behaviour: 'gate',
      prompt: '',
      accepted: [''],
      caseSensitive: false,
      spacing: 'collapse',
    }),
    equation: () => ({ ...base, kind: 'equation', behaviour: 'pause', latex: '', caption: '', model: null }),
    sign: () => ({
      ...base,
      ...answered,
      attempts: 1,
      kind: 'sign',
      behaviour: 'gate',
      prompt: '',
      choiceSet: 'axis',
      answer: { source: 'set', choice: '+x' },
    }),
    prediction: () => ({
      ...base,
      ...answered,
      attempts: 1,
      points: 0,
      kind: 'prediction',
      behaviour: 'gate',
      prompt: '',
      response: {
        mode: 'choices',
        options: [
          { id: newKey(6), text: '' },
          { id: newKey(6), text: '' },
        ],
        correctOptionId: null,
      },
      revealAtMs: base.atMs + 5000,
      revealText: '',
      askExplanation: true,
      scored: false,
    }),
    note: () => ({ ...base, kind: 'note', behaviour: 'aside', tone: 'remark', body: '' }),
  };
  return made[kind]() as CheckpointOf<K>;
}

export function newChapter(startMs: number, endMs: number): Chapter {
  return { key: newKey(), title: '', startMs: Math.round(startMs), endMs: Math.round(endMs) };
}
