import type { Locator, Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import type { AssignmentDto, ResponseResultDto, StudentCheckpoint, WatchViewDto } from '@core/contracts';
import { baseUrl, openPage, screenshot } from './support/browser';
import { coilCentreFieldMicrotesla, typed } from './support/coil-field';
import { attemptsByKey, storedGrades, storedProgress, storedResponses } from './support/db';
import { ANSWERS, AT, DEMO_FPS, EVERY_KIND_RECORDING, KEYS, everyKindLesson } from './support/every-kind-lesson';
import { assignLesson, publishLesson, runTag } from './support/lessons';
import { signInWithPicker } from './support/sign-in';
import {
  chooseSpeed,
  expectStopAt,
  installFrameProbe,
  pageScrollWidth,
  panelOf,
  pressPlay,
  resetFrameProbe,
  seekVideo,
  tryToPlay,
  videoState,
  waitForPlayerReady,
} from './support/watch-page';

// Ada teaches 10F Physics, whose students the sign-in picker offers.
const TEACHER = 'ada.quillfeather@fernhollow.example';
const CLASS = '10F Physics';
const DESKTOP_STUDENT = 'juno.fairweather@fernhollow.example';
const PHONE_STUDENT = 'kit.lanternby@fernhollow.example';
const FRAME_MS = 1000 / DEMO_FPS;

const title = `E2E watch: every kind ${runTag()}`;
let assignment: AssignmentDto;

beforeAll(async () => {
  const teacher = await openPage();
  await signInWithPicker(teacher, TEACHER);
  const lesson = await publishLesson(teacher, EVERY_KIND_RECORDING, (recording) => everyKindLesson(title, recording));
  assignment = await assignLesson(teacher, lesson, { className: CLASS, feedback: 'immediately', reveal: 'after-last-attempt' });
  await teacher.context().close();
});

const watchPath = () => `/student/assignments/${assignment.id}`;

/** The home's entry for this assignment: the innermost block holding its watch link. */
function homeEntry(page: Page): Locator {
  return page
    .locator(':is(li, article, section, tr)')
    .filter({ has: page.locator(`a[href="${watchPath()}"]`) })
    .last();
}

/** Opens the watch page from the home's link and returns the student view it loaded. */
async function openFromHome(page: Page): Promise<WatchViewDto> {
  const loaded = page.waitForResponse(
    (response) => response.url().endsWith(`/api${watchPath()}/watch`) && response.request().method() === 'GET',
  );
  await homeEntry(page).locator(`a[href="${watchPath()}"]`).first().click();
  const response = await loaded;
  expect(response.status()).toBe(200);
  return (await response.json()) as WatchViewDto;
}

function checkpointOf<K extends StudentCheckpoint['kind']>(view: WatchViewDto, key: string, kind: K) {
  const found = view.view.checkpoints.find((c) => c.key === key);
  if (!found || found.kind !== kind) throw new Error(`The student view has no ${kind} checkpoint ${key}.`);
  return found as Extract<StudentCheckpoint, { kind: K }>;
}

/** The verdict line of the panel's latest result ("Right", "Not right yet", "Saved"). */
function verdict(panel: Locator, words: string): Locator {
  return panel
    .getByRole('region', { name: 'Result' })
    .getByRole('status')
    .filter({ hasText: new RegExp(`^\\s*${words}\\s*$`) });
}

async function continueFrom(page: Page, panel: Locator): Promise<void> {
  await resetFrameProbe(page);
  await panel.getByRole('button', { name: 'Continue' }).click();
}

describe('a student watches an assignment with every checkpoint kind', () => {
  it('acknowledges safety, stops within a frame at 2x, is held by a gate, reloads, answers offline; every answer stored once', async () => {
    const page = await openPage({ width: 1280, height: 800 });
    await signInWithPicker(page, DESKTOP_STUDENT);
    await page.goto(`${baseUrl}/student`);
    await homeEntry(page).getByText('New', { exact: true }).waitFor();
    await screenshot(page, 'watch-home-new-desktop');

    const view = await openFromHome(page);
    // The safety notes come first, with the line deferring to the school's own rules.
    await page.getByText('Safety notes before you watch').waitFor();
    await page
      .getByText(/school’s own safety rules|school's safety rules/)
      .first()
      .waitFor();
    await screenshot(page, 'watch-desktop-safety');
    await page.getByRole('button', { name: 'I have read the safety notes' }).click();
    await waitForPlayerReady(page);
    await expect.poll(async () => (await storedProgress(assignment.id, DESKTOP_STUDENT))?.safetyAcknowledgedAt ?? null).not.toBeNull();
    const acknowledgedAt = (await storedProgress(assignment.id, DESKTOP_STUDENT))?.safetyAcknowledgedAt;

    await installFrameProbe(page);
    await pressPlay(page);
    await chooseSpeed(page, '2x');

    // Aside: shown beside the video while it keeps playing.
    const aside = page.getByRole('complementary', { name: 'Aside: Watch the magnet' });
    await aside.waitFor();
    await screenshot(page, 'watch-desktop-note-aside');

    // Gate: multiple choice. It cannot be skipped, seeking past it comes back, play is refused.
    const stopChoice = await expectStopAt(page, AT.choice, FRAME_MS);
    expect(stopChoice.rate).toBe(2);
    const choice = panelOf(page, 'Why so slow?');
    await choice.waitFor();
    await screenshot(page, 'watch-desktop-multiple-choice');
    expect(await choice.getByRole('button', { name: 'Skip for now' }).count()).toBe(0);
    await seekVideo(page, 9000);
    await choice.getByText(/Answer this checkpoint before going past/).waitFor();
    await tryToPlay(page);
    await page.waitForTimeout(300);
    const held = await videoState(page);
    expect(held.paused).toBe(true);
    expect(Math.abs(held.currentMs - AT.choice)).toBeLessThanOrEqual(FRAME_MS + 1);

    await choice.getByRole('radio', { name: ANSWERS.choiceWrong }).check();
    await choice.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(choice, 'Not right yet').waitFor();
    await choice.getByText(ANSWERS.choiceWrongFeedback).waitFor();
    await choice.getByText(ANSWERS.choiceHint).waitFor();
    await screenshot(page, 'watch-desktop-multiple-choice-wrong');
    await choice.getByRole('button', { name: 'Try again' }).click();
    await choice.getByRole('radio', { name: ANSWERS.choiceRight }).check();
    await choice.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(choice, 'Right').waitFor();
    await continueFrom(page, choice);

    // Gate: numeric with this student's drawn values, graded on the server with those values.
    await expectStopAt(page, AT.numeric, FRAME_MS);
    const numeric = panelOf(page, 'Field of one ring');
    const numericView = checkpointOf(view, KEYS.numeric, 'numeric');
    for (const value of Object.values(numericView.values)) await numeric.getByText(value, { exact: false }).first().waitFor();
    const right = coilCentreFieldMicrotesla(numericView.values);
    const field = numeric.getByRole('textbox', { name: /Your answer/ });
    // A length where a field is asked: the input says so before sending; the server does not record it.
    await field.fill('3 cm');
    await numeric
      .getByText(/length/i)
      .first()
      .waitFor();
    await screenshot(page, 'watch-desktop-numeric');
    const invalidReply = page.waitForResponse(
      (response) => response.url().endsWith(`/api${watchPath()}/responses`) && response.request().method() === 'POST',
    );
    await numeric.getByRole('button', { name: 'Check my answer' }).click();
    const invalid = (await (await invalidReply).json()) as ResponseResultDto;
    expect([invalid.grade.invalid, invalid.attempt, invalid.responseId]).toEqual([true, null, null]);
    await numeric
      .getByText(/is a length; this question asks for a magnetic field/)
      .first()
      .waitFor();
    expect(await verdict(numeric, 'Not right yet').count()).toBe(0);
    // Out by a power of ten, sent with a double click: one attempt, one row.
    const wrongText = typed(right * 10, 'uT');
    await field.fill(wrongText);
    await numeric.getByRole('button', { name: 'Check my answer' }).dblclick();
    await verdict(numeric, 'Not right yet').waitFor();
    await numeric
      .getByText(/power of ten/)
      .first()
      .waitFor();
    await numeric.getByText(ANSWERS.numericHints[0]).waitFor();
    await numeric.getByText('2 attempts left.').waitFor();
    await screenshot(page, 'watch-desktop-numeric-wrong');
    await numeric.getByRole('button', { name: 'Try again' }).click();
    const rightText = typed(right, 'uT');
    await numeric.getByRole('textbox', { name: /Your answer/ }).fill(rightText);
    await numeric.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(numeric, 'Right').waitFor();
    await continueFrom(page, numeric);

    // Pause: the equation card with its live model.
    await expectStopAt(page, AT.equation, FRAME_MS);
    const equation = panelOf(page, 'Field on the axis');
    await equation.locator('.katex').first().waitFor();
    await equation.getByRole('slider').first().waitFor();
    await screenshot(page, 'watch-desktop-equation');
    await continueFrom(page, equation);

    // Pause: check your sign, with its diagram.
    await expectStopAt(page, AT.sign, FRAME_MS);
    const sign = panelOf(page, 'Direction at the centre');
    await screenshot(page, 'watch-desktop-sign');
    await sign.getByRole('button', { name: ANSWERS.signRight }).click();
    await sign.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(sign, 'Right').waitFor();

    // Reload mid-lesson: no second safety acknowledgement, an offer to resume, the answers kept.
    await page.reload();
    await waitForPlayerReady(page);
    expect(await page.getByRole('button', { name: 'I have read the safety notes' }).count()).toBe(0);
    const resume = page.getByRole('button', { name: /^Resume at/ });
    await resume.waitFor();
    await screenshot(page, 'watch-desktop-resume-offer');
    await page.getByRole('button', { name: /Why so slow\?, done/ }).waitFor();
    await page.getByRole('button', { name: /Direction at the centre, done/ }).waitFor();
    await installFrameProbe(page);
    await resume.click();
    // The video jumps to where it stopped (at 1x it would take seconds to play there).
    await expect
      .poll(async () => (await videoState(page)).currentMs, { timeout: 2000, interval: 50 })
      .toBeGreaterThanOrEqual(AT.sign - FRAME_MS - 1);
    // The equation card before the resume point takes no answer: it was seen before the reload and
    // does not come back; nor do the answered checkpoints and the gates.
    await expect.poll(async () => (await videoState(page)).currentMs > AT.sign + 50, { timeout: 10_000 }).toBe(true);
    expect(await panelOf(page, 'Field on the axis').count()).toBe(0);
    await chooseSpeed(page, '2x');

    // Gate: short text, answered with the connection gone. The gate opens once the answer is queued.
    await expectStopAt(page, AT.shortText, FRAME_MS);
    const shortText = panelOf(page, 'Name the currents');
    await screenshot(page, 'watch-desktop-short-text');
    await page.context().setOffline(true);
    await shortText.getByRole('textbox', { name: 'Your answer' }).fill(ANSWERS.shortTextRight);
    await shortText.getByRole('button', { name: 'Check my answer' }).click();
    await page
      .getByText(/Waiting for connection/)
      .first()
      .waitFor();
    await shortText.getByText(/saved on this device/i).waitFor();
    await shortText.getByRole('button', { name: 'Continue' }).waitFor();
    await screenshot(page, 'watch-desktop-short-text-offline');
    expect(attemptsByKey(await storedResponses(assignment.id, DESKTOP_STUDENT))[KEYS.shortText]).toBeUndefined();
    await page.context().setOffline(false);
    await verdict(shortText, 'Right').waitFor({ timeout: 30_000 });
    // The page's send status says so honestly once nothing is left on the device.
    await page
      .getByRole('status')
      .filter({ hasText: /^Saved/ })
      .and(page.locator('[data-send-state="saved"]'))
      .waitFor();
    await continueFrom(page, shortText);

    // Gate: a prediction, saved with a double click, and its reveal later with an explanation.
    await expectStopAt(page, AT.prediction, FRAME_MS);
    const prediction = panelOf(page, 'Predict: further down');
    await screenshot(page, 'watch-desktop-prediction');
    await prediction.getByRole('radio', { name: ANSWERS.predictionChoice }).check();
    await prediction.getByRole('button', { name: 'Save my prediction' }).dblclick();
    await verdict(prediction, 'Saved').waitFor();
    await continueFrom(page, prediction);

    await expectStopAt(page, AT.reveal, FRAME_MS);
    const reveal = panelOf(page, 'Predict: further down');
    await reveal.getByRole('region', { name: 'Your prediction' }).getByText(ANSWERS.predictionChoice).waitFor();
    await reveal.getByRole('textbox', { name: /Explain the difference/ }).fill('I expected it to speed up like a dropped stone.');
    const show = reveal.getByRole('button', { name: 'Show what happened' });
    await ((await show.count()) ? show : reveal.getByRole('button', { name: 'Send my explanation' })).click();
    await reveal.getByText(ANSWERS.revealText).waitFor();
    await reveal.getByText('I expected it to speed up like a dropped stone.').waitFor();
    await screenshot(page, 'watch-desktop-prediction-reveal');
    await continueFrom(page, reveal);
    await expect.poll(async () => (await videoState(page)).ended, { timeout: 20_000 }).toBe(true);
    await screenshot(page, 'watch-desktop-finished');

    // Done on the home once the viewing reports are in.
    await expect
      .poll(
        async () => {
          await page.goto(`${baseUrl}/student`);
          await homeEntry(page).waitFor();
          return homeEntry(page).getByText('Done', { exact: true }).count();
        },
        { timeout: 30_000, interval: 1000 },
      )
      .toBeGreaterThan(0);
    await screenshot(page, 'watch-home-done-desktop');

    // Exactly once: one row per attempt, none for the unreadable answer, none doubled by the
    // double clicks, the offline answer once, the prediction's explanation as its own row.
    const rows = await storedResponses(assignment.id, DESKTOP_STUDENT);
    expect(attemptsByKey(rows)).toEqual({
      [KEYS.choice]: [1, 2],
      [KEYS.numeric]: [1, 2],
      [KEYS.sign]: [1],
      [KEYS.shortText]: [1],
      [KEYS.prediction]: [1],
    });
    expect(rows.filter((row) => row.isExplanation).map((row) => row.checkpointKey)).toEqual([KEYS.prediction]);
    expect(rows.filter((row) => row.checkpointKey === KEYS.numeric && !row.isExplanation).map((row) => row.rawText)).toEqual([
      wrongText,
      rightText,
    ]);
    expect(new Set(rows.map((row) => row.idempotencyKey)).size).toBe(rows.length);
    const grades = await storedGrades(assignment.id, DESKTOP_STUDENT);
    expect(grades).toHaveLength(rows.length);
    expect(new Set(grades.map((grade) => grade.source))).toEqual(new Set(['engine']));
    const latest = (key: string) => grades.filter((grade) => grade.checkpointKey === key).at(-1)?.correct;
    expect([KEYS.choice, KEYS.numeric, KEYS.sign, KEYS.shortText].map(latest)).toEqual([true, true, true, true]);
    const progress = await storedProgress(assignment.id, DESKTOP_STUDENT);
    expect(progress?.safetyAcknowledgedAt).toEqual(acknowledgedAt);
    expect(progress?.completedAt).not.toBeNull();
    expect(progress?.watchedSeconds).toBeGreaterThanOrEqual(9);
  }, 300_000);

  it('works at phone width: every kind on screen without sideways scrolling, inline video', async () => {
    const page = await openPage({ width: 390, height: 844, mobile: true });
    await signInWithPicker(page, PHONE_STUDENT);
    await page.goto(`${baseUrl}/student`);
    await homeEntry(page).waitFor();
    expect(await pageScrollWidth(page)).toBeLessThanOrEqual(390);
    await screenshot(page, 'watch-home-phone');
    const view = await openFromHome(page);
    await page.getByText('Safety notes before you watch').waitFor();
    const shot = async (name: string) => {
      expect(await pageScrollWidth(page), `${name} scrolls sideways`).toBeLessThanOrEqual(390);
      await screenshot(page, name);
    };
    await shot('watch-phone-safety');
    await page.getByRole('button', { name: 'I have read the safety notes' }).click();
    await waitForPlayerReady(page);
    expect((await videoState(page)).playsInline).toBe(true);
    await installFrameProbe(page);
    await pressPlay(page);
    await chooseSpeed(page, '2x');

    await page.getByRole('complementary', { name: 'Aside: Watch the magnet' }).waitFor();
    await shot('watch-phone-note-aside');

    await expectStopAt(page, AT.choice, FRAME_MS);
    const choice = panelOf(page, 'Why so slow?');
    await shot('watch-phone-multiple-choice');
    await choice.getByRole('radio', { name: ANSWERS.choiceRight }).check();
    await choice.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(choice, 'Right').waitFor();
    await shot('watch-phone-multiple-choice-right');
    await continueFrom(page, choice);

    await expectStopAt(page, AT.numeric, FRAME_MS);
    const numeric = panelOf(page, 'Field of one ring');
    const right = coilCentreFieldMicrotesla(checkpointOf(view, KEYS.numeric, 'numeric').values);
    await numeric.getByRole('textbox', { name: /Your answer/ }).fill(typed(right, 'uT'));
    await shot('watch-phone-numeric');
    await numeric.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(numeric, 'Right').waitFor();
    await continueFrom(page, numeric);

    await expectStopAt(page, AT.equation, FRAME_MS);
    const equation = panelOf(page, 'Field on the axis');
    await equation.locator('.katex').first().waitFor();
    await shot('watch-phone-equation');
    await continueFrom(page, equation);

    await expectStopAt(page, AT.sign, FRAME_MS);
    const sign = panelOf(page, 'Direction at the centre');
    await shot('watch-phone-sign');
    await sign.getByRole('button', { name: ANSWERS.signRight }).click();
    await sign.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(sign, 'Right').waitFor();
    await continueFrom(page, sign);

    await expectStopAt(page, AT.shortText, FRAME_MS);
    const shortText = panelOf(page, 'Name the currents');
    await shortText.getByRole('textbox', { name: 'Your answer' }).fill('ripple currents');
    await shortText.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(shortText, 'Not right yet').waitFor();
    await shot('watch-phone-short-text-wrong');
    await shortText.getByRole('button', { name: 'Try again' }).click();
    await shortText.getByRole('textbox', { name: 'Your answer' }).fill(ANSWERS.shortTextRight);
    await shortText.getByRole('button', { name: 'Check my answer' }).click();
    await verdict(shortText, 'Right').waitFor();
    await continueFrom(page, shortText);

    await expectStopAt(page, AT.prediction, FRAME_MS);
    const prediction = panelOf(page, 'Predict: further down');
    await shot('watch-phone-prediction');
    await prediction.getByRole('radio', { name: ANSWERS.predictionChoice }).check();
    await prediction.getByRole('button', { name: 'Save my prediction' }).click();
    await verdict(prediction, 'Saved').waitFor();
    await continueFrom(page, prediction);

    await expectStopAt(page, AT.reveal, FRAME_MS);
    const reveal = panelOf(page, 'Predict: further down');
    const show = reveal.getByRole('button', { name: 'Show what happened' });
    if (await show.count()) await show.click();
    await reveal.getByText(ANSWERS.revealText).waitFor();
    await shot('watch-phone-prediction-reveal');
    await continueFrom(page, reveal);
    await expect.poll(async () => (await videoState(page)).ended, { timeout: 20_000 }).toBe(true);
    await shot('watch-phone-finished');

    expect(attemptsByKey(await storedResponses(assignment.id, PHONE_STUDENT))).toEqual({
      [KEYS.choice]: [1],
      [KEYS.numeric]: [1],
      [KEYS.sign]: [1],
      [KEYS.shortText]: [1, 2],
      [KEYS.prediction]: [1],
    });
  }, 240_000);
});
