import type { AssignmentUpdate } from '@core/contracts';
import { localToInstant } from '@core/assignments';
import { ValidationError } from '../../errors';
import type { AssignmentSettings } from './assignments.repository';

function instant(local: string, timeZone: string, path: string): Date {
  try {
    return localToInstant(local, timeZone);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    throw new ValidationError(`${path}: ${error.message}`, [{ path, message: error.message }]);
  }
}

function refuse(path: string, message: string): never {
  throw new ValidationError(`${path}: ${message}`, [{ path, message }]);
}

/**
 * The form's wall-clock dates as instants in the school's zone. The contract already orders the
 * typed times; two times that the clocks' change makes the same moment are refused here.
 */
export function settingsOf(input: AssignmentUpdate, timeZone: string): AssignmentSettings {
  const opensAt = instant(input.opensAt, timeZone, 'opensAt');
  const dueAt = instant(input.dueAt, timeZone, 'dueAt');
  const lateUntil = input.lateUntil === null ? null : instant(input.lateUntil, timeZone, 'lateUntil');
  if (dueAt <= opensAt) {
    refuse('dueAt', `In ${timeZone}, ${input.dueAt} is no later than ${input.opensAt} once the clocks change: choose a later due time.`);
  }
  if (lateUntil !== null && lateUntil <= dueAt) {
    refuse('lateUntil', `In ${timeZone}, ${input.lateUntil} is no later than ${input.dueAt} once the clocks change: choose a later time.`);
  }
  return { opensAt, dueAt, lateUntil, feedback: input.feedback, reveal: input.reveal, completionWatchShare: input.completionWatchShare };
}
