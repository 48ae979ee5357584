import type { Checkpoint, CheckpointOf, LessonContent, LessonSettings } from '@core/contracts';
import { newKey, suggestCautions, type CautionTopic } from '@core/lessons';

/**
 * The invented demo lessons on step 002's recordings: shared helpers and the current-balance lesson
 * (the eddy-current one is 003-demo-lesson-eddy.ts). Times follow the recordings' captions (the
 * current is switched on at 3 s); every value a student is graded on is computed by the engine
 * from the formulas written here, never typed as a result.
 */

/** The recording a lesson is built on, as far as its content depends on it. */
export interface DemoRecordingFacts {
  durationMs: number;
}

/** Checkpoints of a lesson sit at least this far apart (more than the default, so pauses never crowd). */
const SPACING_MS = 1000;

export function settings(text: { title: string; description: string; tags: string[]; level: string }): LessonSettings {
  // The studio offers these same cautions for the same words; each defers to the school's rules.
  const safetyNotes = suggestCautions(text)
    .map((caution) => caution.text)
    .join('\n\n');
  return { ...text, safetyNotes, minSpacingMs: SPACING_MS };
}

/** The suggested caution on one topic; a lesson whose text no longer raises it is a mistake in this file. */
export function caution(lesson: LessonSettings, topic: CautionTopic): string {
  const found = suggestCautions(lesson).find((c) => c.topic === topic);
  if (!found) throw new Error(`The demo lesson “${lesson.title}” no longer mentions ${topic}, so its safety note has no caution.`);
  return found.text;
}

export const scored = (points: number, attempts: number, hints: string[], explanation: string) => ({
  required: true,
  points,
  attempts,
  hints,
  explanation,
});

export function safetyNote(atMs: number, label: string, lead: string, text: string): CheckpointOf<'note'> {
  return { key: newKey(), atMs, label, behaviour: 'pause', kind: 'note', tone: 'safety', body: `**${lead}** ${text}` };
}

export function chapters(recording: DemoRecordingFacts, parts: [string, number][]) {
  // The last chapter runs to the real end of the recording, whatever its exact length.
  return parts.map(([title, startMs], i) => ({
    key: newKey(),
    title,
    startMs,
    endMs: parts[i + 1]?.[1] ?? recording.durationMs,
  }));
}

