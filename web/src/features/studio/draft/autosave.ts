import type { DraftSavedDto, LessonContent } from '@core/contracts';
import { ApiError, isApiError, type ApiErrorDetail } from '@/lib/api-client';
import { isRetryable, retryDelayMs } from './save-backoff';

export type SaveDraft = (revision: number, content: LessonContent) => Promise<DraftSavedDto>;
export type EditConflict = { revision: number; savedAt: string; savedBy: string | null };

/** Thrown by a SaveDraft when another save came first (409 edit_conflict), with who saved it and when. */
export class DraftConflictError extends Error {
  override readonly name = 'DraftConflictError';
  constructor(readonly conflict: EditConflict) {
    super('This lesson was saved elsewhere after your edit started.');
  }
}

/** What the header shows about saving. */
export type SaveState =
  | { kind: 'saved'; savedAt: string }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'retrying'; attempt: number; retryInMs: number; message: string }
  /** The content breaks a hard limit (checked here before sending) or the server refused it: fix, and the next edit saves. */
  | { kind: 'rejected'; message: string; details: ApiErrorDetail[] }
  | { kind: 'conflict'; conflict: EditConflict };

type Timers = { set: (run: () => void, ms: number) => unknown; clear: (handle: unknown) => void };
const realTimers: Timers = {
  set: (run, ms) => setTimeout(run, ms),
  clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};

export type AutosaveOptions = {
  revision: number;
  savedAt: string;
  save: SaveDraft;
  /** Problems that make sending pointless (the shared zod schema's hard limits), or [] to send. */
  check: (content: LessonContent) => ApiErrorDetail[];
  onState: (state: SaveState) => void;
  /** A save went through: `content` is exactly what was sent (problem paths refer to it). */
  onSaved: (saved: DraftSavedDto, content: LessonContent) => void;
  debounceMs?: number;
  timers?: Timers;
};

/** Waits this long after the last edit before saving. */
export const AUTOSAVE_DEBOUNCE_MS = 800;

/**
 * Saves a draft whole, some time after the last edit, one request at a time. An edit made while a save
 * is on its way is sent right after it; a failed save is retried with a growing wait and never dropped;
 * a 409 edit_conflict stops saving until the teacher chooses (load theirs, or overwrite with mine).
 */
export class Autosave {
  private revision: number;
  private state: SaveState;
  /** The newest content not yet saved, or null when everything is saved. */
  private unsaved: LessonContent | null = null;
  private edits = 0;
  private inFlight: Promise<void> | null = null;
  private timer: unknown = null;
  private attempt = 0;
  private waiters: ((saved: boolean) => void)[] = [];
  private disposed = false;

  constructor(private readonly options: AutosaveOptions) {
    this.revision = options.revision;
    this.state = { kind: 'saved', savedAt: options.savedAt };
  }

  get current(): SaveState {
    return this.state;
  }
  get currentRevision(): number {
    return this.revision;
  }
  get hasUnsaved(): boolean {
    return this.unsaved !== null || this.inFlight !== null;
  }

  /** The teacher changed something: save it after the pause (or after the save on its way). */
  edit(content: LessonContent): void {
    this.unsaved = content;
    this.edits += 1;
    if (this.state.kind === 'conflict') return; // kept here; nothing is sent until the teacher chooses
    if (this.state.kind === 'retrying') return; // the scheduled retry sends the newest content
    this.setState({ kind: 'pending' });
    this.schedule(this.options.debounceMs ?? AUTOSAVE_DEBOUNCE_MS);
  }

  /** Save now (before publishing, or "Retry now"); resolves true once everything is saved. */
  flush(): Promise<boolean> {
    if (!this.hasUnsaved) return Promise.resolve(true);
    const done = new Promise<boolean>((resolve) => this.waiters.push(resolve));
    if (this.state.kind !== 'conflict' && !this.inFlight) {
      this.clearTimer();
      void this.send();
    }
    return done;
  }

  /** "Keep mine and overwrite": save my content on top of the newer revision. */
  overwrite(newerRevision: number): void {
    if (this.state.kind !== 'conflict') return;
    this.revision = newerRevision;
    this.attempt = 0;
    void this.send();
  }

  /** "Load the newer version" (or a fresh load): forget unsaved content and start again from this revision. */
  reset(revision: number, savedAt: string): void {
    this.clearTimer();
    this.unsaved = null;
    this.attempt = 0;
    this.revision = revision;
    this.setState({ kind: 'saved', savedAt });
    this.settle(true);
  }

  dispose(): void {
    this.disposed = true;
    this.clearTimer();
  }

  private schedule(ms: number): void {
    this.clearTimer();
    this.timer = (this.options.timers ?? realTimers).set(() => {
      this.timer = null;
      // Busy: the save on its way sends the newest content when it returns.
      if (!this.inFlight) void this.send();
    }, ms);
  }

  private clearTimer(): void {
    if (this.timer !== null) (this.options.timers ?? realTimers).clear(this.timer);
    this.timer = null;
  }

  private send(): Promise<void> {
    const content = this.unsaved;
    if (!content || this.disposed) return Promise.resolve();
    const problems = this.options.check(content);
    if (problems.length > 0) {
      this.setState({ kind: 'rejected', message: 'Not saved: fix the fields marked below and it saves by itself.', details: problems });
      this.settle(false);
      return Promise.resolve();
    }
    const editsSent = this.edits;
    this.setState({ kind: 'saving' });
    const run = this.options
      .save(this.revision, content)
      .then((saved) => this.succeeded(saved, content, editsSent))
      .catch((error: unknown) => this.failed(error))
      .finally(() => {
        this.inFlight = null;
        this.afterSave();
      });
    this.inFlight = run;
    return run;
  }

  private succeeded(saved: DraftSavedDto, content: LessonContent, editsSent: number): void {
    this.revision = saved.revision;
    this.attempt = 0;
    if (this.edits === editsSent) {
      this.unsaved = null;
      this.setState({ kind: 'saved', savedAt: saved.savedAt });
    }
    this.options.onSaved(saved, content);
  }

  private failed(error: unknown): void {
    if (error instanceof DraftConflictError) {
      this.setState({ kind: 'conflict', conflict: error.conflict });
      this.settle(false);
      return;
    }
    const apiError = isApiError(error) ? error : new ApiError(0, 'unexpected', error instanceof Error ? error.message : String(error));
    if (!isRetryable(apiError)) {
      this.setState({ kind: 'rejected', message: apiError.message, details: apiError.details });
      this.settle(false);
      return;
    }
    this.attempt += 1;
    const retryInMs = retryDelayMs(this.attempt);
    this.setState({ kind: 'retrying', attempt: this.attempt, retryInMs, message: apiError.message });
    this.settle(false);
    this.schedule(retryInMs);
  }

  private afterSave(): void {
    if (this.disposed) return;
    if (this.unsaved === null) {
      this.settle(true);
      return;
    }
    // Edits arrived while saving: send them now unless a pause (debounce or retry) is already counting down.
    if (this.state.kind === 'saved' || this.state.kind === 'saving' || this.state.kind === 'pending') {
      if (this.timer === null) void this.send();
      else if (this.state.kind !== 'pending') this.setState({ kind: 'pending' });
    }
  }

  private settle(saved: boolean): void {
    const waiters = this.waiters;
    this.waiters = [];
    for (const resolve of waiters) resolve(saved);
  }

  private setState(state: SaveState): void {
    this.state = state;
    if (!this.disposed) this.options.onState(state);
  }
}
