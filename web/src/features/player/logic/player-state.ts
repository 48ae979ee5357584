import type { CheckpointAnswer, CheckpointGradeDto } from '@core/contracts';
import { hasAnswered, recordGrade, recordOf, recordQueued, recordRefused, type AttemptBook } from './attempts';
import type { Stop } from './stops';

/** Why an overlay opened: the video reached it, a refused seek came back to it, a seek jumped over it, or the viewer opened it. */
export type OverlayReason = 'reached' | 'returned' | 'passed' | 'opened';

export type Overlay = { stop: Stop; reason: OverlayReason; phase: 'asking' | 'graded' };

export type PlayerState = {
  /** The safety notes were acknowledged (or there were none). */
  started: boolean;
  overlay: Overlay | null;
  /** Asides on show beside the playing video, by checkpoint key. */
  asides: readonly string[];
  /** Stops answered, skipped or acknowledged: the video no longer stops there. */
  handled: readonly string[];
  book: AttemptBook;
};

export type PlayerEvent =
  | { type: 'start' }
  | { type: 'reach'; stop: Stop; reason: OverlayReason }
  | { type: 'graded'; key: string; attempt: number; answer: CheckpointAnswer; grade: CheckpointGradeDto; feedbackHidden?: boolean }
  /** Kept on this device to be sent later: it counts as answered (a gate opens), its grade arrives as 'graded'. */
  | { type: 'queued'; key: string; attempt: number; answer: CheckpointAnswer }
  /** A queued answer the server refused for good (not recorded): the form opens again. */
  | { type: 'refused'; key: string; attempt: number }
  | { type: 'try-again' }
  | { type: 'skip' }
  | { type: 'continue'; answerable: boolean }
  | { type: 'dismiss-aside'; key: string }
  /** Stops the student has seen before (those taking no answer, before the point they resume at). */
  | { type: 'seen'; ids: readonly string[] }
  | { type: 'reset'; needsSafety: boolean };

export function initialPlayerState(needsSafety: boolean): PlayerState {
  return { started: !needsSafety, overlay: null, asides: [], handled: [], book: {} };
}

/** Whether a stop needs nothing more: handled, or (for a pin) answered at least once. */
export function isStopDone(state: PlayerState, stop: Stop): boolean {
  if (state.handled.includes(stop.id)) return true;
  return stop.phase === 'pin' && hasAnswered(recordOf(state.book, stop.key));
}

/** Whether the video should still act on a stop. A reveal waits for a prediction to reveal. */
export function isStopActive(state: PlayerState, stop: Stop): boolean {
  if (isStopDone(state, stop)) return false;
  if (stop.phase === 'reveal') return hasAnswered(recordOf(state.book, stop.key));
  return !(stop.behaviour === 'aside' && state.asides.includes(stop.key));
}

/** The open overlay may be closed without answering: a pause pin, never a gate. */
export function maySkip(overlay: Overlay): boolean {
  return overlay.stop.phase === 'pin' && overlay.stop.behaviour !== 'gate';
}

/** A gate is passed only once answered; for kinds without an answer, "Continue" is the acknowledgement. */
export function mayContinue(state: PlayerState, overlay: Overlay, answerable: boolean): boolean {
  if (overlay.stop.phase === 'reveal' || overlay.stop.behaviour !== 'gate' || !answerable) return true;
  return hasAnswered(recordOf(state.book, overlay.stop.key));
}

/** The open overlay of checkpoint `key` (if it is the open one) shows `phase`. */
function withPhase(state: PlayerState, key: string, phase: Overlay['phase']): PlayerState {
  const overlay = state.overlay;
  return overlay && overlay.stop.key === key ? { ...state, overlay: { ...overlay, phase } } : state;
}

function addOnce(list: readonly string[], id: string): readonly string[] {
  return list.includes(id) ? list : [...list, id];
}

/** The player's state machine: overlays, asides and the attempts the server graded. */
export function playerReducer(state: PlayerState, event: PlayerEvent): PlayerState {
  switch (event.type) {
    case 'start':
      return { ...state, started: true };
    case 'reach': {
      const { stop, reason } = event;
      if (!stop.pauses) return { ...state, asides: addOnce(state.asides, stop.key) };
      const record = recordOf(state.book, stop.key);
      const graded = stop.phase === 'pin' && (hasAnswered(record) || record.grade !== null) && record.grade?.invalid !== true;
      return { ...state, overlay: { stop, reason, phase: graded && reason === 'opened' ? 'graded' : 'asking' } };
    }
    case 'graded': {
      const book = recordGrade(state.book, event.key, event.attempt, event.answer, event.grade, event.feedbackHidden);
      // An answer the server could not read stays in the form, with its message there.
      return withPhase({ ...state, book }, event.key, event.grade.invalid ? 'asking' : 'graded');
    }
    case 'queued':
      return withPhase({ ...state, book: recordQueued(state.book, event.key, event.attempt, event.answer) }, event.key, 'graded');
    case 'refused':
      return withPhase({ ...state, book: recordRefused(state.book, event.key, event.attempt) }, event.key, 'asking');
    case 'try-again':
      return state.overlay ? { ...state, overlay: { ...state.overlay, phase: 'asking' } } : state;
    case 'skip':
      if (!state.overlay || !maySkip(state.overlay)) return state;
      return { ...state, overlay: null, handled: addOnce(state.handled, state.overlay.stop.id) };
    case 'continue':
      if (!state.overlay || !mayContinue(state, state.overlay, event.answerable)) return state;
      return { ...state, overlay: null, handled: addOnce(state.handled, state.overlay.stop.id) };
    case 'dismiss-aside':
      return { ...state, asides: state.asides.filter((k) => k !== event.key), handled: addOnce(state.handled, event.key) };
    case 'seen':
      return { ...state, handled: event.ids.reduce(addOnce, state.handled) };
    case 'reset':
      return initialPlayerState(event.needsSafety);
  }
}
