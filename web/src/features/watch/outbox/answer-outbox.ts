import type { ResponseResultDto } from '@core/contracts';
import { ApiError, isApiError } from '@/lib/api-client';
import type { SessionToken } from '../api/session-token';
import { retryDelayMs } from './backoff';
import type { OutboxEntry } from './outbox-entry';
import type { OutboxStore } from './outbox-store';
import { holdReasonOf, sendFailure, type HoldReason } from './send-failure';

export type { HoldReason };

export type OutboxStatus = {
  /** This student's answers not yet recorded by the server (on this device). */
  unsent: number;
  /** idle: nothing to do; sending: a request is out; waiting: for the connection (a retry is due at retryAt); held: see `held`. */
  state: 'idle' | 'sending' | 'waiting' | 'held';
  held: HoldReason | null;
  retryAt: number | null;
  /** False once the browser refused to keep an answer on the device (no IndexedDB, storage full). */
  deviceStorage: boolean;
};

/** A queued answer's reply, for pages that no longer wait on it. */
export type OutboxEvent =
  { type: 'recorded'; entry: OutboxEntry; result: ResponseResultDto } | { type: 'refused'; entry: OutboxEntry; message: string };

export type SubmitOutcome = { status: 'recorded'; result: ResponseResultDto } | { status: 'queued' };

export type Timers = { set(callback: () => void, ms: number): unknown; clear(handle: unknown): void };

export type OutboxDeps = {
  store: OutboxStore;
  session: SessionToken;
  send(entry: OutboxEntry, token: string | null): Promise<ResponseResultDto>;
  timers?: Timers;
  random?: () => number;
  now?: () => number;
  /** How long a new answer waits for its reply before the page is told it is queued (a slow connection). */
  replyWaitMs?: number;
  /** How long the first read of the device's store may take before the page goes on without it. */
  storeWaitMs?: number;
};

type Waiter = { resolve(outcome: SubmitOutcome): void; reject(error: unknown): void; durable: boolean; timer: unknown };

type Attempt =
  | { kind: 'recorded'; result: ResponseResultDto }
  | { kind: 'refused'; error: ApiError }
  | { kind: 'retry' }
  | { kind: 'held'; reason: HoldReason };

const browserTimers: Timers = {
  set: (callback, ms) => setTimeout(callback, ms),
  clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};

/** How many replies to queued answers are remembered for pages that open later. */
const RECENT_EVENTS = 100;

export const NOT_KEPT_MESSAGE =
  'The answer could not be sent, and this browser could not keep it on the device. Check the connection and send it again.';

/**
 * The durable queue of one student's answers on this device. Every answer is written to the store
 * before it is sent and removed only when the server replied for good, so a reload, a closed tab or
 * a lost connection loses nothing; the idempotency key makes a resend safe. Answers go out one at a
 * time in the order given (so attempt numbers follow that order), with backoff after a failure, at
 * once when the connection returns, and only under this student's session: a refused token, a
 * 401/403/404 asks the server who is signed in, and another person's (or role's, or school's) session
 * holds the queue instead of sending.
 */
export class AnswerOutbox {
  private queue: OutboxEntry[] = [];
  private readonly waiters = new Map<string, Waiter>();
  /** Answers this tab finished with (a store read that began before their removal must not bring them back). */
  private readonly finished = new Set<string>();
  private readonly statusListeners = new Set<() => void>();
  private readonly eventListeners = new Set<(event: OutboxEvent) => void>();
  private running = false;
  private failures = 0;
  private retryTimer: unknown = null;
  private loading: Promise<void> | null = null;
  /** Replies that came after the page stopped waiting (newest last), so a page opened later still sees them. */
  private log: readonly OutboxEvent[] = [];
  private snapshot: OutboxStatus = { unsent: 0, state: 'idle', held: null, retryAt: null, deviceStorage: true };
  private readonly timers: Timers;
  private readonly random: () => number;
  private readonly now: () => number;
  private readonly replyWaitMs: number;
  private readonly storeWaitMs: number;
  private disposed = false;

  constructor(
    readonly userId: string,
    private readonly deps: OutboxDeps,
  ) {
    this.timers = deps.timers ?? browserTimers;
    this.random = deps.random ?? Math.random;
    this.now = deps.now ?? Date.now;
    this.replyWaitMs = deps.replyWaitMs ?? 8000;
    this.storeWaitMs = deps.storeWaitMs ?? 4000;
  }

  /** Reads what earlier pages left on this device (once). */
  load(): Promise<void> {
    this.loading ??= this.merge();
    return this.loading;
  }

