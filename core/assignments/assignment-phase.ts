import type { AssignmentPhase } from '../contracts/assignments';
import { LIMITS } from '../limits';
import { formatSchoolTime } from './local-time';

/** An assignment's dates as instants on the server's clock. */
export interface AssignmentDates {
  opensAt: Date;
  dueAt: Date;
  /** Late answers are accepted until then; null: none after the due time. */
  lateUntil: Date | null;
}

/** The last instant answers are accepted (an answer at exactly this time still counts). */
export function closesAt(dates: AssignmentDates): Date {
  return dates.lateUntil ?? dates.dueAt;
}

/** True once no answer made now can be accepted: strictly after the close time. */
export function isClosed(dates: AssignmentDates, now: Date): boolean {
  return now.getTime() > closesAt(dates).getTime();
}

/**
 * Where an assignment stands at `now`: 'upcoming' before it opens, 'open' until the due time (the
 * due instant itself is on time), 'late' while late answers are accepted, 'closed' after.
 */
export function assignmentPhase(dates: AssignmentDates, now: Date): AssignmentPhase {
  const t = now.getTime();
  if (t < dates.opensAt.getTime()) return 'upcoming';
  if (t <= dates.dueAt.getTime()) return 'open';
  if (dates.lateUntil !== null && t <= dates.lateUntil.getTime()) return 'late';
  return 'closed';
}

export type Acceptance =
  { ok: true; late: boolean; sentAfterReconnecting: boolean } | { ok: false; code: 'not_open' | 'closed'; message: string };

type Standing = 'early' | 'on-time' | 'late' | 'closed';

function standingAt(dates: AssignmentDates, t: number): Standing {
  if (t < dates.opensAt.getTime()) return 'early';
  if (t <= dates.dueAt.getTime()) return 'on-time';
  return t <= closesAt(dates).getTime() ? 'late' : 'closed';
}

/**
 * The time an answer counts as made. The client's `answeredAt` (on the server clock as the page
 * knew it) is believed when it is at most a day old on arrival (the offline grace), and never
 * later than the arrival: a client clock running ahead (skew) gains nothing, so no allowance is needed.
 */
export function effectiveAnswerTime(answeredAt: Date, receivedAt: Date): Date {
  const answered = answeredAt.getTime();
  const received = receivedAt.getTime();
  const believable = !Number.isNaN(answered) && received - answered <= LIMITS.offlineGraceMs;
  return new Date(believable ? Math.min(answered, received) : received);
}

/**
 * Whether the server takes an answer made at `answeredAt` that arrived at `receivedAt`. Accepted
 * from the opening until the close time (lateUntil, else the due time); late when made after the
 * due time. An answer made in time that arrives after the due or close time (queued offline, at
 * most a day) is accepted as made and marked `sentAfterReconnecting`. Refusals name the dates in
 * school time.
 */
export function acceptAnswer(dates: AssignmentDates, answeredAt: Date, receivedAt: Date, timeZone: string, locale: string): Acceptance {
  if (Number.isNaN(receivedAt.getTime())) throw new RangeError('The arrival time of an answer must be a valid date.');
  const made = effectiveAnswerTime(answeredAt, receivedAt).getTime();
  const standing = standingAt(dates, made);
  const when = (instant: Date) => formatSchoolTime(instant, timeZone, locale);
  if (standing === 'early') {
    return { ok: false, code: 'not_open', message: `This lesson opens for answers on ${when(dates.opensAt)}.` };
  }
  if (standing === 'closed') {
    const message =
      dates.lateUntil === null
        ? `This lesson was due on ${when(dates.dueAt)} and takes no late answers. Your results page still shows your answers.`
        : `Late answers for this lesson were accepted until ${when(dates.lateUntil)}. Your results page still shows your answers.`;
    return { ok: false, code: 'closed', message };
  }
  return {
    ok: true,
    late: standing === 'late',
    // The answer time, not the arrival, decided its standing.
    sentAfterReconnecting: standingAt(dates, receivedAt.getTime()) !== standing,
  };
}
