import { describe, expect, it } from 'vitest';
import {
  actionsFor,
  answeredText,
  datesLine,
  groupAssignments,
  msUntilNextChange,
  stateNote,
  watchedText,
  whatIsNew,
  wholePercent,
} from './assignment-words';
import { shortSchoolTime, type SchoolTime } from './school-time';
import { buildCompletion, buildStudentAssignment, buildStudentHome } from './testing/student-assignment-mocks';

// Hand-computed cases. Europe/London is GMT (UTC+0) in winter and BST (UTC+1) from 29 Mar to 25 Oct 2026
// (last Sundays of March and October, 01:00 UTC); America/New_York is UTC−5 in December.

const london: SchoolTime = { timeZone: 'Europe/London', locale: 'en-GB', now: '2026-12-01T10:00:00.000Z' };

describe('shortSchoolTime', () => {
  it('writes the weekday, day, month and time in school time, without the current year', () => {
    expect(shortSchoolTime('2026-12-03T17:00:00.000Z', london)).toBe('Thu 3 Dec, 17:00');
    // 16:00 UTC in June is 17:00 BST.
    expect(shortSchoolTime('2026-06-03T16:00:00.000Z', london)).toBe('Wed 3 Jun, 17:00');
    // The same instant is 12:00 the same day in New York.
    expect(shortSchoolTime('2026-12-03T17:00:00.000Z', { ...london, timeZone: 'America/New_York', locale: 'en-US' })).toBe(
      'Thu, Dec 3, 12:00 PM',
    );
  });

  it('adds the year when it is not the current one, in school time', () => {
    expect(shortSchoolTime('2027-01-04T09:00:00.000Z', london)).toBe('Mon, 4 Jan 2027, 09:00');
    // 23:30 UTC on 31 Dec is already 2027 in a zone east of UTC, so the year shows there.
    expect(shortSchoolTime('2026-12-31T23:30:00.000Z', { ...london, timeZone: 'Europe/Berlin' })).toBe('Fri, 1 Jan 2027, 00:30');
  });

  it('never breaks the page on a zone it does not know', () => {
    expect(shortSchoolTime('2026-12-03T17:00:00.000Z', { ...london, timeZone: 'Not/AZone' })).toMatch(/2026/);
    expect(shortSchoolTime('not a date', london)).toBe('not a date');
  });
});

describe('datesLine and stateNote', () => {
  const base = { opensAt: '2026-11-30T09:00:00.000Z', dueAt: '2026-12-03T17:00:00.000Z' };

  it('says when an upcoming lesson opens and is due', () => {
    const a = buildStudentAssignment({ ...base, state: 'upcoming' });
    expect(datesLine(a, { ...london, now: '2026-11-29T10:00:00.000Z' })).toBe('Opens Mon 30 Nov, 09:00 · due Thu 3 Dec, 17:00');
    expect(stateNote(a, london)).toBe('You can start watching on Mon 30 Nov, 09:00.');
  });

  it('gives the due time and the late rule of an open lesson', () => {
    expect(datesLine(buildStudentAssignment({ ...base, state: 'not-started' }), london)).toBe('Due Thu 3 Dec, 17:00');
    expect(datesLine(buildStudentAssignment({ ...base, state: 'in-progress', lateUntil: '2026-12-04T17:00:00.000Z' }), london)).toBe(
      'Due Thu 3 Dec, 17:00 · late answers until Fri 4 Dec, 17:00',
    );
  });

  it('words late and closed lessons', () => {
    const late = buildStudentAssignment({ ...base, state: 'late', lateUntil: '2026-12-04T17:00:00.000Z' });
    expect(datesLine(late, london)).toBe('Was due Thu 3 Dec, 17:00 · late answers until Fri 4 Dec, 17:00');
    expect(stateNote(late, london)).toBe('The due time has passed. You can still answer, and answers given now are marked late.');
    expect(datesLine(buildStudentAssignment({ ...base, state: 'closed' }), london)).toBe('Was due Thu 3 Dec, 17:00 · no late answers');
    expect(datesLine(buildStudentAssignment({ ...base, state: 'closed', lateUntil: '2026-12-04T17:00:00.000Z' }), london)).toBe(
      'Was due Thu 3 Dec, 17:00 · closed Fri 4 Dec, 17:00',
    );
    expect(stateNote(buildStudentAssignment({ state: 'closed' }), london)).toBe(
      'This lesson no longer takes answers. Your answers and results stay here.',
    );
  });

  it('words a done lesson before and after its close', () => {
    const done = buildStudentAssignment({
      ...base,
      state: 'done',
      completion: buildCompletion({ done: true, completedAt: '2026-12-02T14:10:00.000Z' }),
    });
    expect(datesLine(done, london)).toBe('Due Thu 3 Dec, 17:00');
    expect(datesLine(done, { ...london, now: '2026-12-05T10:00:00.000Z' })).toBe('Was due Thu 3 Dec, 17:00');
    expect(stateNote(done, london)).toBe('You finished this lesson on Wed 2 Dec, 14:10.');
  });

  it('has no note for lessons simply to do', () => {
    expect(stateNote(buildStudentAssignment({ state: 'not-started' }), london)).toBeNull();
    expect(stateNote(buildStudentAssignment({ state: 'in-progress' }), london)).toBeNull();
  });
});

