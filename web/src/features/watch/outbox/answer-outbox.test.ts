import { describe, expect, it, vi } from 'vitest';
import type { ResponseResultDto } from '@core/contracts';
import { ApiError } from '@/lib/api-client';
import { SessionToken, type SessionCheck } from '../api/session-token';
import { AnswerOutbox, NOT_KEPT_MESSAGE, type OutboxEvent, type Timers } from './answer-outbox';
import { retryDelayMs } from './backoff';
import type { OutboxEntry } from './outbox-entry';
import type { OutboxStore } from './outbox-store';

const USER = '00000000-0000-4000-8000-0000000000a1';
const OTHER = '00000000-0000-4000-8000-0000000000b2';
const SCHOOL = '11111111-1111-4111-8111-111111111111';
const ASSIGNMENT = '00000000-0000-4000-8000-0000000000c3';

let keyCounter = 0;
function entry(over: Partial<OutboxEntry> = {}): OutboxEntry {
  keyCounter += 1;
  const idempotencyKey = `00000000-0000-4000-8000-${String(keyCounter).padStart(12, '0')}`;
  return {
    idempotencyKey,
    userId: USER,
    schoolId: SCHOOL,
    assignmentId: ASSIGNMENT,
    attempt: 1,
    queuedAt: keyCounter,
    body: {
      idempotencyKey,
      checkpointKey: 'gate01',
      answer: { kind: 'multiple-choice', optionIds: ['a'] },
      answeredAt: '2026-12-01T10:00:00.000Z',
    },
    ...over,
  };
}

function result(over: Partial<ResponseResultDto> = {}): ResponseResultDto {
  return {
    responseId: '00000000-0000-4000-8000-0000000000d4',
    attempt: 1,
    grade: { correct: true, score: 1, feedback: 'Right.', mistake: null, invalid: false, attemptsLeft: 1, hints: [], reveal: null },
    feedbackHidden: false,
    late: false,
    sentAfterReconnecting: false,
    recordedAt: '2026-12-01T10:00:01.000Z',
    serverTime: '2026-12-01T10:00:01.000Z',
    completion: { watchedShare: 0, watchShareNeeded: 0.9, requiredAnswered: 1, requiredTotal: 2, done: false, completedAt: null },
    ...over,
  };
}

class MemoryStore implements OutboxStore {
  rows = new Map<string, OutboxEntry>();
  failPuts = false;
  list = (userId: string) =>
    Promise.resolve([...this.rows.values()].filter((row) => row.userId === userId).sort((a, b) => a.queuedAt - b.queuedAt));
  put = (row: OutboxEntry) => {
    if (this.failPuts) return Promise.reject(new Error('QuotaExceededError'));
    this.rows.set(row.idempotencyKey, row);
    return Promise.resolve();
  };
  delete = (key: string) => {
    this.rows.delete(key);
    return Promise.resolve();
  };
}

/** Timers run by hand: `fire()` runs every one that is due by the given wall time. */
class ManualTimers implements Timers {
  now = 0;
  private list: { id: number; at: number; fn: () => void }[] = [];
  private next = 1;
  delays: number[] = [];
  set = (fn: () => void, ms: number) => {
    const id = this.next++;
    this.list.push({ id, at: this.now + ms, fn });
    this.delays.push(ms);
    return id;
  };
  clear = (handle: unknown) => {
    this.list = this.list.filter((t) => t.id !== handle);
  };
  advance(ms: number): void {
    this.now += ms;
    const due = this.list.filter((t) => t.at <= this.now);
    this.list = this.list.filter((t) => t.at > this.now);
    for (const timer of due) timer.fn();
  }
}

const settle = () => new Promise((resolve) => setTimeout(resolve, 0));
const offline = () => new ApiError(0, 'network_error', 'Pinfield could not reach its server.');

function setUp(options: { check?: () => Promise<SessionCheck>; store?: MemoryStore } = {}) {
  const store = options.store ?? new MemoryStore();
  const timers = new ManualTimers();
  const send = vi.fn<(e: OutboxEntry, token: string | null) => Promise<ResponseResultDto>>();
  const check = vi.fn(options.check ?? (() => Promise.resolve<SessionCheck>({ kind: 'unreachable' })));
  const session = new SessionToken(USER, 'token-1', check);
  const outbox = new AnswerOutbox(USER, { store, session, send, timers, random: () => 0.5, now: () => timers.now, replyWaitMs: 8000 });
  const events: OutboxEvent[] = [];
  outbox.onEvent((event) => events.push(event));
  return { store, timers, send, check, outbox, events };
}

