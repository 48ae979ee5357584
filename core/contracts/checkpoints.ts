import { z } from 'zod';
import { LIMITS } from '../limits';

/**
 * What a teacher pins on a recording. These shapes are the draft a studio saves, the snapshot a
 * published version freezes and the body of the lesson file; the student never receives them
 * (see student-checkpoints.ts). Hard limits live here; the rules a lesson must meet before it is
 * published (spacing, inside the recording, formulas evaluate, LaTeX parses) are lessonProblems().
 */

/** Stable across versions: results, variable draws and analytics follow a checkpoint by its key. */
export const CheckpointKeySchema = z
  .string({ error: 'Expected a checkpoint key.' })
  .regex(/^[a-z0-9]{6,32}$/, { error: 'A key has 6 to 32 lowercase letters and digits.' });

/** A short id inside a checkpoint (an option, a distractor). */
export const LocalIdSchema = z
  .string({ error: 'Expected an id.' })
  .regex(/^[a-z0-9]{1,32}$/, { error: 'An id has 1 to 32 lowercase letters and digits.' });

/** Markdown the teacher writes: raw HTML off, http(s) links only, inline $…$ math (rendered by KaTeX). */
export const markdown = (max: number, what: string) =>
  z.string({ error: `Expected ${what} as text.` }).max(max, { error: `${capitalise(what)} has at most ${max} characters.` });

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A variable name usable in formulas and as a {{name}} placeholder. */
export const VariableNameSchema = z
  .string({ error: 'Name the variable.' })
  .regex(/^[A-Za-z][A-Za-z0-9_]{0,19}$/, { error: 'A variable name starts with a letter and has letters, digits and _ (at most 20).' });

export const BEHAVIOURS = ['pause', 'gate', 'aside'] as const;
export const BehaviourSchema = z.enum(BEHAVIOURS, { error: 'Choose pause, gate or aside.' });
export type Behaviour = z.infer<typeof BehaviourSchema>;

export const CHECKPOINT_KINDS = ['multiple-choice', 'numeric', 'short-text', 'equation', 'sign', 'prediction', 'note'] as const;
export type CheckpointKind = (typeof CHECKPOINT_KINDS)[number];

const timeMs = (what: string) =>
  z
    .number({ error: `Expected ${what} in milliseconds.` })
    .int({ error: `${capitalise(what)} is a whole number of milliseconds.` })
    .min(0, {
      error: `${capitalise(what)} cannot be before the start of the recording.`,
    });

const base = {
  key: CheckpointKeySchema,
  atMs: timeMs('the time'),
  /** Shown on the timeline marker and in results; empty means "use the start of the prompt". */
  label: z
    .string()
    .trim()
    .max(LIMITS.checkpointLabelMax, { error: `A label has at most ${LIMITS.checkpointLabelMax} characters.` }),
  behaviour: BehaviourSchema,
};

/** Kinds a student answers: whether they must, what it is worth, and the help they get after a wrong try. */
const answered = {
  required: z.boolean(),
  points: z
    .number({ error: 'Expected points as a number.' })
    .min(0, { error: 'Points cannot be negative.' })
    .max(LIMITS.pointsMax, {
      error: `A checkpoint is worth at most ${LIMITS.pointsMax} points.`,
    }),
  attempts: z
    .number({ error: 'Expected the number of attempts.' })
    .int({ error: 'Attempts is a whole number.' })
    .min(1, { error: 'Allow at least one attempt.' })
    .max(LIMITS.attemptsMax, { error: `Allow at most ${LIMITS.attemptsMax} attempts.` }),
  /** Revealed one by one after each wrong attempt. */
  hints: z.array(markdown(LIMITS.feedbackMax, 'a hint')).max(LIMITS.hintsMax, { error: `At most ${LIMITS.hintsMax} hints.` }),
  /** Shown with the correct answer when the reveal policy allows. */
  explanation: markdown(LIMITS.feedbackMax, 'the explanation'),
};

const prompt = markdown(LIMITS.promptMax, 'the prompt');

