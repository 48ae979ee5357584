import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError, type ApiErrorDetail } from './api-client';

/** The closest form field for an API detail path: `roles.0` lands on `roles`, `email` on `email`. */
export function fieldForPath<T extends string>(path: string, fields: readonly T[]): T | undefined {
  const segments = path.split('.');
  for (let length = segments.length; length > 0; length -= 1) {
    const candidate = segments.slice(0, length).join('.');
    const match = fields.find((field) => field === candidate);
    if (match) return match;
  }
  return undefined;
}

export type ServerErrorResult = { bannerMessage: string | null; unplaced: ApiErrorDetail[] };

/**
 * Puts the API's per-field messages next to the form's fields. What cannot be placed on a field comes back
 * for a banner. `fallbackField` takes the message of an error without details (e.g. a 409 about the e-mail).
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
  fallbackField?: Path<T>,
): ServerErrorResult {
  if (!isApiError(error)) {
    return { bannerMessage: 'Something went wrong while sending the form. Try again.', unplaced: [] };
  }
  const unplaced: ApiErrorDetail[] = [];
  let placed = 0;
  for (const detail of error.details) {
    const field = fieldForPath(detail.path, fields);
    if (field) {
      setError(field, { type: 'server', message: detail.message }, { shouldFocus: placed === 0 });
      placed += 1;
    } else {
      unplaced.push(detail);
    }
  }
  if (error.details.length === 0 && fallbackField && error.status >= 400 && error.status < 500 && ![401, 403, 429].includes(error.status)) {
    setError(fallbackField, { type: 'server', message: error.message }, { shouldFocus: true });
    return { bannerMessage: null, unplaced };
  }
  if (placed > 0 && unplaced.length === 0) return { bannerMessage: null, unplaced };
  return { bannerMessage: error.message, unplaced };
}
