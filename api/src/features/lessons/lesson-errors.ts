import type { ErrorRequestHandler } from 'express';
import type { z } from 'zod';
import type { EditConflictDetailsSchema } from '@core/contracts';

export type EditConflictDetails = z.infer<typeof EditConflictDetailsSchema>;

/**
 * 409 edit_conflict: another save (another tab, or a colleague admin) came first. Its details are
 * an object, not the field list AppError carries, so the lessons router answers it itself.
 */
export class EditConflictError extends Error {
  readonly status = 409;
  readonly code = 'edit_conflict';

  constructor(readonly details: EditConflictDetails) {
    super(
      `This lesson was saved ${details.savedBy ? `by ${details.savedBy} ` : ''}after your edit started (it is now at revision ${details.revision}), so your edit was not saved over it. Reload the lesson to see the newer save, then make your change again.`,
    );
    this.name = 'EditConflictError';
  }
}

/** Answers an EditConflictError with its details; every other error goes on to the app's handler. */
export const editConflictHandler: ErrorRequestHandler = (error: unknown, _req, res, next) => {
  if (!(error instanceof EditConflictError)) return next(error);
  res.status(error.status).json({ error: { code: error.code, message: error.message, details: error.details } });
};