describe('AnswerOutbox', () => {
  it('keeps the answer before sending and removes it once recorded', async () => {
    const { store, send, outbox } = setUp();
    const first = entry();
    send.mockImplementation(() => {
      // Stored before the request went out.
      expect(store.rows.has(first.idempotencyKey)).toBe(true);
      return Promise.resolve(result());
    });
    await expect(outbox.submit(first)).resolves.toEqual({ status: 'recorded', result: result() });
    expect(send).toHaveBeenCalledWith(first, 'token-1');
    expect(store.rows.size).toBe(0);
    expect(outbox.status()).toMatchObject({ unsent: 0, state: 'idle' });
  });

  it('goes on without the device store when its first read never answers, and takes the entries if they come late', async () => {
    const store = new MemoryStore();
    const waiting = entry();
    store.rows.set(waiting.idempotencyKey, waiting);
    let answer: (rows: OutboxEntry[]) => void = () => undefined;
    store.list = () => new Promise<OutboxEntry[]>((resolve) => (answer = resolve));
    const { timers, outbox } = setUp({ store });
    const loaded = outbox.load();
    timers.advance(4000);
    await loaded;
    expect(outbox.status()).toMatchObject({ deviceStorage: false, unsent: 0 });
    answer([waiting]);
    await settle();
    expect(outbox.pendingFor(waiting.assignmentId)).toEqual([waiting]);
    expect(outbox.status()).toMatchObject({ deviceStorage: true, unsent: 1 });
  });

  it('queues an answer when the connection fails, retries with backoff, and reports the grade when it arrives', async () => {
    const { store, timers, send, outbox, events } = setUp();
    send.mockRejectedValueOnce(offline()).mockRejectedValueOnce(offline()).mockResolvedValueOnce(result());
    const queued = entry();
    await expect(outbox.submit(queued)).resolves.toEqual({ status: 'queued' });
    expect(outbox.status()).toMatchObject({ unsent: 1, state: 'waiting', retryAt: 1000 });
    expect(store.rows.has(queued.idempotencyKey)).toBe(true);
    timers.advance(999);
    await settle();
    expect(send).toHaveBeenCalledTimes(1);
    timers.advance(1);
    await settle();
    expect(send).toHaveBeenCalledTimes(2);
    // The second failure waits twice as long (random 0.5: no jitter).
    expect(outbox.status()).toMatchObject({ state: 'waiting', retryAt: 1000 + 2000 });
    timers.advance(2000);
    await settle();
    expect(events).toEqual([{ type: 'recorded', entry: queued, result: result() }]);
    expect(store.rows.size).toBe(0);
    expect(outbox.status()).toMatchObject({ unsent: 0, state: 'idle' });
  });

  it('sends queued answers one at a time in the order they were given, at once when the connection returns', async () => {
    const { send, outbox, events } = setUp();
    send.mockRejectedValue(offline());
    const a = entry();
    const b = entry({ attempt: 2 });
    await outbox.submit(a);
    await outbox.submit(b);
    expect(outbox.status().unsent).toBe(2);
    const order: string[] = [];
    let release: () => void = () => undefined;
    send.mockReset().mockImplementation((e) => {
      order.push(e.idempotencyKey);
      if (e === a) return new Promise((resolve) => (release = () => resolve(result({ attempt: 1 }))));
      return Promise.resolve(result({ attempt: 2 }));
    });
    outbox.retryNow();
    await settle();
    // The second waits for the first's reply.
    expect(order).toEqual([a.idempotencyKey]);
    release();
    await settle();
    expect(order).toEqual([a.idempotencyKey, b.idempotencyKey]);
    expect(events.map((event) => event.type === 'recorded' && event.result.attempt)).toEqual([1, 2]);
  });

  it('rejects with the server’s message when it refuses an answer for good, and keeps nothing', async () => {
    const { store, send, outbox } = setUp();
    send.mockRejectedValueOnce(new ApiError(409, 'no_attempts_left', 'You have used all 2 attempts at this checkpoint.'));
    await expect(outbox.submit(entry())).rejects.toMatchObject({ message: 'You have used all 2 attempts at this checkpoint.' });
    expect(store.rows.size).toBe(0);
    expect(outbox.status().unsent).toBe(0);
  });

  it('reports a queued answer refused later as an event', async () => {
    const { timers, send, outbox, events } = setUp();
    send
      .mockRejectedValueOnce(offline())
      .mockRejectedValueOnce(new ApiError(409, 'assignment_closed', 'This lesson closed on 3 Dec 2026, 17:00 (school time).'));
    const queued = entry();
    await outbox.submit(queued);
    timers.advance(1000);
    await settle();
    expect(events).toEqual([{ type: 'refused', entry: queued, message: 'This lesson closed on 3 Dec 2026, 17:00 (school time).' }]);
  });

  it('holds the queue when someone else is signed in now, and sends under the same student’s fresh token later', async () => {
    let who: SessionCheck = { kind: 'signed-in', userId: OTHER, role: 'student', schoolId: SCHOOL, token: 'token-other' };
    const { store, send, check, outbox } = setUp({ check: () => Promise.resolve(who) });
    send.mockRejectedValueOnce(new ApiError(403, 'csrf_invalid', 'The form expired.'));
    await expect(outbox.submit(entry())).resolves.toEqual({ status: 'queued' });
    expect(check).toHaveBeenCalledTimes(1);
    expect(outbox.status()).toMatchObject({ state: 'held', held: 'other-user', unsent: 1 });
    expect(send).toHaveBeenCalledTimes(1);
    expect(store.rows.size).toBe(1);

    who = { kind: 'signed-in', userId: USER, role: 'student', schoolId: SCHOOL, token: 'token-2' };
    send.mockRejectedValueOnce(new ApiError(403, 'csrf_invalid', 'The form expired.')).mockResolvedValueOnce(result());
    outbox.retryNow();
    await settle();
    expect(send).toHaveBeenLastCalledWith(expect.anything(), 'token-2');
    expect(outbox.status()).toMatchObject({ state: 'idle', unsent: 0 });
  });

  it.each([
    [{ kind: 'signed-out' } as SessionCheck, 'signed-out'],
    [{ kind: 'signed-in', userId: USER, role: 'teacher', schoolId: SCHOOL, token: 't' } as SessionCheck, 'other-role'],
    [{ kind: 'signed-in', userId: USER, role: 'student', schoolId: OTHER, token: 't' } as SessionCheck, 'other-school'],
  ])('holds (does not drop) an answer the server turns away for the session: %o', async (who, reason) => {
    const { store, send, outbox } = setUp({ check: () => Promise.resolve(who) });
    send.mockRejectedValueOnce(new ApiError(404, 'not_found', 'This lesson is not assigned to you.'));
    await outbox.submit(entry());
    expect(outbox.status()).toMatchObject({ state: 'held', held: reason });
    expect(store.rows.size).toBe(1);
  });

  it('drops an answer refused with 404 under the same student’s session', async () => {
    const same: SessionCheck = { kind: 'signed-in', userId: USER, role: 'student', schoolId: SCHOOL, token: 'token-1' };
    const { store, send, outbox } = setUp({ check: () => Promise.resolve(same) });
    send.mockRejectedValueOnce(new ApiError(404, 'unknown_checkpoint', 'There is no checkpoint "gate99" in this lesson.'));
    await expect(outbox.submit(entry())).rejects.toMatchObject({ message: 'There is no checkpoint "gate99" in this lesson.' });
    expect(store.rows.size).toBe(0);
  });

  it('sends what an earlier page left on the device', async () => {
    const store = new MemoryStore();
    const left = entry();
    await store.put(left);
    await store.put(entry({ userId: OTHER }));
    const { send, outbox, events } = setUp({ store });
    send.mockResolvedValue(result());
    outbox.start();
    await settle();
    // Only this student's answer.
    expect(send).toHaveBeenCalledTimes(1);
    expect(events).toEqual([{ type: 'recorded', entry: left, result: result() }]);
    expect([...store.rows.values()].map((row) => row.userId)).toEqual([OTHER]);
  });

  it('does not bring back an answer it sent while a look at the store was under way', async () => {
    const { store, send, outbox, events } = setUp();
    send.mockRejectedValueOnce(offline());
    const queued = entry();
    await outbox.submit(queued);
    // A look at the store (another tab's answers) that read the row before it was removed.
    const list = store.list;
    let release: () => void = () => undefined;
    store.list = (userId) => list(userId).then((rows) => new Promise((resolve) => (release = () => resolve(rows))));
    send.mockResolvedValue(result());
    const refreshed = outbox.refresh();
    await settle();
    outbox.retryNow();
    await settle();
    expect(events).toHaveLength(1);
    release();
    await refreshed;
    await settle();
    expect(send).toHaveBeenCalledTimes(2);
    expect(events).toHaveLength(1);
    expect(outbox.status().unsent).toBe(0);
  });

  it('tells the page "queued" when the reply is slow, and delivers the reply later', async () => {
    const { timers, send, outbox, events } = setUp();
    let reply: (value: ResponseResultDto) => void = () => undefined;
    send.mockImplementation(() => new Promise((resolve) => (reply = resolve)));
    const slow = entry();
    const outcome = outbox.submit(slow);
    await settle();
    timers.advance(8000);
    await expect(outcome).resolves.toEqual({ status: 'queued' });
    reply(result());
    await settle();
    expect(events).toEqual([{ type: 'recorded', entry: slow, result: result() }]);
  });

  it('gives the answer back when it can neither be sent nor kept on the device', async () => {
    const store = new MemoryStore();
    store.failPuts = true;
    const { send, outbox } = setUp({ store });
    send.mockRejectedValueOnce(offline());
    await expect(outbox.submit(entry())).rejects.toMatchObject({ message: NOT_KEPT_MESSAGE });
    expect(outbox.status()).toMatchObject({ unsent: 0, deviceStorage: false });
  });
});

describe('retryDelayMs', () => {
  // Hand-computed: 1 s doubling to a 60 s ceiling, jitter ±20 %.
  it('doubles from one second up to a minute, with jitter', () => {
    expect([1, 2, 3, 4, 7, 8].map((n) => retryDelayMs(n, 0.5))).toEqual([1000, 2000, 4000, 8000, 60_000, 60_000]);
    expect(retryDelayMs(1, 0)).toBe(800);
    expect(retryDelayMs(1, 1)).toBe(1200);
  });
});
