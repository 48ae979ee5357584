import type { Checkpoint, CheckpointOf } from '../contracts/checkpoints';
import type { LessonContent } from '../contracts/lessons';

/** Complete checkpoints of every kind for the lessons tests; each test overrides what it checks. */
const answered = {
  label: '',
  required: true,
  points: 1,
  attempts: 3,
  hints: ['First hint', 'Second hint'],
  explanation: 'Because of the right-hand rule.',
};

export function multipleChoice(over: Partial<CheckpointOf<'multiple-choice'>> = {}): CheckpointOf<'multiple-choice'> {
  return {
    ...answered,
    key: 'mckey00001',
    atMs: 10_000,
    behaviour: 'gate',
    kind: 'multiple-choice',
    prompt: 'Which way does the needle turn?',
    options: [
      { id: 'a', text: 'Towards east', correct: true, feedback: 'Yes: the coil field points east here.' },
      { id: 'b', text: 'Towards west', correct: false, feedback: 'SECRET-FEEDBACK-B' },
      { id: 'c', text: 'It stays still', correct: false, feedback: '' },
      { id: 'd', text: 'It spins round', correct: false, feedback: '' },
    ],
    allowSeveral: false,
    shuffle: true,
    ...over,
  };
}

/** The centre of a flat coil: B = μ0 N I / (2a). */
export function numeric(over: Partial<CheckpointOf<'numeric'>> = {}): CheckpointOf<'numeric'> {
  return {
    ...answered,
    key: 'numkey0001',
    atMs: 20_000,
    behaviour: 'gate',
    kind: 'numeric',
    prompt: 'A coil of radius {{a}} has {{ N }} turns and carries {{I}}. Find the field at its centre.',
    expected: 'mu0*N*I/(2*a)',
    askedUnit: 'µT',
    variables: [
      { name: 'a', min: 4, max: 8, step: 0.5, unit: 'cm', role: 'radius' },
      { name: 'N', min: 10, max: 50, step: 10, unit: '', role: 'turns' },
      { name: 'I', min: 0.5, max: 2, step: 0.1, unit: 'A', role: 'none' },
    ],
    relativeTolerancePercent: 2,
    absoluteTolerance: null,
    sigFigs: null,
    requireUnit: true,
    distractors: [{ id: 'd1', formula: 'mu0*N*I/(2*pi*a)', feedback: 'That is the formula for a long straight wire.' }],
    ...over,
  };
}

export function shortText(over: Partial<CheckpointOf<'short-text'>> = {}): CheckpointOf<'short-text'> {
  return {
    ...answered,
    key: 'stkey00001',
    atMs: 30_000,
    behaviour: 'gate',
    kind: 'short-text',
    prompt: 'Name the law that links the current to the field.',
    accepted: ['Ampère’s law', 'Biot Savart law'],
    caseSensitive: false,
    spacing: 'collapse',
    ...over,
  };
}

export function sign(over: Partial<CheckpointOf<'sign'>> = {}): CheckpointOf<'sign'> {
  return {
    ...answered,
    key: 'sgkey00001',
    atMs: 40_000,
    behaviour: 'gate',
    kind: 'sign',
    prompt: 'Which way is the field at the centre of the loop?',
    choiceSet: 'page',
    answer: {
      source: 'geometry',
      geometry: {
        conductor: { shape: 'loop', center: [0, 0, 0], radius: 0.05, axis: 'z', current: 'anticlockwise' },
        point: [0, 0, 0],
        component: 'z',
      },
    },
    ...over,
  };
}

export function prediction(over: Partial<CheckpointOf<'prediction'>> = {}): CheckpointOf<'prediction'> {
  return {
    ...answered,
    attempts: 1,
    points: 0,
    key: 'prkey00001',
    atMs: 50_000,
    behaviour: 'gate',
    kind: 'prediction',
    prompt: 'What will the needle do when the current is doubled?',
    response: {
      mode: 'choices',
      options: [
        { id: 'p1', text: 'Turn further' },
        { id: 'p2', text: 'Turn back' },
      ],
      correctOptionId: 'p1',
    },
    revealAtMs: 60_000,
    revealText: 'SECRET-REVEAL: it turns further, but not twice as far.',
    askExplanation: true,
    scored: false,
    ...over,
  };
}

export function equation(over: Partial<CheckpointOf<'equation'>> = {}): CheckpointOf<'equation'> {
  return {
    key: 'eqkey00001',
    atMs: 70_000,
    label: '',
    behaviour: 'pause',
    kind: 'equation',
    latex: 'B = \\frac{\\mu_0 N I}{2a}',
    caption: 'The field at the centre of a flat coil.',
    model: null,
    ...over,
  };
}

export function note(over: Partial<CheckpointOf<'note'>> = {}): CheckpointOf<'note'> {
  return {
    key: 'ntkey00001',
    atMs: 80_000,
    label: '',
    behaviour: 'aside',
    kind: 'note',
    tone: 'safety',
    body: 'Switch off between readings.',
    ...over,
  };
}

export function allKinds(): Checkpoint[] {
  return [multipleChoice(), numeric(), shortText(), sign(), prediction(), equation(), note()];
}

export function lesson(checkpoints: Checkpoint[] = allKinds(), over: Partial<LessonContent> = {}): LessonContent {
  return {
    settings: {
      title: 'Field at the centre of a coil (demo)',
      description: 'We measure the field of a flat coil with a compass needle.',
      tags: ['coils'],
      level: 'Year 11',
      safetyNotes: 'Use a low-voltage supply.',
      minSpacingMs: 500,
    },
    chapters: [
      { key: 'chapter001', title: 'Set-up', startMs: 0, endMs: 30_000 },
      { key: 'chapter002', title: 'Measurements', startMs: 30_000, endMs: 90_000 },
    ],
    checkpoints,
    ...over,
  };
}
