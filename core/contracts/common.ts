import { z } from 'zod';
import { LIMITS } from '../limits';

/** An e-mail address, trimmed and lower-cased so it compares equal however it was typed. */
export const EmailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(LIMITS.emailMax, { error: `An e-mail address has at most ${LIMITS.emailMax} characters.` })
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@school.example.' }));

export const PersonNameSchema = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, { error: 'Enter a name.' })
  .max(LIMITS.nameMax, { error: `A name has at most ${LIMITS.nameMax} characters.` });

export const IdSchema = z.uuid({ error: 'Expected an id (a UUID).' });

/** The error body every API failure returns. */
export const ApiErrorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    // Per-field problems; an error with facts of its own (a 409 edit_conflict's revision) sends an object, read by its caller.
    details: z
      .union([z.array(z.object({ path: z.string(), message: z.string() })), z.record(z.string(), z.unknown()).transform(() => [])])
      .optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof ApiErrorBodySchema>;

/** A message-only response, used where the API must not reveal more (sign-in requests). */
export const NoticeDtoSchema = z.object({ message: z.string() });
export type NoticeDto = z.infer<typeof NoticeDtoSchema>;
