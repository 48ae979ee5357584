import { z } from 'zod';
import { LIMITS } from '../limits';
import {
  BehaviourSchema,
  ChapterSchema,
  CheckpointKeySchema,
  LiveModelSchema,
  LocalIdSchema,
  SignChoiceSetSchema,
  SignGeometrySchema,
} from './checkpoints';

/**
 * What the student player receives: checkpoints without answer keys, expected values, option
 * correctness, per-option feedback, distractors, hints or explanations. Numeric prompts arrive with
 * this student's drawn values filled in. Built on the server by toStudentView(); the preview and
 * the watch page both use it.
 */

const base = {
  key: CheckpointKeySchema,
  atMs: z.number().int(),
  label: z.string(),
  behaviour: BehaviourSchema,
};
const answered = { required: z.boolean(), points: z.number(), attempts: z.number().int(), hintCount: z.number().int() };

export const StudentCheckpointSchema = z.discriminatedUnion('kind', [
  z.object({
    ...base,
    ...answered,
    kind: z.literal('multiple-choice'),
    prompt: z.string(),
    /** In this student's order when the teacher asked for shuffling. */
    options: z.array(z.object({ id: LocalIdSchema, text: z.string() })),
    allowSeveral: z.boolean(),
  }),
  z.object({
    ...base,
    ...answered,
    kind: z.literal('numeric'),
    /** Placeholders replaced by this student's values ('a = 4.5 cm'). */
    prompt: z.string(),
    askedUnit: z.string(),
    /** The asked unit's dimension ('magnetic-field'): the input checks what is typed before sending. */
    dimension: z.string(),
    /** This student's drawn values as written in the prompt, by variable name ('4.5 cm'). */
    values: z.record(z.string(), z.string()),
  }),
  z.object({ ...base, ...answered, kind: z.literal('short-text'), prompt: z.string() }),
  z.object({
    ...base,
    ...answered,
    kind: z.literal('sign'),
    prompt: z.string(),
    choiceSet: SignChoiceSetSchema,
    choices: z.array(z.string()),
    /** The set-up drawn beside the question (conductor, current sense, point); never the field. */
    figure: SignGeometrySchema.nullable(),
  }),
  z.object({
    ...base,
    ...answered,
    kind: z.literal('prediction'),
    prompt: z.string(),
    options: z.array(z.object({ id: LocalIdSchema, text: z.string() })).nullable(),
    revealAtMs: z.number().int(),
    askExplanation: z.boolean(),
    scored: z.boolean(),
  }),
  z.object({ ...base, kind: z.literal('equation'), latex: z.string(), caption: z.string(), model: LiveModelSchema.nullable() }),
  z.object({ ...base, kind: z.literal('note'), tone: z.enum(['remark', 'safety']), body: z.string() }),
]);
export type StudentCheckpoint = z.infer<typeof StudentCheckpointSchema>;

export const StudentLessonViewSchema = z.object({
  title: z.string(),
  /** The school's BCP 47 locale: answers are read with its decimal sign, and the input reads them the same way. */
  locale: z.string(),
  safetyNotes: z.string(),
  chapters: z.array(ChapterSchema),
  /** Sorted by time. */
  checkpoints: z.array(StudentCheckpointSchema),
});
export type StudentLessonView = z.infer<typeof StudentLessonViewSchema>;

// ---- answers ---------------------------------------------------------------------------------

const answerText = z.string().max(LIMITS.answerTextMax, { error: `An answer has at most ${LIMITS.answerTextMax} characters.` });

export const CheckpointAnswerSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('multiple-choice'), optionIds: z.array(LocalIdSchema).max(LIMITS.optionsMax) }),
  z.object({ kind: z.literal('numeric'), text: answerText }),
  z.object({ kind: z.literal('short-text'), text: answerText }),
  z.object({ kind: z.literal('sign'), choice: z.string().max(20) }),
  /** At the pin: optionId or text. At the reveal: the same prediction plus an optional explanation. */
  z.object({
    kind: z.literal('prediction'),
    optionId: LocalIdSchema.nullable(),
    text: answerText.nullable(),
    explanation: z.string().max(LIMITS.promptMax).nullable(),
  }),
]);
export type CheckpointAnswer = z.infer<typeof CheckpointAnswerSchema>;

/** The preview's answer request: the attempt number decides hints and the reveal; nothing is stored. */
export const PreviewAnswerSchema = z.object({
  attempt: z.number().int().min(1).max(LIMITS.attemptsMax),
  answer: CheckpointAnswerSchema,
});
export type PreviewAnswer = z.infer<typeof PreviewAnswerSchema>;

/** What the player shows after an answer. */
export const CheckpointGradeDtoSchema = z.object({
  /** null for an unscored prediction. */
  correct: z.boolean().nullable(),
  /** 0 to 1. */
  score: z.number(),
  /** Markdown: the engine's sentence, the chosen option's or distractor's feedback. */
  feedback: z.string(),
  /** The typical slip found ('sign', 'power-of-ten', 'distractor:d1', …). */
  mistake: z.string().nullable(),
  /** A problem reading the answer (unit unknown, wrong dimension): the attempt is not used up. */
  invalid: z.boolean(),
  attemptsLeft: z.number().int(),
  /** Hints unlocked so far, in order. */
  hints: z.array(z.string()),
  /** Present once the student may see it: after the last attempt or a right answer. */
  reveal: z.object({ answer: z.string(), explanation: z.string() }).nullable(),
});
export type CheckpointGradeDto = z.infer<typeof CheckpointGradeDtoSchema>;
