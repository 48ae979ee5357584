// Test helpers (imported by *.test.ts only): a lesson whose draft holds one checkpoint of every kind.
import type { Checkpoint, LessonContent, LessonDto } from '@core/contracts';
import { newChapter, newCheckpoint } from '@core/lessons';
import type { TestApp } from '../../../test/test-app';
import { createLesson, member, readyRecording, saveDraft, type Member } from './lessons.test-support';

/** Text only the teacher's side holds: none of it may reach a student's browser before they answer. */
export const SECRETS = {
  explanation: 'EXPLAINED-ONLY-AFTER',
  hint: 'HINT-ONLY-AFTER-A-MISS',
  feedback: 'FEEDBACK-ONLY-WHEN-PICKED',
  expected: '62.8 uT',
  accepted: 'ACCEPTED-SHORT-ANSWER',
  revealText: 'SHOWN-AT-THE-REVEAL',
};

/** Fixed keys, so answers name them. */
export const KEYS = {
  choice: 'choiceaaaa',
  numeric: 'numericaaa',
  short: 'shortaaaaa',
  sign: 'signaaaaaa',
  predict: 'predictaaa',
  equation: 'equationaa',
  note: 'noteaaaaaa',
};

export function everyKindContent(): LessonContent {
  const mc = newCheckpoint('multiple-choice', 1000);
  const choice: Checkpoint = {
    ...mc,
    key: KEYS.choice,
    prompt: 'Which way does the needle turn?',
    attempts: 2,
    hints: [`${SECRETS.hint} 1`],
    explanation: SECRETS.explanation,
    options: [
      { id: 'right', text: 'Clockwise', correct: true, feedback: `${SECRETS.feedback} right` },
      { id: 'wrong', text: 'Anticlockwise', correct: false, feedback: `${SECRETS.feedback} wrong` },
    ],
  };
  const numeric: Checkpoint = {
    ...newCheckpoint('numeric', 2000),
    key: KEYS.numeric,
    prompt: 'What is the field at the centre, in µT?',
    expected: SECRETS.expected,
    askedUnit: 'uT',
    attempts: 3,
    hints: [`${SECRETS.hint} A`, `${SECRETS.hint} B`],
    explanation: SECRETS.explanation,
  };
  const short: Checkpoint = {
    ...newCheckpoint('short-text', 3000),
    key: KEYS.short,
    prompt: 'Name the law.',
    accepted: [SECRETS.accepted],
  };
  const sign: Checkpoint = {
    ...newCheckpoint('sign', 4000),
    key: KEYS.sign,
    prompt: 'Which way is B?',
    answer: { source: 'set', choice: '+z' },
  };
  const predict: Checkpoint = {
    ...newCheckpoint('prediction', 5000),
    key: KEYS.predict,
    prompt: 'What will the needle do?',
    response: {
      mode: 'choices',
      options: [
        { id: 'turn', text: 'Turn' },
        { id: 'stay', text: 'Stay' },
      ],
      correctOptionId: 'turn',
    },
    revealAtMs: 8000,
    revealText: SECRETS.revealText,
    scored: true,
    points: 1,
  };
  const equation: Checkpoint = {
    ...newCheckpoint('equation', 6000),
    key: KEYS.equation,
    latex: 'B = \\frac{\\mu_0 N I}{2a}',
    caption: 'On the axis',
  };
  const note: Checkpoint = { ...newCheckpoint('note', 7000), key: KEYS.note, tone: 'safety', body: 'Keep the current low.' };
  return {
    settings: {
      title: 'Every kind (test)',
      description: 'All seven kinds.',
      tags: ['coils'],
      level: 'Year 12',
      safetyNotes: 'Mind the power supply.',
      minSpacingMs: 500,
    },
    chapters: [
      { ...newChapter(0, 4000), key: 'chapteraaa', title: 'Set-up' },
      { ...newChapter(4000, 12_000), key: 'chapterbbb', title: 'Measure & compare' },
    ],
    checkpoints: [choice, numeric, short, sign, predict, equation, note],
  };
}

/** A teacher of a fresh school with a ready recording and a lesson whose draft is `content`. */
export async function teacherWithLesson(
  t: TestApp,
  content: LessonContent = everyKindContent(),
): Promise<{ teacher: Member; recording: { id: string }; lesson: LessonDto; revision: number }> {
  const teacher = await member(t, ['teacher']);
  const recording = await readyRecording(t, teacher);
  const lesson = await createLesson(teacher.client, recording.id);
  const saved = await saveDraft(teacher.client, lesson.id, lesson.revision, content);
  return { teacher, recording, lesson, revision: saved.revision };
}
