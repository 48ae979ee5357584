import { z } from 'zod';
import { LIMITS } from '../limits';
import { FeedbackPolicySchema, RevealPolicySchema } from './assignments';
import { IdSchema } from './common';
import { PlaybackDtoSchema } from './recordings';
import { CheckpointAnswerSchema, CheckpointGradeDtoSchema, StudentLessonViewSchema } from './student-checkpoints';

/**
 * The student side: home, the watch page, answers (recorded exactly once), viewing coverage and the
 * student's own results. Nothing here carries an answer key before the student has answered: the
 * grade in a reply is already cut down to what the assignment's feedback and reveal policies allow.
 */

export const STUDENT_ASSIGNMENT_STATES = ['upcoming', 'not-started', 'in-progress', 'done', 'late', 'closed'] as const;
export const StudentAssignmentStateSchema = z.enum(STUDENT_ASSIGNMENT_STATES);
export type StudentAssignmentState = z.infer<typeof StudentAssignmentStateSchema>;

const instant = z.string();

/** How far a student is: the completion rule is every required checkpoint answered and `watchShareNeeded` watched. */
export const CompletionDtoSchema = z.object({
  /** 0 to 1 of the recording's seconds. */
  watchedShare: z.number(),
  watchShareNeeded: z.number(),
  requiredAnswered: z.number().int(),
  requiredTotal: z.number().int(),
  done: z.boolean(),
  completedAt: instant.nullable(),
});
export type CompletionDto = z.infer<typeof CompletionDtoSchema>;

export const StudentAssignmentDtoSchema = z.object({
  id: IdSchema,
  lessonTitle: z.string(),
  className: z.string(),
  teacherName: z.string().nullable(),
  opensAt: instant,
  dueAt: instant,
  lateUntil: instant.nullable(),
  timeZone: z.string(),
  state: StudentAssignmentStateSchema,
  completion: CompletionDtoSchema,
  /** Assigned since the student last opened their home, and not opened yet. */
  isNew: z.boolean(),
  /** A teacher's correction changed one of this student's grades since they last looked at their results. */
  gradeUpdated: z.boolean(),
  posterUrl: z.string().nullable(),
});
export type StudentAssignmentDto = z.infer<typeof StudentAssignmentDtoSchema>;

export const StudentHomeDtoSchema = z.object({ assignments: z.array(StudentAssignmentDtoSchema), serverTime: instant });
export type StudentHomeDto = z.infer<typeof StudentHomeDtoSchema>;

/** What the player remembers of one checkpoint (the web AttemptBook's record), from the stored responses. */
export const WatchRecordSchema = z.object({
  used: z.number().int(),
  answer: CheckpointAnswerSchema.nullable(),
  grade: CheckpointGradeDtoSchema.nullable(),
});
export type WatchRecord = z.infer<typeof WatchRecordSchema>;

export const WatchAssignmentSchema = z.object({
  id: IdSchema,
  className: z.string(),
  dueAt: instant,
  lateUntil: instant.nullable(),
  timeZone: z.string(),
  feedback: FeedbackPolicySchema,
  reveal: RevealPolicySchema,
  state: StudentAssignmentStateSchema,
  /** Answers are accepted now (open, or late and late answers accepted). */
  accepting: z.boolean(),
});

export const WatchViewDtoSchema = z.object({
  assignment: WatchAssignmentSchema,
  /** The allow-listed student view, with this student's stored drawn values. */
  view: StudentLessonViewSchema,
  playback: PlaybackDtoSchema,
  /** By checkpoint key: attempts used and the last grade as the policies allow. */
  book: z.record(z.string(), WatchRecordSchema),
  progress: z.object({
    safetyAcknowledged: z.boolean(),
    /** Where the student stopped watching (ms); 0 when new or finished. */
    resumeMs: z.number().int(),
    completion: CompletionDtoSchema,
  }),
  /** The server's clock: the page keeps times in it (offset = serverTime − local time at reply). */
  serverTime: instant,
});
export type WatchViewDto = z.infer<typeof WatchViewDtoSchema>;

