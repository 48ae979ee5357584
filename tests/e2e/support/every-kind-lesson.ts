import type { CheckpointOf, LessonContent } from '@core/contracts';
import { defaultLiveModel, suggestCautions } from '@core/lessons';
import type { RecordingFacts } from './lessons';

/**
 * An invented lesson on 'Demo: magnet through a copper tube' (10 s, 24 fps) with one checkpoint of
 * every kind and every behaviour, for the watch page's browser tests. Pins sit 0.8 s apart and off
 * the frame grid (a frame is 41.7 ms), so "stopped within a frame of the pin" is a real check.
 */
export const EVERY_KIND_RECORDING = 'Demo: magnet through a copper tube';

/** Frames per second of the demo recordings (api/src/seed/steps/002-demo-media.ts). */
export const DEMO_FPS = 24;

export const KEYS = {
  note: 'wnote00001',
  choice: 'wmchoice01',
  numeric: 'wnumeric01',
  equation: 'wequation1',
  sign: 'wsign00001',
  shortText: 'wshorttxt1',
  prediction: 'wpredict01',
} as const;

export const AT = {
  note: 600,
  choice: 1400,
  numeric: 2200,
  equation: 3000,
  sign: 3800,
  shortText: 4600,
  prediction: 5400,
  reveal: 8000,
} as const;

/** What the tests click and type: option texts, the right and a wrong answer where they are fixed. */
export const ANSWERS = {
  choiceRight: 'Currents induced in the copper push back on the magnet',
  choiceWrong: 'Air trapped in the tube cushions it',
  choiceWrongFeedback: 'The tube is open at both ends, so the air escapes.',
  choiceHint: 'What does a moving magnet do to a nearby conductor?',
  numericHints: ['Write the radius in metres before you divide.', 'At the centre of a flat coil, B = μ0NI/(2a).'],
  signRight: 'Out of the page',
  shortTextRight: 'Eddy currents',
  predictionChoice: 'Keep about the same speed',
  revealText: 'It keeps about the same speed: the braking force grows with speed until it balances the weight.',
} as const;

const answered = (points: number, attempts: number, hints: string[], explanation: string) => ({
  required: true,
  points,
  attempts,
  hints,
  explanation,
});