// ---- question: multiple choice ---------------------------------------------------------------

export const ChoiceOptionSchema = z.object({
  id: LocalIdSchema,
  text: markdown(LIMITS.optionTextMax, 'an option'),
  correct: z.boolean(),
  /** Shown to a student who picked this option. */
  feedback: markdown(LIMITS.feedbackMax, 'the feedback'),
});
export type ChoiceOption = z.infer<typeof ChoiceOptionSchema>;

export const MultipleChoiceCheckpointSchema = z.object({
  ...base,
  ...answered,
  kind: z.literal('multiple-choice'),
  prompt,
  options: z.array(ChoiceOptionSchema).max(LIMITS.optionsMax, { error: `At most ${LIMITS.optionsMax} options.` }),
  /** Several options may be correct; the student ticks every right one. */
  allowSeveral: z.boolean(),
  /** Each student sees the options in their own order. */
  shuffle: z.boolean(),
});

// ---- question: numeric ----------------------------------------------------------------------

export const NumericVariableSchema = z.object({
  name: VariableNameSchema,
  min: z.number({ error: 'Expected the smallest value.' }),
  max: z.number({ error: 'Expected the largest value.' }),
  step: z.number({ error: 'Expected the step.' }).positive({ error: 'The step must be above zero.' }),
  /** The unit the range is given in and the student sees ('cm'); empty for a plain count. */
  unit: z.string().max(20),
  /** Which mistake checks may use it: a radius (diameter slip) or a number of turns (turns forgotten). */
  role: z.enum(['none', 'radius', 'turns']),
});
export type NumericVariable = z.infer<typeof NumericVariableSchema>;

export const DistractorSchema = z.object({
  id: LocalIdSchema,
  formula: z.string().max(LIMITS.formulaMax, { error: `A formula has at most ${LIMITS.formulaMax} characters.` }),
  feedback: markdown(LIMITS.feedbackMax, 'the feedback'),
});

export const NumericCheckpointSchema = z.object({
  ...base,
  ...answered,
  kind: z.literal('numeric'),
  /** May contain {{name}} for each declared variable: the student's drawn value with its unit. */
  prompt,
  /** A quantity ('62.8 uT') or a formula over the variables and constants ('mu0*N*I/(2*a)'). */
  expected: z.string().max(LIMITS.formulaMax, { error: `A formula has at most ${LIMITS.formulaMax} characters.` }),
  /** The unit the question asks in ('µT'); its dimension is what the answer must have. Empty: a plain number. */
  askedUnit: z.string().max(20),
  variables: z.array(NumericVariableSchema).max(LIMITS.variablesMax, { error: `At most ${LIMITS.variablesMax} variables.` }),
  /** Percent of the expected value; null with an absolute tolerance only. Default 2 % (common practice). */
  relativeTolerancePercent: z.number().min(0).max(100).nullable(),
  /** A quantity with the answer's dimension ('0.5 uT'), or null. An answer passes within either tolerance. */
  absoluteTolerance: z.string().max(40).nullable(),
  sigFigs: z
    .object({
      min: z.number().int().min(1).max(17),
      max: z.number().int().min(1).max(17),
      /** Share of the score taken off for the wrong number of figures, 0 to 1. */
      penalty: z.number().min(0).max(1),
    })
    .nullable(),
  /** When false a bare number is read in the expected unit. */
  requireUnit: z.boolean(),
  distractors: z.array(DistractorSchema).max(LIMITS.distractorsMax, { error: `At most ${LIMITS.distractorsMax} distractors.` }),
});

// ---- question: short text -------------------------------------------------------------------

export const SPACING_RULES = ['exact', 'collapse', 'ignore'] as const;