  /** Loads, then sends what is waiting (not awaited: a new answer never waits behind a slow queue to be kept). */
  start(): void {
    void this.load().then(() => this.retryNow());
  }

  /** Entries of this student written by other tabs since: add them behind the ones known here. */
  private async merge(): Promise<void> {
    // A store that never answers (an IndexedDB open left waiting by a page that was navigated away
    // mid-upgrade) must not hold the page: it goes on as without storage, and takes the read if it comes.
    const read = this.deps.store.list(this.userId);
    let stored: OutboxEntry[] | 'late';
    try {
      stored = await new Promise<OutboxEntry[] | 'late'>((resolve, reject) => {
        const timer = this.timers.set(() => resolve('late'), this.storeWaitMs);
        read.then(
          (rows) => {
            this.timers.clear(timer);
            resolve(rows);
          },
          (error: unknown) => {
            this.timers.clear(timer);
            reject(error instanceof Error ? error : new Error(String(error)));
          },
        );
      });
    } catch {
      this.update({ deviceStorage: false });
      return;
    }
    if (stored === 'late') {
      this.update({ deviceStorage: false });
      void read.then(
        (rows) => {
          this.add(rows);
          this.update({ deviceStorage: true });
        },
        () => undefined,
      );
      return;
    }
    this.add(stored);
    this.update({});
  }

  private add(stored: readonly OutboxEntry[]): void {
    const known = new Set([...this.finished, ...this.queue.map((entry) => entry.idempotencyKey)]);
    for (const entry of stored) if (!known.has(entry.idempotencyKey)) this.queue.push(entry);
    this.queue.sort((a, b) => a.queuedAt - b.queuedAt);
  }

  status(): OutboxStatus {
    return this.snapshot;
  }

  /** The unsent answers of one assignment, oldest first. */
  pendingFor(assignmentId: string): OutboxEntry[] {
    return this.queue.filter((entry) => entry.assignmentId === assignmentId);
  }

  /** Called when the status or the replies change. */
  subscribe(listener: () => void): () => void {
    this.statusListeners.add(listener);
    return () => this.statusListeners.delete(listener);
  }

  /** The latest replies to queued answers (at most RECENT_EVENTS); a new array whenever one arrives (subscribe()). */
  events(): readonly OutboxEvent[] {
    return this.log;
  }

  onEvent(listener: (event: OutboxEvent) => void): () => void {
    this.eventListeners.add(listener);
    return () => this.eventListeners.delete(listener);
  }

  /**
   * Keeps the answer, then sends it behind any older ones. Resolves with the server's result, or
   * "queued" when it could not be sent now (or its reply is slow): it stays on the device and its
   * result comes later as an event. Rejects (an ApiError) when the server refused it for good, or
   * when it could neither be sent nor kept.
   */
  async submit(entry: OutboxEntry): Promise<SubmitOutcome> {
    await this.load();
    let durable = true;
    try {
      await this.deps.store.put(entry);
    } catch {
      durable = false;
      this.update({ deviceStorage: false });
    }
    this.queue.push(entry);
    this.update({});
    const outcome = new Promise<SubmitOutcome>((resolve, reject) => {
      // A slow reply: a kept answer is "queued" for the page; the reply still arrives, as an event.
      const timer = durable ? this.timers.set(() => this.settle(entry.idempotencyKey, { status: 'queued' }), this.replyWaitMs) : null;
      this.waiters.set(entry.idempotencyKey, { resolve, reject, durable, timer });
    });
    this.retryNow();
    return outcome;
  }

  /** Try at once (the connection came back, the page became visible): also after a hold, which is checked again. */
  retryNow(): void {
    if (this.disposed) return;
    if (this.retryTimer !== null) this.timers.clear(this.retryTimer);
    this.retryTimer = null;
    if (this.snapshot.state === 'held') this.update({ state: 'idle', held: null });
    void this.pump();
  }

  /** Look again for entries other tabs wrote, then try sending. */
  async refresh(): Promise<void> {
    await this.load();
    await this.merge();
    this.retryNow();
  }

  /** Stops timers and listeners; what is stored stays for the next page. */
  dispose(): void {
    this.disposed = true;
    if (this.retryTimer !== null) this.timers.clear(this.retryTimer);
    for (const [key] of this.waiters) this.settle(key, { status: 'queued' });
    this.statusListeners.clear();
    this.eventListeners.clear();
  }