export const ResponseSubmitSchema = z.object({
  /** Made by the browser once per answer; a resend carries the same key. */
  idempotencyKey: z.uuid({ error: 'Expected an idempotency key (a UUID).' }),
  checkpointKey: z.string().min(1).max(64),
  answer: CheckpointAnswerSchema,
  /** When the student pressed submit, on the server's clock as the page last knew it. */
  answeredAt: z.iso.datetime({ offset: true, error: 'Expected the answer time as an ISO 8601 date-time.' }),
});
export type ResponseSubmit = z.infer<typeof ResponseSubmitSchema>;

export const ResponseResultDtoSchema = z.object({
  responseId: IdSchema.nullable(),
  /** The attempt this answer was recorded as; null for an answer the server could not read (not recorded). */
  attempt: z.number().int().nullable(),
  /** Cut down by the feedback and reveal policies. */
  grade: CheckpointGradeDtoSchema,
  /** Right/wrong is hidden by the feedback policy: the answer is saved and a new attempt replaces it. */
  feedbackHidden: z.boolean(),
  late: z.boolean(),
  /** Answered before the due time, arrived after it (within 24 hours). */
  sentAfterReconnecting: z.boolean(),
  recordedAt: instant.nullable(),
  serverTime: instant,
  completion: CompletionDtoSchema,
});
export type ResponseResultDto = z.infer<typeof ResponseResultDtoSchema>;

export const WatchIntervalSchema = z
  .object({ startMs: z.number().int().min(0), endMs: z.number().int().min(0) })
  .refine((value) => value.endMs >= value.startMs, { error: 'An interval ends after it starts.' });
export type WatchInterval = z.infer<typeof WatchIntervalSchema>;

export const ViewingReportSchema = z.object({
  intervals: z.array(WatchIntervalSchema).max(LIMITS.viewingIntervalsMax),
  /** Where the video is now (the resume point). */
  positionMs: z.number().int().min(0),
});
export type ViewingReport = z.infer<typeof ViewingReportSchema>;

/** The same report through navigator.sendBeacon, which cannot set headers: the CSRF token travels in the body. */
export const ViewingBeaconSchema = ViewingReportSchema.extend({ csrfToken: z.string().min(1).max(512) });
export type ViewingBeacon = z.infer<typeof ViewingBeaconSchema>;

export const ViewingResultDtoSchema = z.object({ completion: CompletionDtoSchema, serverTime: instant });
export type ViewingResultDto = z.infer<typeof ViewingResultDtoSchema>;

export const ResultAttemptDtoSchema = z.object({
  attempt: z.number().int(),
  /** The answer as the student gave it ('63 uT', 'B', 'into the page'). */
  answerText: z.string(),
  recordedAt: instant,
  late: z.boolean(),
  sentAfterReconnecting: z.boolean(),
});

export const ResultCheckpointDtoSchema = z.object({
  key: z.string(),
  label: z.string(),
  kind: z.enum(['multiple-choice', 'numeric', 'short-text', 'sign', 'prediction']),
  atMs: z.number().int(),
  prompt: z.string(),
  required: z.boolean(),
  points: z.number(),
  attempts: z.array(ResultAttemptDtoSchema),
  /** The latest grade of the latest attempt, when the feedback policy allows. */
  grade: z
    .object({ correct: z.boolean().nullable(), score: z.number(), feedback: z.string(), source: z.enum(['engine', 'regrade', 'teacher']) })
    .nullable(),
  /** When the reveal policy allows. */
  reveal: z.object({ answer: z.string(), explanation: z.string() }).nullable(),
  gradeUpdated: z.boolean(),
});
export type ResultCheckpointDto = z.infer<typeof ResultCheckpointDtoSchema>;

export const StudentResultsDtoSchema = z.object({
  assignment: WatchAssignmentSchema.extend({ lessonTitle: z.string() }),
  completion: CompletionDtoSchema,
  /** Points earned of points possible, when feedback is shown. */
  score: z.object({ earned: z.number(), possible: z.number() }).nullable(),
  checkpoints: z.array(ResultCheckpointDtoSchema),
});
export type StudentResultsDto = z.infer<typeof StudentResultsDtoSchema>;
