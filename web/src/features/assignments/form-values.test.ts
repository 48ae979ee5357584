import { describe, expect, it } from 'vitest';
import { buildAssignment } from './testing/assignment-mocks';
import {
  assignFormSchema,
  EditFormSchema,
  editValuesOf,
  newAssignValues,
  parsePercent,
  sharePercentText,
  type EditFormValues,
} from './form-values';

// Hand-computed cases of the forms' conversion to the shared contract.

const LESSON_ID = '00000000-0000-4000-8000-00000000a001';
const CLASS_ID = '00000000-0000-4000-8000-00000000c001';

const valid: EditFormValues = {
  opensAt: '2026-12-01T09:00',
  dueAt: '2026-12-03T17:00',
  acceptLate: false,
  lateUntil: '',
  feedback: 'after-due',
  reveal: 'after-due',
  completionWatchShare: '90',
};

function issues(result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) {
  return (result.error?.issues ?? []).map((issue) => `${issue.path.join('.')}: ${issue.message}`);
}

describe('parsePercent', () => {
  it('reads whole and decimal percents, with or without the sign, with a point or a comma', () => {
    expect(parsePercent('90')).toBe(90);
    expect(parsePercent(' 90 % ')).toBe(90);
    expect(parsePercent('87,5')).toBe(87.5);
    expect(parsePercent('.5')).toBe(0.5);
  });

  it('refuses what is not a number', () => {
    expect(parsePercent('')).toBeNull();
    expect(parsePercent('ninety')).toBeNull();
    expect(parsePercent('9 0')).toBeNull();
  });

  it('writes a share back without float noise', () => {
    expect(sharePercentText(0.9)).toBe('90');
    expect(sharePercentText(0.875)).toBe('87.5');
  });
});

describe('the edit form schema', () => {
  it('gives the contract’s body: share from percent, no late answers unless ticked', () => {
    const result = EditFormSchema.safeParse({ ...valid, lateUntil: '2026-12-05T17:00', completionWatchShare: '87,5 %' });
    expect(result.data).toEqual({
      opensAt: '2026-12-01T09:00',
      dueAt: '2026-12-03T17:00',
      lateUntil: null,
      feedback: 'after-due',
      reveal: 'after-due',
      completionWatchShare: 0.875,
    });
    expect(EditFormSchema.safeParse({ ...valid, acceptLate: true, lateUntil: '2026-12-05T17:00' }).data?.lateUntil).toBe(
      '2026-12-05T17:00',
    );
  });

  it('asks for every date, the late deadline when ticked, and a number of percent', () => {
    expect(issues(EditFormSchema.safeParse({ ...valid, opensAt: '', dueAt: '', acceptLate: true, completionWatchShare: 'most' }))).toEqual([
      'opensAt: Choose the date and time the lesson opens.',
      'dueAt: Choose the date and time answers are due.',
      'lateUntil: Choose until when late answers are accepted, or untick late answers.',
      'completionWatchShare: Type the share as a number of percent, like 90.',
    ]);
  });

  it('then lets the contract check the order of the dates and the share’s range', () => {
    expect(
      issues(EditFormSchema.safeParse({ ...valid, dueAt: '2026-12-01T09:00', acceptLate: true, lateUntil: '2026-11-30T09:00' })),
    ).toEqual(['dueAt: The due date is after the opening date.', 'lateUntil: Late answers close after the due date.']);
    expect(issues(EditFormSchema.safeParse({ ...valid, completionWatchShare: '120' }))).toEqual([
      'completionWatchShare: The share to watch is at most 100 %.',
    ]);
  });
});

describe('the assign form schema', () => {
  const schema = assignFormSchema(LESSON_ID);

  it('adds the lesson, the version as a number and the classes', () => {
    const result = schema.safeParse({ ...valid, versionNumber: '3', classIds: [CLASS_ID] });
    expect(result.data).toEqual({
      lessonId: LESSON_ID,
      versionNumber: 3,
      classIds: [CLASS_ID],
      opensAt: '2026-12-01T09:00',
      dueAt: '2026-12-03T17:00',
      lateUntil: null,
      feedback: 'after-due',
      reveal: 'after-due',
      completionWatchShare: 0.9,
    });
  });

  it('asks for at least one class', () => {
    expect(issues(schema.safeParse({ ...valid, versionNumber: '3', classIds: [] }))).toEqual(['classIds: Choose at least one class.']);
  });

  it('starts on the newest version, feedback at once, answers after the last attempt and 90 % to watch', () => {
    const values = newAssignValues({
      newestVersion: 4,
      classIds: [],
      now: new Date('2026-12-01T08:15:00.000Z'),
      timeZone: 'Europe/London',
    });
    expect(values).toEqual({
      versionNumber: '4',
      classIds: [],
      opensAt: '2026-12-01T08:15',
      dueAt: '2026-12-08T17:00',
      acceptLate: false,
      lateUntil: '',
      feedback: 'immediately',
      reveal: 'after-last-attempt',
      completionWatchShare: '90',
    });
  });
});

describe('editValuesOf', () => {
  it('shows the saved instants as wall-clock times in the assignment’s zone', () => {
    // 08:00 UTC in June is 09:00 BST; 17:00 UTC in December is 17:00 GMT.
    const assignment = buildAssignment({
      opensAt: '2026-06-01T08:00:00.000Z',
      dueAt: '2026-12-03T17:00:00.000Z',
      lateUntil: '2026-12-05T17:00:00.000Z',
      completionWatchShare: 0.75,
      feedback: 'never',
      reveal: 'never',
    });
    expect(editValuesOf(assignment)).toEqual({
      opensAt: '2026-06-01T09:00',
      dueAt: '2026-12-03T17:00',
      acceptLate: true,
      lateUntil: '2026-12-05T17:00',
      feedback: 'never',
      reveal: 'never',
      completionWatchShare: '75',
    });
  });
});
