import type { RequestHandler, Request } from 'express';
import type { z } from 'zod';
import { ValidationError } from '../errors';

/** Turns zod issues into the API's `details` list, with a one-line summary. */
export function toValidationError(error: z.ZodError, source: string): ValidationError {
  const details = error.issues.map((issue) => ({
    path: issue.path.length > 0 ? issue.path.join('.') : source,
    message: issue.message,
  }));
  const first = details[0];
  const summary =
    details.length === 1 && first
      ? first.path === source
        ? first.message
        : `${first.path}: ${first.message}`
      : `${details.length} fields need attention: ${details.map((d) => d.path).join(', ')}.`;
  return new ValidationError(summary, details);
}

/** Validates the JSON body against a contract schema and replaces it with the parsed value. */
export function validateBody(schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    const parsed = schema.safeParse(req.body ?? {});
    if (!parsed.success) return next(toValidationError(parsed.error, 'body'));
    req.body = parsed.data;
    next();
  };
}

/** Validates the query string; the parsed value is read back with `queryOf(res)`. */
export function validateQuery(schema: z.ZodType): RequestHandler {
  return (req, res, next) => {
    const parsed = schema.safeParse(req.query);
    if (!parsed.success) return next(toValidationError(parsed.error, 'query'));
    res.locals.query = parsed.data;
    next();
  };
}

/** Validates route parameters (ids), so a malformed id is a 400 rather than a database error. */
export function validateParams(schema: z.ZodType): RequestHandler {
  return (req, res, next) => {
    const parsed = schema.safeParse(req.params);
    if (!parsed.success) return next(toValidationError(parsed.error, 'params'));
    res.locals.params = parsed.data;
    next();
  };
}

/** The parsed body of a request that passed `validateBody(schema)`. */
export function bodyOf<S extends z.ZodType>(req: Request, _schema: S): z.infer<S> {
  return req.body as z.infer<S>;
}
