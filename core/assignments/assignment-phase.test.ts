import { describe, expect, it } from 'vitest';
import { acceptAnswer, assignmentPhase, closesAt, effectiveAnswerTime, isClosed, type AssignmentDates } from './assignment-phase';

// Hand-computed cases. December in Europe/London is GMT (= UTC), so school times read as the UTC
// times: opens Tue 1 Dec 09:00, due Thu 3 Dec 17:00, late answers until Sat 5 Dec 17:00.
const t = (iso: string) => new Date(iso);
const ms = (date: Date, delta: number) => new Date(date.getTime() + delta);
const HOUR = 3_600_000;
const opensAt = t('2026-12-01T09:00:00Z');
const dueAt = t('2026-12-03T17:00:00Z');
const lateUntil = t('2026-12-05T17:00:00Z');
const withLate: AssignmentDates = { opensAt, dueAt, lateUntil };
const noLate: AssignmentDates = { opensAt, dueAt, lateUntil: null };
const accept = (dates: AssignmentDates, answeredAt: Date, receivedAt: Date = answeredAt) =>
  acceptAnswer(dates, answeredAt, receivedAt, 'Europe/London', 'en-GB');
const onTime = { ok: true, late: false, sentAfterReconnecting: false };

describe('closesAt and assignmentPhase', () => {
  it('closes at the late limit, else at the due time', () => {
    expect(closesAt(withLate)).toEqual(lateUntil);
    expect(closesAt(noLate)).toEqual(dueAt);
  });

  it('moves through the phases at each edge (the edge instant itself belongs to the earlier phase from opening on)', () => {
    expect(assignmentPhase(withLate, ms(opensAt, -1))).toBe('upcoming');
    expect(assignmentPhase(withLate, opensAt)).toBe('open');
    expect(assignmentPhase(withLate, dueAt)).toBe('open');
    expect(assignmentPhase(withLate, ms(dueAt, 1))).toBe('late');
    expect(assignmentPhase(withLate, lateUntil)).toBe('late');
    expect(assignmentPhase(withLate, ms(lateUntil, 1))).toBe('closed');
    expect(assignmentPhase(noLate, dueAt)).toBe('open');
    expect(assignmentPhase(noLate, ms(dueAt, 1))).toBe('closed');
  });

  it('is closed only strictly after the close time', () => {
    expect(isClosed(withLate, lateUntil)).toBe(false);
    expect(isClosed(withLate, ms(lateUntil, 1))).toBe(true);
    expect(isClosed(noLate, ms(dueAt, 1))).toBe(true);
  });
});