  private async pump(): Promise<void> {
    if (this.running || this.disposed || this.snapshot.state === 'held') return;
    this.running = true;
    try {
      while (this.queue.length > 0 && !this.disposed) {
        const entry = this.queue[0];
        if (!entry) break;
        this.update({ state: 'sending', retryAt: null });
        const attempt = await this.attempt(entry);
        if (attempt.kind === 'retry' || attempt.kind === 'held') {
          this.stopForNow(attempt);
          return;
        }
        this.failures = 0;
        this.finished.add(entry.idempotencyKey);
        this.queue.shift();
        await this.deps.store.delete(entry.idempotencyKey).catch(() => undefined);
        if (attempt.kind === 'recorded')
          this.deliver(entry, { status: 'recorded', result: attempt.result }, { type: 'recorded', entry, result: attempt.result });
        else this.refuse(entry, attempt.error);
      }
      this.update({ state: 'idle', retryAt: null });
    } finally {
      this.running = false;
    }
  }

  private async attempt(entry: OutboxEntry, again = false): Promise<Attempt> {
    try {
      return { kind: 'recorded', result: await this.deps.send(entry, this.deps.session.current()) };
    } catch (error) {
      if (!isApiError(error)) return { kind: 'retry' };
      if (error.status >= 200 && error.status < 300) {
        const message = `The server took this answer, but its reply could not be read (${error.message}) Your results page shows what was recorded.`;
        return { kind: 'refused', error: new ApiError(error.status, error.code, message) };
      }
      const failure = sendFailure(error);
      if (failure === 'retry') return { kind: 'retry' };
      if (failure === 'refused') return { kind: 'refused', error };
      // 401/403/404: is this still the student's own session, as the one that answered?
      const check = await this.deps.session.check();
      if (check.kind === 'unreachable') return { kind: 'retry' };
      const reason = holdReasonOf(check, entry);
      if (reason) return { kind: 'held', reason };
      // The same student: a new token (the session was renewed) is worth one more try; a 404 or 403 then is the answer's own.
      if (!again && (error.status === 401 || error.code === 'csrf_invalid')) return this.attempt(entry, true);
      return { kind: 'refused', error };
    }
  }

  private stopForNow(attempt: Extract<Attempt, { kind: 'retry' | 'held' }>): void {
    // Answers waiting on a reply are queued now; one the device could not keep is given back to the page.
    for (const entry of [...this.queue]) {
      const waiter = this.waiters.get(entry.idempotencyKey);
      if (!waiter) continue;
      if (waiter.durable) this.settle(entry.idempotencyKey, { status: 'queued' });
      else {
        this.queue = this.queue.filter((e) => e !== entry);
        this.settle(entry.idempotencyKey, new ApiError(0, 'not_kept', NOT_KEPT_MESSAGE));
      }
    }
    if (attempt.kind === 'held') {
      this.update({ state: 'held', held: attempt.reason, retryAt: null });
      return;
    }
    this.failures += 1;
    const delay = retryDelayMs(this.failures, this.random());
    this.retryTimer = this.timers.set(() => {
      this.retryTimer = null;
      void this.pump();
    }, delay);
    this.update({ state: 'waiting', retryAt: this.now() + delay });
  }

  private deliver(entry: OutboxEntry, outcome: SubmitOutcome, event: OutboxEvent): void {
    if (this.waiters.has(entry.idempotencyKey)) this.settle(entry.idempotencyKey, outcome);
    else this.emit(event);
    this.update({});
  }

  private refuse(entry: OutboxEntry, error: ApiError): void {
    if (this.waiters.has(entry.idempotencyKey)) this.settle(entry.idempotencyKey, error);
    else this.emit({ type: 'refused', entry, message: error.message });
    this.update({});
  }

  /** Resolves (an outcome) or rejects (an error) the page waiting on this answer, once. */
  private settle(key: string, result: SubmitOutcome | ApiError): void {
    const waiter = this.waiters.get(key);
    if (!waiter) return;
    this.waiters.delete(key);
    if (waiter.timer !== null) this.timers.clear(waiter.timer);
    if (result instanceof ApiError) waiter.reject(result);
    else waiter.resolve(result);
  }

  private emit(event: OutboxEvent): void {
    this.log = [...this.log, event].slice(-RECENT_EVENTS);
    for (const listener of [...this.eventListeners]) listener(event);
    for (const listener of [...this.statusListeners]) listener();
  }

  private update(change: Partial<OutboxStatus>): void {
    const next = { ...this.snapshot, ...change, unsent: this.queue.length };
    const same = (Object.keys(next) as (keyof OutboxStatus)[]).every((key) => next[key] === this.snapshot[key]);
    if (same) return;
    this.snapshot = next;
    for (const listener of [...this.statusListeners]) listener();
  }
}
