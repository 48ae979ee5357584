// Test helpers (imported by *.test.ts only): a lesson whose every hidden field holds its own canary.
import type { Checkpoint, LessonContent } from '@core/contracts';
import { defaultLiveModel, newChapter, newCheckpoint } from '@core/lessons';

/**
 * One distinct marker per hidden field of every kind that carries text. None may reach a student
 * before they answered; after an answer only what the policies allow. Fields that hold no free
 * text (correct flags, a set sign answer, a prediction's correct option id, tolerances, variable
 * ranges) are checked by the allow-list of keys instead (see `ALLOWED_KEYS`), and the numbers that
 * can be told apart (`expected`, the absolute tolerance, an unreachable range maximum) are here too.
 */
export const CANARY = {
  mcHint1: 'CANARY-MC-HINT-ONE',
  mcHint2: 'CANARY-MC-HINT-TWO',
  mcExplanation: 'CANARY-MC-EXPLANATION',
  mcFeedbackRight: 'CANARY-MC-FEEDBACK-RIGHT',
  mcFeedbackWrong: 'CANARY-MC-FEEDBACK-WRONG',
  mcFeedbackOther: 'CANARY-MC-FEEDBACK-OTHER',
  numHint: 'CANARY-NUM-HINT',
  numExplanation: 'CANARY-NUM-EXPLANATION',
  numExpectedFormula: 'mu0*N*I/(2*a)',
  numDistractorFormula: 'mu0*N*I/(4*a)',
  numDistractorFeedback: 'CANARY-NUM-DISTRACTOR-FEEDBACK',
  numRangeMax: '14.37',
  fixedExpected: '73.91',
  fixedAbsoluteTolerance: '0.0731',
  fixedHint: 'CANARY-FIXED-HINT',
  fixedExplanation: 'CANARY-FIXED-EXPLANATION',
  shortAccepted1: 'CANARY-SHORT-ACCEPTED-ONE',
  shortAccepted2: 'CANARY-SHORT-ACCEPTED-TWO',
  shortHint: 'CANARY-SHORT-HINT',
  shortExplanation: 'CANARY-SHORT-EXPLANATION',
  signSetHint: 'CANARY-SIGN-SET-HINT',
  signSetExplanation: 'CANARY-SIGN-SET-EXPLANATION',
  signGeoHint: 'CANARY-SIGN-GEO-HINT',
  signGeoExplanation: 'CANARY-SIGN-GEO-EXPLANATION',
  predChoicesReveal: 'CANARY-PRED-CHOICES-REVEAL',
  predChoicesExplanation: 'CANARY-PRED-CHOICES-EXPLANATION',
  predChoicesHint: 'CANARY-PRED-CHOICES-HINT',
  predTextReveal: 'CANARY-PRED-TEXT-REVEAL',
  predTextExplanation: 'CANARY-PRED-TEXT-EXPLANATION',
} as const;

export const CANARY_KEYS = {
  choice: 'canarychoice',
  numeric: 'canarynumeric',
  fixed: 'canaryfixed',
  short: 'canaryshort',
  signSet: 'canarysignset',
  signGeo: 'canarysigngeo',
  predChoices: 'canarypredchoice',
  predText: 'canarypredtext',
  equation: 'canaryequation',
  note: 'canarynote',
} as const;

const base = (kind: Checkpoint['kind'], key: string, atMs: number) => ({ ...newCheckpoint(kind, atMs), key });