describe('acceptAnswer', () => {
  it('refuses an answer before the opening, naming it in school time', () => {
    expect(accept(withLate, ms(opensAt, -60_000))).toEqual({
      ok: false,
      code: 'not_open',
      message: 'This lesson opens for answers on Tue, 1 Dec 2026, 09:00 GMT.',
    });
    // An answer time before the opening is refused even when it arrives after (nobody could see the question then).
    expect(accept(withLate, ms(opensAt, -60_000), ms(opensAt, 60_000))).toMatchObject({ ok: false, code: 'not_open' });
  });

  it('takes answers from the opening to the due time as on time', () => {
    expect(accept(withLate, opensAt)).toEqual(onTime);
    expect(accept(withLate, dueAt)).toEqual(onTime);
    expect(accept(noLate, dueAt)).toEqual(onTime);
  });

  it('marks answers after the due time late while late answers are taken, up to the late limit itself', () => {
    expect(accept(withLate, ms(dueAt, 1))).toEqual({ ok: true, late: true, sentAfterReconnecting: false });
    expect(accept(withLate, lateUntil)).toEqual({ ok: true, late: true, sentAfterReconnecting: false });
  });

  it('refuses answers after the close with a message naming the date', () => {
    expect(accept(noLate, ms(dueAt, 1))).toEqual({
      ok: false,
      code: 'closed',
      message: 'This lesson was due on Thu, 3 Dec 2026, 17:00 GMT and takes no late answers. Your results page still shows your answers.',
    });
    expect(accept(withLate, ms(lateUntil, 1))).toEqual({
      ok: false,
      code: 'closed',
      message: 'Late answers for this lesson were accepted until Sat, 5 Dec 2026, 17:00 GMT. Your results page still shows your answers.',
    });
  });

  it('accepts an answer queued before the due time that arrives within 24 h, marked sent after reconnecting', () => {
    const answered = ms(dueAt, -HOUR);
    expect(accept(noLate, answered, ms(dueAt, 23 * HOUR - 1))).toEqual({ ok: true, late: false, sentAfterReconnecting: true });
    // Exactly 24 h after the answer time is still inside the grace.
    expect(accept(noLate, answered, ms(answered, 24 * HOUR))).toEqual({ ok: true, late: false, sentAfterReconnecting: true });
    // Arriving while late answers are taken: on time as answered, and the mark says why.
    expect(accept(withLate, answered, ms(dueAt, 2 * HOUR))).toEqual({ ok: true, late: false, sentAfterReconnecting: true });
    // Arriving after the late limit, still within 24 h of the answer.
    expect(accept({ ...withLate, lateUntil: ms(dueAt, HOUR) }, answered, ms(dueAt, 3 * HOUR))).toEqual({
      ok: true,
      late: false,
      sentAfterReconnecting: true,
    });
  });

  it('refuses a queued answer that arrives more than 24 h after it was made', () => {
    const answered = ms(dueAt, -HOUR);
    expect(accept(noLate, answered, ms(answered, 24 * HOUR + 1))).toMatchObject({ ok: false, code: 'closed' });
  });

  it('keeps a late answer late when it arrives after the late limit within 24 h', () => {
    const answered = ms(lateUntil, -HOUR);
    expect(accept(withLate, answered, ms(lateUntil, 5 * HOUR))).toEqual({ ok: true, late: true, sentAfterReconnecting: true });
    expect(accept(withLate, answered, ms(answered, 24 * HOUR + 1))).toMatchObject({ ok: false, code: 'closed' });
  });

  it('does not mark an answer that arrived before the due time', () => {
    expect(accept(noLate, ms(dueAt, -2 * HOUR), ms(dueAt, -HOUR))).toEqual(onTime);
  });

  it('never takes an answer time later than the arrival (clock skew)', () => {
    // A client 4 s ahead, arriving just before the due time: on time as received.
    expect(accept(noLate, ms(dueAt, 2_000), ms(dueAt, -2_000))).toEqual(onTime);
    // Arriving just after the due time with a claim 4 s ahead: late as received.
    expect(accept(withLate, ms(dueAt, 4_001), ms(dueAt, 1))).toEqual({ ok: true, late: true, sentAfterReconnecting: false });
    // A claim 10 minutes in the future is not believed: the arrival counts.
    expect(accept(noLate, ms(dueAt, 10 * 60_000), ms(dueAt, -60_000))).toEqual(onTime);
    expect(accept(noLate, ms(dueAt, 10 * 60_000), ms(dueAt, 60_000))).toMatchObject({ ok: false, code: 'closed' });
  });

  it('does not let a back-dated claim older than the grace pull an answer into the window', () => {
    // Claimed two days before the due time, arriving after it: the claim is not believed.
    expect(accept(noLate, ms(dueAt, -48 * HOUR), ms(dueAt, 60_000))).toMatchObject({ ok: false, code: 'closed' });
    // The same claim arriving before the due time is simply on time.
    expect(accept(noLate, ms(dueAt, -48 * HOUR), ms(dueAt, -60_000))).toEqual(onTime);
  });

  it('uses the arrival for an invalid answer time and refuses an invalid arrival', () => {
    expect(accept(noLate, new Date(Number.NaN), ms(dueAt, -60_000))).toEqual(onTime);
    expect(() => accept(noLate, dueAt, new Date(Number.NaN))).toThrow('The arrival time of an answer must be a valid date.');
  });
});

describe('effectiveAnswerTime', () => {
  it('believes a claim up to 24 h before the arrival, and never one later than the arrival', () => {
    const received = t('2026-12-03T12:00:00Z');
    expect(effectiveAnswerTime(ms(received, -HOUR), received)).toEqual(ms(received, -HOUR));
    expect(effectiveAnswerTime(ms(received, -24 * HOUR), received)).toEqual(ms(received, -24 * HOUR));
    expect(effectiveAnswerTime(ms(received, -24 * HOUR - 1), received)).toEqual(received);
    expect(effectiveAnswerTime(ms(received, 4_000), received)).toEqual(received);
    expect(effectiveAnswerTime(ms(received, 10 * 60_000), received)).toEqual(received);
  });
});