export const ShortTextCheckpointSchema = z.object({
  ...base,
  ...answered,
  kind: z.literal('short-text'),
  prompt,
  accepted: z
    .array(z.string().max(LIMITS.acceptedAnswerMax, { error: `An accepted answer has at most ${LIMITS.acceptedAnswerMax} characters.` }))
    .max(LIMITS.acceptedAnswersMax, { error: `At most ${LIMITS.acceptedAnswersMax} accepted answers.` }),
  caseSensitive: z.boolean(),
  /** exact: spaces as typed; collapse: runs of spaces count as one and ends are trimmed; ignore: no spaces count. */
  spacing: z.enum(SPACING_RULES),
});

// ---- equation card --------------------------------------------------------------------------

/** Field models a live equation card can run (core/lessons/models lists inputs, output and plot). */
export const MODEL_IDS = [
  'coil-on-axis',
  'helmholtz-on-axis',
  'solenoid-on-axis',
  'straight-wire',
  'dipole-on-axis',
  'needle-deflection',
] as const;
export const ModelIdSchema = z.enum(MODEL_IDS, { error: 'Choose one of the models.' });
export type ModelId = z.infer<typeof ModelIdSchema>;

export const ModelInputSchema = z.object({
  /** An input name of the chosen model. */
  name: VariableNameSchema,
  /** A slider for the student; otherwise fixed at `value`. */
  slider: z.boolean(),
  /** In the model input's display unit. */
  min: z.number(),
  max: z.number(),
  step: z.number().positive({ error: 'The step must be above zero.' }),
  value: z.number(),
});
export type ModelInput = z.infer<typeof ModelInputSchema>;

export const LiveModelSchema = z.object({
  modelId: ModelIdSchema,
  inputs: z.array(ModelInputSchema).max(LIMITS.modelInputsMax),
  /** The input swept along the plot's horizontal axis (e.g. z for field along the axis), or null for no plot. */
  plot: z.object({ input: VariableNameSchema, from: z.number(), to: z.number() }).nullable(),
});
export type LiveModel = z.infer<typeof LiveModelSchema>;

export const EquationCheckpointSchema = z.object({
  ...base,
  kind: z.literal('equation'),
  /** Display-mode LaTeX, rendered by KaTeX with trust off. */
  latex: z.string().max(LIMITS.latexMax, { error: `LaTeX has at most ${LIMITS.latexMax} characters.` }),
  caption: markdown(LIMITS.promptMax, 'the caption'),
  model: LiveModelSchema.nullable(),
});

// ---- check your sign ------------------------------------------------------------------------

/** The answer sets a student chooses from. */
export const SIGN_CHOICES = {
  sign: ['+', '-', '0'],
  axis: ['+x', '-x', '+y', '-y', '+z', '-z'],
  page: ['into', 'out'],
  rotation: ['clockwise', 'anticlockwise'],
} as const;
export type SignChoiceSet = keyof typeof SIGN_CHOICES;
export const SignChoiceSetSchema = z.enum(['sign', 'axis', 'page', 'rotation']);

const Vec3Schema = z.tuple([z.number(), z.number(), z.number()], { error: 'Expected a point as [x, y, z] in metres.' });
const AxisSchema = z.enum(['x', 'y', 'z']);

/**
 * A conductor and a field point, in metres; the page is the xy-plane seen from +z (x right, y up).
 * The engine derives the field direction there with the right-hand rule (Biot–Savart).
 */
export const SignGeometrySchema = z.object({
  conductor: z.discriminatedUnion('shape', [
    z.object({
      shape: z.literal('loop'),
      center: Vec3Schema,
      radius: z.number().positive({ error: 'The loop radius must be above zero.' }),
      /** The loop lies in the plane perpendicular to this axis. */
      axis: AxisSchema,
      /** Current sense as seen looking from the +axis side towards the loop. */
      current: z.enum(['clockwise', 'anticlockwise']),
    }),
    z.object({
      shape: z.literal('wire'),
      /** A long straight wire through `through`, parallel to `axis`. */
      through: Vec3Schema,
      axis: AxisSchema,
      /** Current flows towards + or − along the axis. */
      current: z.enum(['+', '-']),
    }),
  ]),
  point: Vec3Schema,
  /** For the sign choice set: the field component whose sign is asked. */
  component: AxisSchema,
});
export type SignGeometry = z.infer<typeof SignGeometrySchema>;

