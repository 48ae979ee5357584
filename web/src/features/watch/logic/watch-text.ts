import type { CompletionDto, StudentAssignmentState, WatchViewDto } from '@core/contracts';
import type { SchoolClock } from '@/lib/format';

function format(iso: string, clock: SchoolClock, options: Intl.DateTimeFormatOptions): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  try {
    return new Intl.DateTimeFormat(clock.locale, { ...options, timeZone: clock.timeZone }).format(date);
  } catch {
    // An unknown zone or locale must not break the page.
    return new Intl.DateTimeFormat(undefined, options).format(date);
  }
}

/** "Thu 3 Dec, 17:00" in the assignment's time zone. */
export function formatSchoolTime(iso: string, clock: SchoolClock): string {
  return format(iso, clock, { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
}

/** The time zone's name as people read it ("GMT", "CET"), to say the times are school time. */
export function zoneName(iso: string, clock: SchoolClock): string {
  try {
    const parts = new Intl.DateTimeFormat(clock.locale, { timeZone: clock.timeZone, timeZoneName: 'short' }).formatToParts(new Date(iso));
    return parts.find((part) => part.type === 'timeZoneName')?.value ?? clock.timeZone;
  } catch {
    return clock.timeZone;
  }
}

/** A position in the recording as "02:41" (or "1:02:41" past an hour), for the resume offer. */
export function formatClock(ms: number): string {
  const total = Math.max(0, Math.floor(ms / 1000));
  const hours = Math.floor(total / 3600);
  const minutes = Math.floor((total % 3600) / 60);
  const seconds = total % 60;
  const mm = String(minutes).padStart(2, '0');
  const ss = String(seconds).padStart(2, '0');
  return hours > 0 ? `${hours}:${mm}:${ss}` : `${mm}:${ss}`;
}

export const STATE_WORDS: Record<StudentAssignmentState, string> = {
  upcoming: 'Not open yet',
  'not-started': 'Not started',
  'in-progress': 'In progress',
  done: 'Done',
  late: 'Late',
  closed: 'Closed',
};

/** When answers close for this student: the late limit if late answers are taken, else the due time. */
export function closesAtOf(view: WatchViewDto): string {
  return view.assignment.lateUntil ?? view.assignment.dueAt;
}

/** What the feedback policy means while watching, in a sentence; null when right/wrong is shown at once. */
export function feedbackNote(view: WatchViewDto, clock: SchoolClock): string | null {
  switch (view.assignment.feedback) {
    case 'immediately':
      return null;
    case 'after-due':
      return `Right or wrong is shown after ${formatSchoolTime(closesAtOf(view), clock)}. Until then each answer is saved, and you may change it while attempts remain; your latest answer counts.`;
    case 'never':
      return 'Right or wrong is not shown for this lesson. Each answer is saved, and you may change it while attempts remain; your latest answer counts.';
  }
}

/** Why answers and explanations are not shown yet; null when they come after the last attempt. */
export function revealNote(view: WatchViewDto, clock: SchoolClock): string | null {
  switch (view.assignment.reveal) {
    case 'after-last-attempt':
      return null;
    case 'after-due':
      return `Answers and explanations are shown after ${formatSchoolTime(closesAtOf(view), clock)}, on your results page.`;
    case 'never':
      return 'Answers and explanations are not shown for this lesson.';
  }
}

/**
 * The state the page header shows: the server's as the page loaded, until a later reply (an answer's
 * or a viewing report's) says the lesson is complete; done wins, as on the student's home.
 */
export function currentState(loaded: StudentAssignmentState, completion: CompletionDto): StudentAssignmentState {
  return completion.done ? 'done' : loaded;
}
