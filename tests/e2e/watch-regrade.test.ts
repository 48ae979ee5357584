import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import type { AssignmentDto, LessonContent, WatchViewDto } from '@core/contracts';
import { baseUrl, openPage, screenshot } from './support/browser';
import { coilCentreFieldMicrotesla, typed } from './support/coil-field';
import { storedGrades, storedProgress, storedResponses } from './support/db';
import { EVERY_KIND_RECORDING } from './support/every-kind-lesson';
import { assignLesson, publishCorrection, publishLesson, runTag, type PublishedLesson, type RecordingFacts } from './support/lessons';
import { signInWithPicker } from './support/sign-in';
import { panelOf, playerOf, pressPlay, waitForPlayerReady } from './support/watch-page';

const TEACHER = 'ada.quillfeather@fernhollow.example';
const STUDENT = 'olly.brackenridge@fernhollow.example';
const CHOICE_KEY = 'rgchoice01';
const NUMERIC_KEY = 'rgnumeric1';

/**
 * Version 1 carries a teacher's slip: the long straight wire's μ0NI/(2πa) where the question asks for
 * the centre of a flat coil, μ0NI/(2a) (OpenStax University Physics Vol. 2, §12.4). A student who
 * answers rightly is marked wrong until the corrected version 2 is moved onto the assignment.
 */
function lessonWith(expected: string, title: string, recording: RecordingFacts): LessonContent {
  return {
    settings: {
      title,
      description: 'An invented lesson for the regrade browser test.',
      tags: ['e2e'],
      level: 'Test lesson',
      safetyNotes: '',
      minSpacingMs: 500,
    },
    chapters: [{ key: 'rgchapter1', title: 'The fall', startMs: 0, endMs: recording.durationMs }],
    checkpoints: [
      {
        key: CHOICE_KEY,
        atMs: 1000,
        label: 'What slows it',
        behaviour: 'gate',
        kind: 'multiple-choice',
        required: true,
        points: 1,
        attempts: 1,
        hints: [],
        explanation: 'Induced currents oppose the motion that causes them.',
        prompt: 'What slows the magnet in the copper tube?',
        options: [
          { id: 'a', text: 'Induced currents in the copper', correct: true, feedback: '' },
          { id: 'b', text: 'The air in the tube', correct: false, feedback: '' },
        ],
        allowSeveral: false,
        shuffle: false,
      },
      {
        key: NUMERIC_KEY,
        atMs: 2000,
        label: 'Field at the centre',
        behaviour: 'gate',
        kind: 'numeric',
        required: true,
        points: 2,
        attempts: 1,
        hints: [],
        explanation: 'B = μ0NI/(2a) at the centre of a flat coil.',
        prompt:
          'One ring of the tube is a flat coil of {{N}} turns and radius {{a}} carrying {{I}}. What is the field at its centre, in µT?',
        expected,
        askedUnit: 'uT',
        variables: [
          { name: 'N', min: 10, max: 30, step: 10, unit: '', role: 'turns' },
          { name: 'a', min: 2, max: 4, step: 0.5, unit: 'cm', role: 'radius' },
          { name: 'I', min: 0.5, max: 2, step: 0.5, unit: 'A', role: 'none' },
        ],
        relativeTolerancePercent: 2,
        absoluteTolerance: null,
        sigFigs: null,
        requireUnit: true,
        distractors: [],
      },
    ],
  };
}

const title = `E2E regrade ${runTag()}`;
let lesson: PublishedLesson;
let assignment: AssignmentDto;
let durationMs = 0;

beforeAll(async () => {
  const teacher = await openPage();
  await signInWithPicker(teacher, TEACHER);
  lesson = await publishLesson(teacher, EVERY_KIND_RECORDING, (recording) => {
    durationMs = recording.durationMs;
    return lessonWith('mu0*N*I/(2*pi*a)', title, recording);
  });
  assignment = await assignLesson(teacher, lesson, { className: '10F Physics', feedback: 'immediately', reveal: 'after-last-attempt' });
  await teacher.context().close();
});

function homeEntry(page: Page) {
  return page
    .locator(':is(li, article, section, tr)')
    .filter({ has: page.locator(`a[href="/student/assignments/${assignment.id}"]`) })
    .last();
}

