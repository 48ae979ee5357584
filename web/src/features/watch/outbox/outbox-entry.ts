import { z } from 'zod';
import { IdSchema, ResponseSubmitSchema } from '@core/contracts';

/**
 * One answer kept on this device until the server has recorded it. Written before the first send,
 * deleted once a reply (recorded or refused for good) came back; tagged with the student, so it is
 * only ever sent under that student's session.
 */
export const OutboxEntrySchema = z.object({
  idempotencyKey: z.uuid(),
  userId: IdSchema,
  /** The school the student was acting in: the assignment belongs to it. */
  schoolId: IdSchema,
  assignmentId: IdSchema,
  /** The player's attempt number, so a grade that arrives later finds the answer it belongs to. */
  attempt: z.number().int().min(1),
  /** Local clock, ms: the order answers are sent in. */
  queuedAt: z.number(),
  body: ResponseSubmitSchema,
});
export type OutboxEntry = z.infer<typeof OutboxEntrySchema>;