export function everyKindLesson(title: string, recording: RecordingFacts): LessonContent {
  const text = {
    title,
    description: 'A strong magnet drifts down a copper tube. An invented lesson for the browser tests, one checkpoint of every kind.',
    tags: ['e2e', 'magnets', 'eddy currents'],
    level: 'Test lesson',
  };
  const safetyNotes = suggestCautions(text)
    .map((c) => c.text)
    .join('\n\n');
  const note: CheckpointOf<'note'> = {
    key: KEYS.note,
    atMs: AT.note,
    label: 'Watch the magnet',
    behaviour: 'aside',
    kind: 'note',
    tone: 'remark',
    body: 'Compare how slowly the magnet moves with a stone dropped from the same height.',
  };
  const choice: CheckpointOf<'multiple-choice'> = {
    key: KEYS.choice,
    atMs: AT.choice,
    label: 'Why so slow?',
    behaviour: 'gate',
    kind: 'multiple-choice',
    ...answered(1, 2, [ANSWERS.choiceHint], 'The moving field induces eddy currents round the tube; their field opposes the motion.'),
    prompt: 'Copper is not attracted to magnets. Why does the tube slow the magnet down?',
    options: [
      { id: 'a', text: ANSWERS.choiceRight, correct: true, feedback: 'Right: the induced currents oppose the change that drives them.' },
      { id: 'b', text: ANSWERS.choiceWrong, correct: false, feedback: ANSWERS.choiceWrongFeedback },
      { id: 'c', text: 'The copper is weakly magnetised', correct: false, feedback: 'A magnet does not stick to copper.' },
      { id: 'd', text: 'Friction with the walls', correct: false, feedback: 'The magnet barely touches the walls.' },
    ],
    allowSeveral: false,
    shuffle: true,
  };
  const numeric: CheckpointOf<'numeric'> = {
    key: KEYS.numeric,
    atMs: AT.numeric,
    label: 'Field of one ring',
    behaviour: 'gate',
    kind: 'numeric',
    ...answered(2, 3, [...ANSWERS.numericHints], 'B = μ0NI/(2a) with a in metres.'),
    prompt:
      'Model one ring of the tube as a flat coil of {{N}} turns and radius {{a}} carrying {{I}}. ' +
      'What is the magnetic field at its centre? Give it in µT.',
    expected: 'mu0*N*I/(2*a)',
    askedUnit: 'uT',
    variables: [
      { name: 'N', min: 10, max: 30, step: 10, unit: '', role: 'turns' },
      { name: 'a', min: 2, max: 4, step: 0.5, unit: 'cm', role: 'radius' },
      { name: 'I', min: 0.5, max: 2, step: 0.5, unit: 'A', role: 'none' },
    ],
    relativeTolerancePercent: 2,
    absoluteTolerance: null,
    sigFigs: null,
    requireUnit: true,
    distractors: [],
  };
  const equation: CheckpointOf<'equation'> = {
    key: KEYS.equation,
    atMs: AT.equation,
    label: 'Field on the axis',
    behaviour: 'pause',
    kind: 'equation',
    latex: 'B = \\frac{\\mu_0 N I a^2}{2\\left(a^2 + z^2\\right)^{3/2}}',
    caption: 'The field of one ring on its axis, a distance $z$ from its centre. Move the sliders to see how fast it falls off.',
    model: defaultLiveModel('coil-on-axis'),
  };
  const sign: CheckpointOf<'sign'> = {
    key: KEYS.sign,
    atMs: AT.sign,
    label: 'Direction at the centre',
    behaviour: 'pause',
    kind: 'sign',
    ...answered(1, 1, [], 'Curl the fingers of your right hand with the current: your thumb points out of the page.'),
    prompt:
      'Seen from above ($z$ out of the page), the current induced in one ring flows anticlockwise. ' +
      'Does the field at the centre of the ring point into or out of the page?',
    choiceSet: 'page',
    answer: {
      source: 'geometry',
      geometry: {
        conductor: { shape: 'loop', center: [0, 0, 0], radius: 0.03, axis: 'z', current: 'anticlockwise' },
        point: [0, 0, 0],
        component: 'z',
      },
    },
  };
  const shortText: CheckpointOf<'short-text'> = {
    key: KEYS.shortText,
    atMs: AT.shortText,
    label: 'Name the currents',
    behaviour: 'gate',
    kind: 'short-text',
    ...answered(1, 2, ['They swirl round inside the copper like water round a stone.'], 'They are called eddy currents.'),
    prompt: 'What are the currents induced in the copper tube called? (two words)',
    accepted: ['eddy currents', 'eddy current'],
    caseSensitive: false,
    spacing: 'collapse',
  };
  const prediction: CheckpointOf<'prediction'> = {
    key: KEYS.prediction,
    atMs: AT.prediction,
    label: 'Predict: further down',
    behaviour: 'gate',
    kind: 'prediction',
    ...answered(0, 1, [], ''),
    prompt: 'The magnet keeps falling. Before it reaches the bottom, will it speed up, keep the same speed or slow down?',
    response: {
      mode: 'choices',
      options: [
        { id: 'a', text: 'Speed up' },
        { id: 'b', text: ANSWERS.predictionChoice },
        { id: 'c', text: 'Slow down and stop' },
      ],
      correctOptionId: 'b',
    },
    revealAtMs: AT.reveal,
    revealText: ANSWERS.revealText,
    askExplanation: true,
    scored: false,
  };
  return {
    settings: { ...text, safetyNotes, minSpacingMs: 500 },
    chapters: [
      { key: 'wchapter01', title: 'Let go', startMs: 0, endMs: 4000 },
      { key: 'wchapter02', title: 'The steady fall', startMs: 4000, endMs: recording.durationMs },
    ],
    checkpoints: [note, choice, numeric, equation, sign, shortText, prediction],
  };
}
