import { createHash } from 'node:crypto';
import type { ResponseSubmit } from '@core/contracts';
import { canonicalJson } from '@core/lessons';

/**
 * What makes two submissions the same answer: everything but the idempotency key, for one
 * assignment. Canonical JSON, so key order in the body does not matter.
 */
export function requestHash(assignmentId: string, input: ResponseSubmit): string {
  const { idempotencyKey: _key, ...body } = input;
  return createHash('sha256')
    .update(canonicalJson({ assignmentId, ...body }))
    .digest('hex');
}