export const SignCheckpointSchema = z.object({
  ...base,
  ...answered,
  kind: z.literal('sign'),
  prompt,
  choiceSet: SignChoiceSetSchema,
  answer: z.discriminatedUnion('source', [
    z.object({ source: z.literal('set'), choice: z.string().max(20) }),
    z.object({ source: z.literal('geometry'), geometry: SignGeometrySchema }),
  ]),
});

// ---- prediction (predict–observe–explain) ---------------------------------------------------

export const PredictionCheckpointSchema = z.object({
  ...base,
  ...answered,
  kind: z.literal('prediction'),
  prompt,
  response: z.discriminatedUnion('mode', [
    z.object({
      mode: z.literal('choices'),
      options: z.array(z.object({ id: LocalIdSchema, text: markdown(LIMITS.optionTextMax, 'an option') })).max(LIMITS.optionsMax),
      /** Needed only when the prediction is scored. */
      correctOptionId: LocalIdSchema.nullable(),
    }),
    z.object({ mode: z.literal('text') }),
  ]),
  /** Later in the recording: the video pauses again beside the student's own prediction. */
  revealAtMs: timeMs('the reveal time'),
  /** What the student is shown at the reveal, beside their prediction. */
  revealText: markdown(LIMITS.promptMax, 'the reveal text'),
  /** Ask "explain the difference" at the reveal (optional for the student). */
  askExplanation: z.boolean(),
  /** Unscored unless the teacher turns it on (choices with a correct option only). */
  scored: z.boolean(),
});

// ---- note -----------------------------------------------------------------------------------

export const NoteCheckpointSchema = z.object({
  ...base,
  kind: z.literal('note'),
  tone: z.enum(['remark', 'safety']),
  body: markdown(LIMITS.promptMax, 'the note'),
});

export const CheckpointSchema = z.discriminatedUnion('kind', [
  MultipleChoiceCheckpointSchema,
  NumericCheckpointSchema,
  ShortTextCheckpointSchema,
  EquationCheckpointSchema,
  SignCheckpointSchema,
  PredictionCheckpointSchema,
  NoteCheckpointSchema,
]);
export type Checkpoint = z.infer<typeof CheckpointSchema>;
export type CheckpointOf<K extends CheckpointKind> = Extract<Checkpoint, { kind: K }>;

/** Kinds a student answers (and that can carry points). */
export const ANSWERED_KINDS = [
  'multiple-choice',
  'numeric',
  'short-text',
  'sign',
  'prediction',
] as const satisfies readonly CheckpointKind[];
export type AnsweredCheckpoint = CheckpointOf<(typeof ANSWERED_KINDS)[number]>;
export function isAnswered(checkpoint: Checkpoint): checkpoint is AnsweredCheckpoint {
  return (ANSWERED_KINDS as readonly string[]).includes(checkpoint.kind);
}

/** Names people read, on markers, in lists and in the kind picker. */
export const CHECKPOINT_KIND_LABELS: Record<CheckpointKind, string> = {
  'multiple-choice': 'Multiple choice',
  numeric: 'Numeric answer',
  'short-text': 'Short answer',
  equation: 'Equation card',
  sign: 'Check your sign',
  prediction: 'Prediction',
  note: 'Note',
};

export const BEHAVIOUR_LABELS: Record<Behaviour, string> = {
  pause: 'Pause (may skip)',
  gate: 'Gate (must answer)',
  aside: 'Aside (video keeps playing)',
};

// ---- chapters -------------------------------------------------------------------------------

export const ChapterSchema = z.object({
  key: CheckpointKeySchema,
  title: z
    .string()
    .trim()
    .max(LIMITS.chapterTitleMax, { error: `A chapter title has at most ${LIMITS.chapterTitleMax} characters.` }),
  startMs: timeMs('the chapter start'),
  endMs: timeMs('the chapter end'),
});
export type Chapter = z.infer<typeof ChapterSchema>;