describe('progress words', () => {
  it('rounds the watched share down to a whole percent', () => {
    expect(wholePercent(0.896)).toBe(89);
    expect(wholePercent(0.9)).toBe(90);
    expect(wholePercent(0.29)).toBe(29);
    expect(wholePercent(1.2)).toBe(100);
    expect(wholePercent(-0.1)).toBe(0);
  });

  it('names the share watched against the share needed, and the required questions answered', () => {
    const completion = buildCompletion({ watchedShare: 0.45, watchShareNeeded: 0.9, requiredAnswered: 2, requiredTotal: 5 });
    expect(watchedText(completion)).toBe('45 % watched (90 % needed)');
    expect(answeredText(completion)).toBe('2 of 5 required questions answered');
    expect(answeredText(buildCompletion({ requiredAnswered: 1, requiredTotal: 1 }))).toBe('1 of 1 required question answered');
    expect(answeredText(buildCompletion({ requiredTotal: 0 }))).toBe('No questions you must answer');
  });
});

describe('actionsFor', () => {
  it('offers the watch page only while answers are taken, and results once there is something to read', () => {
    const act = (state: Parameters<typeof buildStudentAssignment>[0], time = london) => actionsFor(buildStudentAssignment(state), time);
    expect(act({ state: 'upcoming' })).toEqual({ watch: null, results: false });
    expect(act({ state: 'not-started' })).toEqual({ watch: 'start', results: false });
    expect(act({ state: 'in-progress' })).toEqual({ watch: 'continue', results: true });
    expect(act({ state: 'late' })).toEqual({ watch: 'late', results: true });
    expect(act({ state: 'done' })).toEqual({ watch: 'again', results: true });
    expect(act({ state: 'done' }, { ...london, now: '2026-12-05T10:00:00.000Z' })).toEqual({ watch: null, results: true });
    expect(act({ state: 'closed' })).toEqual({ watch: null, results: true });
  });
});

describe('groupAssignments', () => {
  it('puts lessons to do first (soonest close first), then coming up, then finished (latest due first), leaving out empty groups', () => {
    const dueLater = buildStudentAssignment({ lessonTitle: 'B', state: 'not-started', dueAt: '2026-12-08T17:00:00.000Z' });
    // Due earlier than B but open later through its late answers: it closes after B.
    const lateOpen = buildStudentAssignment({
      lessonTitle: 'C',
      state: 'late',
      dueAt: '2026-11-30T17:00:00.000Z',
      lateUntil: '2026-12-10T17:00:00.000Z',
    });
    const dueSoon = buildStudentAssignment({ lessonTitle: 'A', state: 'in-progress', dueAt: '2026-12-02T17:00:00.000Z' });
    const opensLater = buildStudentAssignment({ lessonTitle: 'E', state: 'upcoming', opensAt: '2026-12-09T09:00:00.000Z' });
    const opensSoon = buildStudentAssignment({ lessonTitle: 'D', state: 'upcoming', opensAt: '2026-12-02T09:00:00.000Z' });
    const oldDone = buildStudentAssignment({ lessonTitle: 'G', state: 'done', dueAt: '2026-11-01T17:00:00.000Z' });
    const recentClosed = buildStudentAssignment({ lessonTitle: 'F', state: 'closed', dueAt: '2026-11-20T17:00:00.000Z' });
    const groups = groupAssignments([dueLater, oldDone, lateOpen, opensLater, dueSoon, recentClosed, opensSoon]);
    expect(groups.map((g) => [g.title, g.assignments.map((a) => a.lessonTitle).join('')])).toEqual([
      ['To do', 'ABC'],
      ['Coming up', 'DE'],
      ['Finished', 'FG'],
    ]);
    expect(groupAssignments([oldDone]).map((g) => g.id)).toEqual(['finished']);
    expect(groupAssignments([])).toEqual([]);
  });
});

describe('msUntilNextChange', () => {
  it('is the time to the nearest opening, due or close time still ahead of the server clock', () => {
    const home = buildStudentHome(
      [
        buildStudentAssignment({ opensAt: '2026-11-30T09:00:00.000Z', dueAt: '2026-12-03T17:00:00.000Z' }),
        buildStudentAssignment({ opensAt: '2026-12-01T10:30:00.000Z', dueAt: '2026-12-04T17:00:00.000Z', lateUntil: null }),
      ],
      '2026-12-01T10:00:00.000Z',
    );
    // 10:00 → 10:30 is 30 minutes.
    expect(msUntilNextChange(home)).toBe(30 * 60_000);
    const later = buildStudentHome(home.assignments, '2026-12-03T17:00:00.000Z');
    // Only the second lesson's due time is ahead: 3 Dec 17:00 → 4 Dec 17:00.
    expect(msUntilNextChange(later)).toBe(24 * 3_600_000);
    expect(msUntilNextChange(buildStudentHome(home.assignments, '2026-12-05T00:00:00.000Z'))).toBeNull();
  });
});

describe('whatIsNew', () => {
  it('counts lessons not opened yet and lessons with a changed grade', () => {
    expect(whatIsNew([buildStudentAssignment()])).toEqual([]);
    expect(
      whatIsNew([
        buildStudentAssignment({ isNew: true }),
        buildStudentAssignment({ isNew: true }),
        buildStudentAssignment({ gradeUpdated: true }),
      ]),
    ).toEqual(['2 new lessons you have not opened yet.', 'A grade changed in 1 lesson after your teacher corrected it.']);
    expect(
      whatIsNew([buildStudentAssignment({ isNew: true, gradeUpdated: true }), buildStudentAssignment({ gradeUpdated: true })]),
    ).toEqual(['1 new lesson you have not opened yet.', 'Grades changed in 2 lessons after your teacher corrected them.']);
  });
});
