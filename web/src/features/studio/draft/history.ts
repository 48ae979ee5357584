/**
 * Undo and redo of the studio's edits in this session. Each edit names a group ("which field of which
 * checkpoint"); edits to the same group closer together than COALESCE_MS merge into one undo step, so a
 * typed sentence undoes as one step rather than letter by letter. Pure: the caller supplies the clock.
 */
export type History<T> = {
  past: T[];
  present: T;
  future: T[];
  /** The group of the newest step and when it was last extended, for coalescing. */
  group: string | null;
  groupAt: number;
};

/** A pause longer than this starts a new undo step even within the same field (common practice for editors: about a second). */
export const COALESCE_MS = 1000;
/** Oldest steps are forgotten past this many, so a long session does not grow without bound. */
export const HISTORY_LIMIT = 200;

export function createHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], group: null, groupAt: 0 };
}

/** Adds `next` as the present; merges it into the newest step when it continues the same group's burst. */
export function record<T>(history: History<T>, next: T, options: { group?: string | null; at: number }): History<T> {
  if (Object.is(next, history.present)) return history;
  const group = options.group ?? null;
  const continues = group !== null && group === history.group && history.past.length > 0 && options.at - history.groupAt <= COALESCE_MS;
  if (continues) return { ...history, present: next, future: [], groupAt: options.at };
  return {
    past: [...history.past, history.present].slice(-HISTORY_LIMIT),
    present: next,
    future: [],
    group,
    groupAt: options.at,
  };
}

export function undo<T>(history: History<T>): History<T> {
  const previous = history.past.at(-1);
  if (history.past.length === 0) return history;
  return { past: history.past.slice(0, -1), present: previous as T, future: [history.present, ...history.future], group: null, groupAt: 0 };
}

export function redo<T>(history: History<T>): History<T> {
  if (history.future.length === 0) return history;
  const [next, ...rest] = history.future;
  return { past: [...history.past, history.present], present: next as T, future: rest, group: null, groupAt: 0 };
}

export const canUndo = (history: History<unknown>) => history.past.length > 0;
export const canRedo = (history: History<unknown>) => history.future.length > 0;
