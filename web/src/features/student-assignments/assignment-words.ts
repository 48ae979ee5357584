import type { CompletionDto, StudentAssignmentDto, StudentAssignmentState, StudentHomeDto } from '@core/contracts';
import { shortSchoolTime, type SchoolTime } from './school-time';

/** The states in words: the badge's colour and icon only repeat them. */
export const STATE_LABELS: Record<StudentAssignmentState, string> = {
  upcoming: 'Not open yet',
  'not-started': 'Not started',
  'in-progress': 'In progress',
  done: 'Done',
  late: 'Late',
  closed: 'Closed',
};

type Dates = Pick<StudentAssignmentDto, 'dueAt' | 'lateUntil'>;
/** What a dates line needs: the results page knows no opening time (it is past by then). */
export type DatedAssignment = Dates & Pick<StudentAssignmentDto, 'state'> & { opensAt?: string };

/** The instant answers stop being accepted: the end of late answers, else the due time. */
export function closeTime(dates: Dates): string {
  return dates.lateUntil ?? dates.dueAt;
}

const after = (iso: string, now: string) => new Date(now).getTime() > new Date(iso).getTime();

/** The dates a card shows, in school time: what is due when, and what the late rule is. */
export function datesLine(assignment: DatedAssignment, time: SchoolTime): string {
  const at = (iso: string) => shortSchoolTime(iso, time);
  const { opensAt, dueAt, lateUntil } = assignment;
  const lateRule = lateUntil ? ` · late answers until ${at(lateUntil)}` : '';
  switch (assignment.state) {
    case 'upcoming':
      return opensAt ? `Opens ${at(opensAt)} · due ${at(dueAt)}` : `Due ${at(dueAt)}`;
    case 'late':
      return `Was due ${at(dueAt)} · late answers until ${at(lateUntil ?? dueAt)}`;
    case 'closed':
      return lateUntil ? `Was due ${at(dueAt)} · closed ${at(lateUntil)}` : `Was due ${at(dueAt)} · no late answers`;
    case 'done':
      if (after(closeTime(assignment), time.now))
        return lateUntil ? `Was due ${at(dueAt)} · closed ${at(lateUntil)}` : `Was due ${at(dueAt)}`;
      return `Due ${at(dueAt)}${lateRule}`;
    default:
      return `Due ${at(dueAt)}${lateRule}`;
  }
}

/** What the state means for the student, when a sentence helps. */
export function stateNote(assignment: StudentAssignmentDto, time: SchoolTime): string | null {
  switch (assignment.state) {
    case 'upcoming':
      return `You can start watching on ${shortSchoolTime(assignment.opensAt, time)}.`;
    case 'late':
      return 'The due time has passed. You can still answer, and answers given now are marked late.';
    case 'closed':
      return 'This lesson no longer takes answers. Your answers and results stay here.';
    case 'done':
      return assignment.completion.completedAt
        ? `You finished this lesson on ${shortSchoolTime(assignment.completion.completedAt, time)}.`
        : 'You finished this lesson.';
    default:
      return null;
  }
}

/** A share as a whole percent, rounded down: 89.6 % watched is not yet 90 %. */
export function wholePercent(share: number): number {
  return Math.max(0, Math.min(100, Math.floor(share * 100 + 1e-9)));
}

/** "45 % watched (90 % needed)". */
export function watchedText(completion: CompletionDto): string {
  return `${wholePercent(completion.watchedShare)} % watched (${wholePercent(completion.watchShareNeeded)} % needed)`;
}

/** "2 of 5 required questions answered". */
export function answeredText(completion: CompletionDto): string {
  const { requiredAnswered, requiredTotal } = completion;
  if (requiredTotal === 0) return 'No questions you must answer';
  return `${requiredAnswered} of ${requiredTotal} required ${requiredTotal === 1 ? 'question' : 'questions'} answered`;
}

export type WatchAction = 'start' | 'continue' | 'late' | 'again';

export const WATCH_ACTION_LABELS: Record<WatchAction, string> = {
  start: 'Start watching',
  continue: 'Carry on watching',
  late: 'Watch and answer late',
  again: 'Watch again',
};

/** Which links a card offers: the watch page only while the lesson takes answers, results once there is something to see. */
export function actionsFor(assignment: StudentAssignmentDto, time: SchoolTime): { watch: WatchAction | null; results: boolean } {
  switch (assignment.state) {
    case 'upcoming':
      return { watch: null, results: false };
    case 'not-started':
      return { watch: 'start', results: false };
    case 'in-progress':
      return { watch: 'continue', results: true };
    case 'late':
      return { watch: 'late', results: true };
    case 'done':
      return { watch: after(closeTime(assignment), time.now) ? null : 'again', results: true };
    case 'closed':
      return { watch: null, results: true };
  }
}

export type AssignmentGroup = { id: 'to-do' | 'coming-up' | 'finished'; title: string; assignments: StudentAssignmentDto[] };

const ms = (iso: string) => new Date(iso).getTime();

/**
 * The home's groups, empty ones left out: to do (soonest close first), coming up (soonest opening
 * first), finished (most recently due first).
 */
export function groupAssignments(assignments: StudentAssignmentDto[]): AssignmentGroup[] {
  const toDo = assignments
    .filter((a) => a.state === 'not-started' || a.state === 'in-progress' || a.state === 'late')
    .sort((a, b) => ms(closeTime(a)) - ms(closeTime(b)) || ms(a.dueAt) - ms(b.dueAt));
  const comingUp = assignments.filter((a) => a.state === 'upcoming').sort((a, b) => ms(a.opensAt) - ms(b.opensAt));
  const finished = assignments.filter((a) => a.state === 'done' || a.state === 'closed').sort((a, b) => ms(b.dueAt) - ms(a.dueAt));
  const groups: AssignmentGroup[] = [
    { id: 'to-do', title: 'To do', assignments: toDo },
    { id: 'coming-up', title: 'Coming up', assignments: comingUp },
    { id: 'finished', title: 'Finished', assignments: finished },
  ];
  return groups.filter((group) => group.assignments.length > 0);
}

/**
 * Milliseconds from the reply's server time until the next opening, due or close time of any
 * assignment, when states change by themselves; null when none is ahead.
 */
export function msUntilNextChange(home: StudentHomeDto): number | null {
  const now = ms(home.serverTime);
  let next = Infinity;
  for (const a of home.assignments) {
    for (const iso of [a.opensAt, a.dueAt, a.lateUntil]) {
      if (iso === null) continue;
      const t = ms(iso);
      if (t > now && t < next) next = t;
    }
  }
  return Number.isFinite(next) ? next - now : null;
}

/** The home's summary of what changed: lessons not opened yet, grades changed by a correction. */
export function whatIsNew(assignments: StudentAssignmentDto[]): string[] {
  const fresh = assignments.filter((a) => a.isNew).length;
  const updated = assignments.filter((a) => a.gradeUpdated).length;
  const lines: string[] = [];
  if (fresh > 0) lines.push(fresh === 1 ? '1 new lesson you have not opened yet.' : `${fresh} new lessons you have not opened yet.`);
  if (updated > 0) {
    lines.push(
      updated === 1
        ? 'A grade changed in 1 lesson after your teacher corrected it.'
        : `Grades changed in ${updated} lessons after your teacher corrected them.`,
    );
  }
  return lines;
}