export function canaryContent(): LessonContent {
  const choice: Checkpoint = {
    ...(base('multiple-choice', CANARY_KEYS.choice, 500) as Extract<Checkpoint, { kind: 'multiple-choice' }>),
    prompt: 'Which way does the needle turn when the switch closes?',
    attempts: 3,
    hints: [CANARY.mcHint1, CANARY.mcHint2],
    explanation: CANARY.mcExplanation,
    shuffle: true,
    options: [
      { id: 'right', text: 'Clockwise', correct: true, feedback: CANARY.mcFeedbackRight },
      { id: 'wrong', text: 'Anticlockwise', correct: false, feedback: CANARY.mcFeedbackWrong },
      { id: 'other', text: 'It does not move', correct: false, feedback: CANARY.mcFeedbackOther },
    ],
  };
  const numeric: Checkpoint = {
    ...(base('numeric', CANARY_KEYS.numeric, 1500) as Extract<Checkpoint, { kind: 'numeric' }>),
    prompt: 'A flat coil of {{N}} turns and radius {{a}} carries {{I}}. What is the field at its centre?',
    expected: CANARY.numExpectedFormula,
    askedUnit: 'uT',
    variables: [
      // 10 to 14 in steps of 1: the maximum as written is never drawn.
      { name: 'N', min: 10, max: Number(CANARY.numRangeMax), step: 1, unit: '', role: 'turns' },
      { name: 'a', min: 4, max: 6, step: 0.5, unit: 'cm', role: 'radius' },
      { name: 'I', min: 1, max: 2, step: 0.5, unit: 'A', role: 'none' },
    ],
    relativeTolerancePercent: 2.5,
    absoluteTolerance: null,
    sigFigs: { min: 2, max: 4, penalty: 0.25 },
    hints: [CANARY.numHint],
    explanation: CANARY.numExplanation,
    distractors: [{ id: 'quarter', formula: CANARY.numDistractorFormula, feedback: CANARY.numDistractorFeedback }],
  };
  const fixed: Checkpoint = {
    ...(base('numeric', CANARY_KEYS.fixed, 2500) as Extract<Checkpoint, { kind: 'numeric' }>),
    prompt: 'What field does the probe read?',
    expected: `${CANARY.fixedExpected} uT`,
    askedUnit: 'uT',
    relativeTolerancePercent: null,
    absoluteTolerance: `${CANARY.fixedAbsoluteTolerance} uT`,
    attempts: 2,
    hints: [CANARY.fixedHint],
    explanation: CANARY.fixedExplanation,
  };
  const short: Checkpoint = {
    ...(base('short-text', CANARY_KEYS.short, 3500) as Extract<Checkpoint, { kind: 'short-text' }>),
    prompt: 'Name the rule that gives the field direction.',
    accepted: [CANARY.shortAccepted1, CANARY.shortAccepted2],
    hints: [CANARY.shortHint],
    explanation: CANARY.shortExplanation,
  };
  const signSet: Checkpoint = {
    ...(base('sign', CANARY_KEYS.signSet, 4500) as Extract<Checkpoint, { kind: 'sign' }>),
    prompt: 'Is the field at the centre into or out of the page?',
    choiceSet: 'page',
    answer: { source: 'set', choice: 'into' },
    attempts: 2,
    hints: [CANARY.signSetHint],
    explanation: CANARY.signSetExplanation,
  };
  const signGeo: Checkpoint = {
    ...(base('sign', CANARY_KEYS.signGeo, 5500) as Extract<Checkpoint, { kind: 'sign' }>),
    prompt: 'Which way is the field at the marked point?',
    choiceSet: 'page',
    answer: {
      source: 'geometry',
      geometry: {
        conductor: { shape: 'loop', center: [0, 0, 0], radius: 0.05, axis: 'z', current: 'anticlockwise' },
        point: [0, 0, 0],
        component: 'z',
      },
    },
    attempts: 2,
    hints: [CANARY.signGeoHint],
    explanation: CANARY.signGeoExplanation,
  };
  const predChoices: Checkpoint = {
    ...(base('prediction', CANARY_KEYS.predChoices, 6500) as Extract<Checkpoint, { kind: 'prediction' }>),
    prompt: 'What will the needle do when the current doubles?',
    response: {
      mode: 'choices',
      options: [
        { id: 'more', text: 'Turn further' },
        { id: 'same', text: 'Stay where it is' },
      ],
      correctOptionId: 'more',
    },
    revealAtMs: 9000,
    revealText: CANARY.predChoicesReveal,
    explanation: CANARY.predChoicesExplanation,
    hints: [CANARY.predChoicesHint],
    scored: true,
    points: 1,
  };
  const predText: Checkpoint = {
    ...(base('prediction', CANARY_KEYS.predText, 7500) as Extract<Checkpoint, { kind: 'prediction' }>),
    prompt: 'Describe what you expect to see.',
    response: { mode: 'text' },
    revealAtMs: 10_000,
    revealText: CANARY.predTextReveal,
    explanation: CANARY.predTextExplanation,
    required: false,
  };
  const equation: Checkpoint = {
    ...(base('equation', CANARY_KEYS.equation, 8500) as Extract<Checkpoint, { kind: 'equation' }>),
    latex: 'B = \\frac{\\mu_0 N I}{2a}',
    caption: 'The field at the centre of a flat coil.',
    model: defaultLiveModel('coil-on-axis'),
  };
  const note: Checkpoint = {
    ...(base('note', CANARY_KEYS.note, 11_000) as Extract<Checkpoint, { kind: 'note' }>),
    tone: 'safety',
    body: 'Switch the supply off between readings: the coil warms up.',
  };
  return {
    settings: {
      title: 'Field of a flat coil (canary test)',
      description: 'Every kind of checkpoint, each hidden field marked.',
      tags: ['coils'],
      level: 'Year 12',
      safetyNotes: 'Keep the current low; a coil shorted across a cell heats quickly. Follow your school’s rules.',
      minSpacingMs: 500,
    },
    chapters: [
      { ...newChapter(0, 6000), key: 'chapterfirst', title: 'Set-up' },
      { ...newChapter(6000, 12_000), key: 'chaptersecond', title: 'Predict and observe' },
    ],
    checkpoints: [choice, numeric, fixed, short, signSet, signGeo, predChoices, predText, equation, note],
  };
}

/** The only keys a student view's checkpoint of each kind may carry (the allow-list of core/contracts). */
export const ALLOWED_KEYS: Record<Checkpoint['kind'], string[]> = {
  'multiple-choice': [
    'key',
    'atMs',
    'label',
    'behaviour',
    'required',
    'points',
    'attempts',
    'hintCount',
    'kind',
    'prompt',
    'options',
    'allowSeveral',
  ],
  numeric: [
    'key',
    'atMs',
    'label',
    'behaviour',
    'required',
    'points',
    'attempts',
    'hintCount',
    'kind',
    'prompt',
    'askedUnit',
    'dimension',
    'values',
  ],
  'short-text': ['key', 'atMs', 'label', 'behaviour', 'required', 'points', 'attempts', 'hintCount', 'kind', 'prompt'],
  sign: [
    'key',
    'atMs',
    'label',
    'behaviour',
    'required',
    'points',
    'attempts',
    'hintCount',
    'kind',
    'prompt',
    'choiceSet',
    'choices',
    'figure',
  ],
  prediction: [
    'key',
    'atMs',
    'label',
    'behaviour',
    'required',
    'points',
    'attempts',
    'hintCount',
    'kind',
    'prompt',
    'options',
    'revealAtMs',
    'askExplanation',
    'scored',
  ],
  equation: ['key', 'atMs', 'label', 'behaviour', 'kind', 'latex', 'caption', 'model'],
  note: ['key', 'atMs', 'label', 'behaviour', 'kind', 'tone', 'body'],
};

/** Every canary found in a body (text of any type), by name. */
export function canariesIn(body: string): string[] {
  return Object.entries(CANARY)
    .filter(([, canary]) => body.includes(canary))
    .map(([name]) => name);
}