/** Published demo lesson: the force on a current-carrying wire, on 'Demo: current balance'. */
export function currentBalance(recording: DemoRecordingFacts): LessonContent {
  const lesson = settings({
    title: 'Current balance: force on a wire',
    description:
      'A straight copper wire, fed from a low-voltage battery pack through a switch and a rheostat, lies in the field between ' +
      'two magnets on a balance. When the current flows the balance reading shows the force on the wire, and doubling the ' +
      'current doubles it. Students predict what the wire will do, then meet $F = BIL$.',
    tags: ['magnetism', 'force on a conductor', 'current balance'],
    level: 'Year 10 (demo)',
  });
  const checkpoints: Checkpoint[] = [
    safetyNote(500, 'Safety: the circuit', 'Before the current is switched on.', caution(lesson, 'cells')),
    {
      key: newKey(),
      atMs: 1500,
      label: 'F = BIL',
      behaviour: 'pause',
      kind: 'equation',
      latex: 'F = B I L \\sin\\theta',
      caption:
        'The force on a straight wire of length $L$ carrying a current $I$ at an angle $\\theta$ to a uniform field $B$. ' +
        'In this balance the wire is at right angles to the field, so $\\sin\\theta = 1$ and $F = BIL$.',
      model: null,
    },
    {
      key: newKey(),
      atMs: 2500,
      label: 'Predict: current on',
      behaviour: 'gate',
      kind: 'prediction',
      ...scored(0, 1, [], ''),
      prompt: 'The current is about to be switched on. What will the wire between the magnets do?',
      response: {
        mode: 'choices',
        options: [
          { id: 'a', text: 'Move up or down, at right angles to both the wire and the field' },
          { id: 'b', text: 'Swing sideways towards one of the magnets' },
          { id: 'c', text: 'Stay where it is: copper is not attracted to magnets' },
        ],
        correctOptionId: 'a',
      },
      revealAtMs: 5000,
      revealText:
        'The wire is pushed down and the balance tips. The force is at right angles to both the current and the field; ' +
        'reversing either one would push the wire up instead.',
      askExplanation: true,
      scored: false,
    },
    {
      key: newKey(),
      atMs: 3500,
      label: 'Field above the wire',
      behaviour: 'gate',
      kind: 'sign',
      ...scored(
        1,
        1,
        [],
        'Grip the wire with your right hand, thumb along the current (to the right): your fingers curl out of the page above ' +
          'the wire and into it below.',
      ),
      prompt:
        'Take $x$ to the right, $y$ up the page and $z$ out of the page. The current in the balance wire flows to the right ' +
        '($+x$). At a point 1 cm above the wire, does the wire’s **own** magnetic field point into or out of the page?',
      choiceSet: 'page',
      answer: {
        source: 'geometry',
        geometry: { conductor: { shape: 'wire', through: [0, 0, 0], axis: 'x', current: '+' }, point: [0, 0.01, 0], component: 'z' },
      },
    },
    {
      key: newKey(),
      atMs: 4500,
      label: 'Force on the wire',
      behaviour: 'gate',
      kind: 'numeric',
      ...scored(
        2,
        3,
        ['Write the length in metres before you multiply.', 'The wire is at right angles to the field, so $F = BIL$.'],
        'With the wire at right angles to the field, $F = BIL$: tesla × ampere × metre is a newton.',
      ),
      prompt:
        'Between the magnets the field is {{B}}. A length of {{L}} of the wire lies in the field, at right angles to it, and ' +
        'carries a current of {{I}}. What force does the field exert on the wire? Give it in mN.',
      expected: 'B*I*L',
      askedUnit: 'mN',
      variables: [
        { name: 'B', min: 20, max: 80, step: 5, unit: 'mT', role: 'none' },
        { name: 'I', min: 1, max: 4, step: 0.5, unit: 'A', role: 'none' },
        { name: 'L', min: 3, max: 8, step: 0.5, unit: 'cm', role: 'none' },
      ],
      relativeTolerancePercent: 2,
      absoluteTolerance: null,
      sigFigs: null,
      requireUnit: true,
      distractors: [
        {
          id: 'cm',
          formula: 'B*I*L*100',
          feedback: 'That is 100 times too large: the length was used in centimetres. Write it in metres (5 cm = 0.05 m).',
        },
      ],
    },
    {
      key: newKey(),
      atMs: 6000,
      label: 'Doubling the current',
      behaviour: 'gate',
      kind: 'multiple-choice',
      ...scored(
        1,
        2,
        ['Look at how $F$ depends on $I$ in $F = BIL$.'],
        '$F = BIL$: with $B$ and $L$ unchanged, $F$ is proportional to $I$.',
      ),
      prompt: 'The current is doubled. What happens to the force on the wire?',
      options: [
        {
          id: 'a',
          text: 'It doubles',
          correct: true,
          feedback: 'Right: $F = BIL$, so with $B$ and $L$ unchanged the force is proportional to the current.',
        },
        {
          id: 'b',
          text: 'It becomes four times as large',
          correct: false,
          feedback: 'The force is proportional to $I$, not $I^2$. (The heating of the wire, $P = I^2R$, is what grows four times.)',
        },
        { id: 'c', text: 'It halves', correct: false, feedback: 'A larger current gives a larger force: $F = BIL$ grows with $I$.' },
        {
          id: 'd',
          text: 'It stays the same',
          correct: false,
          feedback: 'The force depends on the current: the balance reading changed when the current did.',
        },
      ],
      allowSeveral: false,
      shuffle: true,
    },
    {
      key: newKey(),
      atMs: 7000,
      label: 'Wire along the field',
      behaviour: 'gate',
      kind: 'short-text',
      ...scored(
        1,
        2,
        ['What is $\\sin\\theta$ when the wire and the field point the same way?'],
        'Along the field $\\theta = 0$, so $\\sin\\theta = 0$ and $F = BIL\\sin\\theta = 0$.',
      ),
      prompt: 'The wire is turned so that it lies along the field lines. What is the force on it now? (a number or one word)',
      accepted: ['0', 'zero', '0 N', 'none', 'no force'],
      caseSensitive: false,
      spacing: 'collapse',
    },
  ];
  const parts: [string, number][] = [
    ['The set-up', 0],
    ['Current on', 3000],
    ['Doubling the current', 5500],
  ];
  return { settings: lesson, chapters: chapters(recording, parts), checkpoints };
}
