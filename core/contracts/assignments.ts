import { z } from 'zod';
import { IdSchema } from './common';

/**
 * Assignments: a published lesson version given to a class, with its dates and policies. Dates are
 * typed by the teacher as wall-clock times in the school's time zone ('2026-12-03T09:00') and sent
 * back as instants (ISO 8601 with offset) plus the zone, so every page shows them in school time.
 */

/** Whether right/wrong (and hints, per-answer feedback) is shown. */
export const FEEDBACK_POLICIES = ['immediately', 'after-due', 'never'] as const;
export const FeedbackPolicySchema = z.enum(FEEDBACK_POLICIES, { error: 'Choose when feedback is shown.' });
export type FeedbackPolicy = z.infer<typeof FeedbackPolicySchema>;

/** When the correct answer and explanation are shown; never while the student can still submit. */
export const REVEAL_POLICIES = ['after-last-attempt', 'after-due', 'never'] as const;
export const RevealPolicySchema = z.enum(REVEAL_POLICIES, { error: 'Choose when answers are revealed.' });
export type RevealPolicy = z.infer<typeof RevealPolicySchema>;

export const FEEDBACK_POLICY_LABELS: Record<FeedbackPolicy, string> = {
  immediately: 'Right after each answer',
  'after-due': 'After the due date',
  never: 'Never',
};
export const REVEAL_POLICY_LABELS: Record<RevealPolicy, string> = {
  'after-last-attempt': "After the student's last attempt",
  'after-due': 'After the due date',
  never: 'Never',
};

/** A wall-clock time in the school's zone, as an <input type="datetime-local"> gives it. */
export const LocalDateTimeSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, { error: 'Expected a date and time like 2026-12-03T09:00.' });

export const DEFAULT_COMPLETION_WATCH_SHARE = 0.9;

const policyFields = {
  opensAt: LocalDateTimeSchema,
  dueAt: LocalDateTimeSchema,
  /** Late answers are accepted until this time; null: no late answers. */
  lateUntil: LocalDateTimeSchema.nullable(),
  feedback: FeedbackPolicySchema,
  reveal: RevealPolicySchema,
  /** The share of the recording to watch (with every required checkpoint answered) to be done. */
  completionWatchShare: z
    .number({ error: 'Give the share of the recording to watch, from 0 to 100 %.' })
    .min(0, { error: 'The share to watch is at least 0 %.' })
    .max(1, { error: 'The share to watch is at most 100 %.' }),
};

function datesInOrder(value: { opensAt: string; dueAt: string; lateUntil: string | null }, ctx: z.RefinementCtx) {
  // Same-zone wall-clock strings of one fixed format compare as text.
  if (value.dueAt <= value.opensAt) ctx.addIssue({ code: 'custom', path: ['dueAt'], message: 'The due date is after the opening date.' });
  if (value.lateUntil !== null && value.lateUntil <= value.dueAt) {
    ctx.addIssue({ code: 'custom', path: ['lateUntil'], message: 'Late answers close after the due date.' });
  }
}

export const AssignmentCreateSchema = z
  .object({
    lessonId: IdSchema,
    versionNumber: z.number().int().min(1),
    classIds: z.array(IdSchema).min(1, { error: 'Choose at least one class.' }).max(50),
    ...policyFields,
  })
  .superRefine(datesInOrder);
export type AssignmentCreate = z.infer<typeof AssignmentCreateSchema>;

/** Dates and policies can change after assigning; the version changes only through a move. */
export const AssignmentUpdateSchema = z.object(policyFields).superRefine(datesInOrder);
export type AssignmentUpdate = z.infer<typeof AssignmentUpdateSchema>;

/** Move an assignment to a corrected version of the same lesson (same answerable checkpoint keys). */
export const AssignmentMoveSchema = z.object({ versionNumber: z.number().int().min(1) });
export type AssignmentMove = z.infer<typeof AssignmentMoveSchema>;

export const AssignmentListQuerySchema = z.object({
  classId: IdSchema.optional(),
  lessonId: IdSchema.optional(),
});
export type AssignmentListQuery = z.infer<typeof AssignmentListQuerySchema>;

const instant = z.string();

export const AssignmentDtoSchema = z.object({
  id: IdSchema,
  lesson: z.object({ id: IdSchema, title: z.string(), latestVersion: z.number().int().nullable() }),
  versionNumber: z.number().int(),
  class: z.object({ id: IdSchema, name: z.string() }),
  opensAt: instant,
  dueAt: instant,
  lateUntil: instant.nullable(),
  /** The school's IANA zone the dates were typed in. */
  timeZone: z.string(),
  feedback: FeedbackPolicySchema,
  reveal: RevealPolicySchema,
  completionWatchShare: z.number(),
  createdBy: z.object({ id: IdSchema, name: z.string() }),
  createdAt: instant,
  /** 'upcoming' before opensAt, 'open' until dueAt, 'late' while late answers are accepted, 'closed' after. */
  phase: z.enum(['upcoming', 'open', 'late', 'closed']),
  counts: z.object({ students: z.number().int(), started: z.number().int(), done: z.number().int() }),
  /** Caller may edit, move and delete it. */
  canManage: z.boolean(),
});
export type AssignmentDto = z.infer<typeof AssignmentDtoSchema>;
export type AssignmentPhase = AssignmentDto['phase'];

export const AssignmentListDtoSchema = z.object({ assignments: z.array(AssignmentDtoSchema) });
export type AssignmentListDto = z.infer<typeof AssignmentListDtoSchema>;

export const AssignmentCreatedDtoSchema = z.object({ assignments: z.array(AssignmentDtoSchema) });
export type AssignmentCreatedDto = z.infer<typeof AssignmentCreatedDtoSchema>;

/** What a move to a corrected version did. */
export const AssignmentMovedDtoSchema = z.object({
  assignment: AssignmentDtoSchema,
  fromVersion: z.number().int(),
  toVersion: z.number().int(),
  /** Answerable checkpoints whose content changed between the versions (regraded). */
  changedKeys: z.array(z.string()),
  responsesRegraded: z.number().int(),
  gradesChanged: z.number().int(),
  studentsAffected: z.number().int(),
});
export type AssignmentMovedDto = z.infer<typeof AssignmentMovedDtoSchema>;