describe('a correction moved onto an assignment', () => {
  it('regrades the changed checkpoint from the stored answer, and the student sees "Grade updated"', async () => {
    const student = await openPage();
    await signInWithPicker(student, STUDENT);
    const watchPath = `/student/assignments/${assignment.id}`;
    const viewLoaded = student.waitForResponse((r) => r.url().endsWith(`/api${watchPath}/watch`) && r.request().method() === 'GET');
    // As a student gets there: from their home, by the lesson's link.
    await homeEntry(student).locator(`a[href="${watchPath}"]`).first().click();
    const view = (await (await viewLoaded).json()) as WatchViewDto;
    const numericView = view.view.checkpoints.find((c) => c.key === NUMERIC_KEY);
    if (numericView?.kind !== 'numeric') throw new Error('The student view has no numeric checkpoint.');
    await waitForPlayerReady(student);
    await pressPlay(student);

    await playerOf(student).and(student.locator('[data-stop-ms="1000"]')).waitFor({ timeout: 30_000 });
    const choice = panelOf(student, 'What slows it');
    await choice.getByRole('radio', { name: 'Induced currents in the copper' }).check();
    await choice.getByRole('button', { name: 'Check my answer' }).click();
    await choice.getByRole('region', { name: 'Result' }).getByText('Right', { exact: true }).waitFor();
    await choice.getByRole('button', { name: 'Continue' }).click();

    await playerOf(student).and(student.locator('[data-stop-ms="2000"]')).waitFor({ timeout: 30_000 });
    const numeric = panelOf(student, 'Field at the centre');
    const answer = typed(coilCentreFieldMicrotesla(numericView.values), 'uT');
    await numeric.getByRole('textbox', { name: /Your answer/ }).fill(answer);
    await numeric.getByRole('button', { name: 'Check my answer' }).click();
    // Marked by version 1's wrong formula; no attempt left to change it.
    await numeric.getByRole('region', { name: 'Result' }).getByText('Not right yet').waitFor();
    await numeric.getByText('No attempts left.').waitFor();
    expect(await storedGrades(assignment.id, STUDENT)).toMatchObject([
      { checkpointKey: CHOICE_KEY, source: 'engine', correct: true },
      { checkpointKey: NUMERIC_KEY, source: 'engine', correct: false, versionNumber: 1 },
    ]);
    await student.goto(`${baseUrl}/student`);
    await homeEntry(student).waitFor();
    expect(await homeEntry(student).getByText('Grade updated').count()).toBe(0);

    // The teacher publishes the correction and moves the assignment onto it from its page.
    const teacher = await openPage({ width: 1280, height: 800 });
    await signInWithPicker(teacher, TEACHER);
    const corrected = await publishCorrection(
      teacher,
      lesson.lessonId,
      lessonWith('mu0*N*I/(2*a)', title, { durationMs }),
      'Field at the centre of a coil, not of a wire',
    );
    expect(corrected).toBe(2);
    await teacher.goto(`${baseUrl}/teacher/assignments/${assignment.id}`);
    await teacher.getByRole('button', { name: 'Move to version 2' }).click();
    // The page says first what gets regraded and asks to confirm.
    const confirm = teacher.getByRole('alertdialog', { name: 'Move 10F Physics to version 2?' });
    await confirm.getByRole('button', { name: 'Move to version 2' }).click();
    await teacher.getByText('Moved from version 1 to version 2').waitFor({ timeout: 20_000 });
    await teacher.getByText(/Regraded 1 answer at 1 changed checkpoint: “Field at the centre”/).waitFor();
    await teacher.getByText(/1 grade changed; 1 student sees “Grade updated”/).waitFor();
    await screenshot(teacher, 'assignment-moved-to-correction');

    // Only the changed checkpoint was regraded, from the stored raw answer, with the stored values.
    const grades = await storedGrades(assignment.id, STUDENT);
    expect(grades).toMatchObject([
      { checkpointKey: CHOICE_KEY, source: 'engine', correct: true },
      { checkpointKey: NUMERIC_KEY, source: 'engine', correct: false, versionNumber: 1 },
      { checkpointKey: NUMERIC_KEY, source: 'regrade', correct: true, versionNumber: 2 },
    ]);
    expect(grades).toHaveLength(3);
    expect((await storedResponses(assignment.id, STUDENT)).map((row) => [row.checkpointKey, row.attempt, row.rawText])).toEqual([
      [CHOICE_KEY, 1, 'Induced currents in the copper'],
      [NUMERIC_KEY, 1, answer],
    ]);
    expect((await storedProgress(assignment.id, STUDENT))?.gradeUpdatedAt).not.toBeNull();

    // The student's home says so, until they have looked at their results.
    await student.reload();
    await homeEntry(student).getByText('Grade updated').waitFor();
    await screenshot(student, 'watch-home-grade-updated');
    await homeEntry(student).locator(`a[href="${watchPath}/results"]`).first().click();
    await student.getByText(answer).first().waitFor();
    // The numeric checkpoint, worth 2 points, now right and marked as changed by the correction.
    await student.getByText('2 of 2 points').waitFor();
    await student.getByText('Grade updated').first().waitFor();
    await screenshot(student, 'student-results-regraded');
    await student.goto(`${baseUrl}/student`);
    await homeEntry(student).waitFor();
    expect(await homeEntry(student).getByText('Grade updated').count()).toBe(0);
  }, 180_000);
});
