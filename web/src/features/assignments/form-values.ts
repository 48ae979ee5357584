import { z } from 'zod';
import {
  AssignmentCreateSchema,
  AssignmentUpdateSchema,
  DEFAULT_COMPLETION_WATCH_SHARE,
  FeedbackPolicySchema,
  RevealPolicySchema,
  type AssignmentDto,
} from '@core/contracts';
import { instantToLocal } from '@core/assignments/local-time';
import { defaultDates } from './school-time';

/**
 * The assignment forms hold what the inputs hold (datetime-local text, a late-answers checkbox, a percent
 * as typed); their schemas check that every field is filled in, then convert to the shared contract and let
 * it decide the rest (dates in order, the share's range), so the browser says what the API would say.
 * Field names match the contract's, so the API's error details land on the same fields.
 */

/** "90", "90 %", "87,5" → 90, 90, 87.5; null when the text is not a number of percent. */
export function parsePercent(text: string): number | null {
  const cleaned = text.trim().replace(/\s*%$/, '').replace(',', '.');
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(cleaned)) return null;
  return Number(cleaned);
}

/** 0.9 → "90", 0.875 → "87.5" (to a tenth of a percent, without float noise such as 90.00000000000001). */
export function sharePercentText(share: number): string {
  return String(Math.round(share * 1000) / 10);
}

const policyShape = {
  opensAt: z.string().min(1, { error: 'Choose the date and time the lesson opens.' }),
  dueAt: z.string().min(1, { error: 'Choose the date and time answers are due.' }),
  acceptLate: z.boolean(),
  lateUntil: z.string(),
  feedback: FeedbackPolicySchema,
  reveal: RevealPolicySchema,
  completionWatchShare: z.string(),
};

type PolicyShape = { acceptLate: boolean; lateUntil: string; completionWatchShare: string };

function filledIn(value: PolicyShape, ctx: z.RefinementCtx) {
  if (value.acceptLate && value.lateUntil === '') {
    ctx.addIssue({ code: 'custom', path: ['lateUntil'], message: 'Choose until when late answers are accepted, or untick late answers.' });
  }
  if (parsePercent(value.completionWatchShare) === null) {
    ctx.addIssue({ code: 'custom', path: ['completionWatchShare'], message: 'Type the share as a number of percent, like 90.' });
  }
}

function toPolicy(value: z.infer<z.ZodObject<typeof policyShape>>) {
  return {
    opensAt: value.opensAt,
    dueAt: value.dueAt,
    lateUntil: value.acceptLate ? value.lateUntil : null,
    feedback: value.feedback,
    reveal: value.reveal,
    // Percent in the form, a share from 0 to 1 in the contract; rounding drops float noise (87.5 → 0.875).
    completionWatchShare: Math.round((parsePercent(value.completionWatchShare) ?? Number.NaN) * 10) / 1000,
  };
}

const PolicyFormSchema = z.object(policyShape).superRefine(filledIn);

/** The edit form of an assignment: its dates and policies. */
export const EditFormSchema = PolicyFormSchema.transform(toPolicy).pipe(AssignmentUpdateSchema);
export type EditFormValues = z.input<typeof EditFormSchema>;

/** The assign form of a lesson: the version, the classes, then the same dates and policies. */
export function assignFormSchema(lessonId: string) {
  return z
    .object({ ...policyShape, versionNumber: z.string().min(1, { error: 'Choose a version.' }), classIds: z.array(z.string()) })
    .superRefine(filledIn)
    .transform((value) => ({ lessonId, versionNumber: Number(value.versionNumber), classIds: value.classIds, ...toPolicy(value) }))
    .pipe(AssignmentCreateSchema);
}
export type AssignFormValues = z.input<ReturnType<typeof assignFormSchema>>;

/** Every field the API's error details may name, for useContractForm. */
export const POLICY_FIELDS = ['opensAt', 'dueAt', 'lateUntil', 'feedback', 'reveal', 'completionWatchShare'] as const;
export const ASSIGN_FIELDS = ['versionNumber', 'classIds', ...POLICY_FIELDS] as const;

/** A new assignment: the newest version, opening now, due in a week at 17:00, feedback at once, 90 % to watch. */
export function newAssignValues(input: {
  newestVersion: number | null;
  classIds: string[];
  now: Date;
  timeZone: string;
}): AssignFormValues {
  const dates = defaultDates(input.now, input.timeZone);
  return {
    versionNumber: input.newestVersion === null ? '' : String(input.newestVersion),
    classIds: input.classIds,
    opensAt: dates.opensAt,
    dueAt: dates.dueAt,
    acceptLate: false,
    lateUntil: '',
    feedback: 'immediately',
    reveal: 'after-last-attempt',
    completionWatchShare: sharePercentText(DEFAULT_COMPLETION_WATCH_SHARE),
  };
}

/** The edit form filled in from a saved assignment, its instants as wall-clock times in its zone. */
export function editValuesOf(assignment: AssignmentDto): EditFormValues {
  const local = (iso: string) => instantToLocal(iso, assignment.timeZone);
  return {
    opensAt: local(assignment.opensAt),
    dueAt: local(assignment.dueAt),
    acceptLate: assignment.lateUntil !== null,
    lateUntil: assignment.lateUntil === null ? '' : local(assignment.lateUntil),
    feedback: assignment.feedback,
    reveal: assignment.reveal,
    completionWatchShare: sharePercentText(assignment.completionWatchShare),
  };
}
