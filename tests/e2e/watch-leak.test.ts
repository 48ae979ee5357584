import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import type { AssignmentDto, WatchViewDto } from '@core/contracts';
import { ALLOWED_KEYS, CANARY, canariesIn, canaryContent } from '../../api/src/features/watch/canary-lesson.test-support';
import { baseUrl, openPage, screenshot } from './support/browser';
import { assignLesson, publishLesson, runTag, type PublishedLesson } from './support/lessons';
import { recordBodies, type LoadedBody } from './support/response-bodies';
import { signInWithPicker } from './support/sign-in';
import { panelOf, playerOf, pressPlay, waitForPlayerReady } from './support/watch-page';

// The canary lesson is the API leak test's (every hidden field of every kind holds its own marker);
// here it is published for real and watched in the browser.
const TEACHER = 'ada.quillfeather@fernhollow.example';
const STUDENT = 'mira.coppervale@fernhollow.example';
const RECORDING = 'Demo: pendulum timing (phone, portrait)';
const CHOICE_AT_MS = 500;

let lesson: PublishedLesson;
let assignment: AssignmentDto;

beforeAll(async () => {
  const teacher = await openPage();
  await signInWithPicker(teacher, TEACHER);
  lesson = await publishLesson(teacher, RECORDING, (recording) => {
    const content = canaryContent();
    return {
      ...content,
      settings: { ...content.settings, title: `E2E canaries ${runTag()}` },
      // The last chapter ends where the recording really does.
      chapters: content.chapters.map((chapter) => ({ ...chapter, endMs: Math.min(chapter.endMs, recording.durationMs) })),
    };
  });
  assignment = await assignLesson(teacher, lesson, { className: '10F Physics', feedback: 'immediately', reveal: 'after-last-attempt' });
  await teacher.context().close();
});

/** Each canary found, with where: "mcHint1 in GET http://…/watch". */
function leaks(bodies: readonly LoadedBody[], allowed: readonly string[] = []): string[] {
  return bodies.flatMap((body) =>
    canariesIn(body.text)
      .filter((name) => !allowed.includes(name))
      .map((name) => `${name} in ${body.method} ${body.url} (${body.contentType})`),
  );
}

/** Sends the open multiple-choice panel's answer and returns the reply's body as text. */
async function answerChoice(page: Page, option: string): Promise<string> {
  const panel = panelOf(page, 'Multiple choice');
  const reply = page.waitForResponse(
    (r) => r.url().endsWith(`/api/student/assignments/${assignment.id}/responses`) && r.request().method() === 'POST',
  );
  await panel.getByRole('radio', { name: option, exact: true }).check();
  await panel.getByRole('button', { name: 'Check my answer' }).click();
  const response = await reply;
  expect(response.status()).toBeLessThan(300);
  return response.text();
}

describe('the watch page never receives an answer key before the student answered', () => {
  it('scans every body the page loads (HTML, scripts, JSON, WebVTT) for every canary, before and after answers', async () => {
    const page = await openPage({ width: 1280, height: 800 });
    await signInWithPicker(page, STUDENT);
    const loaded = recordBodies(page);
    const watchPath = `/student/assignments/${assignment.id}`;
    await page.goto(`${baseUrl}/student`);
    const link = page.locator(`a[href="${watchPath}"]`).first();
    await link.waitFor();
    const viewLoaded = page.waitForResponse((r) => r.url().endsWith(`/api${watchPath}/watch`) && r.request().method() === 'GET');
    await link.click();
    const view = (await (await viewLoaded).json()) as WatchViewDto;

    // The view is the allow-list and nothing more.
    expect(view.view.checkpoints.length).toBe(lesson.content.checkpoints.length);
    for (const checkpoint of view.view.checkpoints) {
      expect(
        Object.keys(checkpoint).filter((key) => !ALLOWED_KEYS[checkpoint.kind].includes(key)),
        checkpoint.key,
      ).toEqual([]);
    }

    await page.getByRole('button', { name: 'I have read the safety notes' }).click();
    await waitForPlayerReady(page);
    await pressPlay(page);
    await playerOf(page)
      .and(page.locator(`[data-stop-ms="${CHOICE_AT_MS}"]`))
      .waitFor({ timeout: 30_000 });
    await page.waitForLoadState('networkidle');

    // Every track the student may load, whether or not the player asked for it yet; and the lesson's
    // own files and views, which are for staff and refused to a student.
    const request = page.context().request;
    const trackUrls = [...view.playback.captions.map((caption) => caption.url), view.playback.thumbnailsUrl].filter(
      (url): url is string => url !== null,
    );
    expect(trackUrls.length).toBeGreaterThan(0);
    const staffOnly = ['', '/preview', '/versions', '/versions/1', '/checkpoints.vtt', '/chapters.vtt', '/export'].map(
      (suffix) => `/api/lessons/${lesson.lessonId}${suffix}`,
    );
    for (const url of [...trackUrls, ...staffOnly]) {
      const response = await request.get(new URL(url, baseUrl).toString());
      if (staffOnly.includes(url)) expect([403, 404], `${url} answered a student with ${response.status()}`).toContain(response.status());
      else expect(response.status(), url).toBe(200);
      loaded.bodies.push({
        url,
        method: 'GET',
        status: response.status(),
        contentType: response.headers()['content-type'] ?? '',
        text: await response.text(),
      });
    }
    await loaded.settle();
    const kinds = loaded.bodies.map((body) => body.contentType);
    for (const kind of ['text/html', 'javascript', 'application/json', 'text/vtt']) {
      expect(
        kinds.some((type) => type.includes(kind)),
        `a ${kind} body was scanned`,
      ).toBe(true);
    }
    expect(leaks(loaded.bodies)).toEqual([]);
    await screenshot(page, 'watch-leak-first-stop');

    // A wrong answer: its own feedback and the first hint, nothing that tells the right answer.
    const before = loaded.bodies.length;
    const wrongReply = await answerChoice(page, 'Anticlockwise');
    expect(canariesIn(wrongReply).sort()).toEqual(['mcFeedbackWrong', 'mcHint1']);
    const shown = ['mcFeedbackWrong', 'mcHint1'];
    await panelOf(page, 'Multiple choice').getByText(CANARY.mcFeedbackWrong).waitFor();
    await page.waitForLoadState('networkidle');
    await loaded.settle();
    expect(leaks(loaded.bodies.slice(before), shown)).toEqual([]);

    // The right answer on the second try: now it may be revealed, with the explanation.
    await panelOf(page, 'Multiple choice').getByRole('button', { name: 'Try again' }).click();
    const rightReply = await answerChoice(page, 'Clockwise');
    const afterRight = canariesIn(rightReply);
    expect(afterRight).toContain('mcExplanation');
    expect(afterRight.filter((name) => !['mcFeedbackRight', 'mcExplanation', ...shown].includes(name))).toEqual([]);
    await page.waitForLoadState('networkidle');
    await loaded.settle();
    // Nothing of any other checkpoint, anywhere, at any time.
    expect(leaks(loaded.bodies, [...shown, 'mcFeedbackRight', 'mcExplanation'])).toEqual([]);
    await screenshot(page, 'watch-leak-after-answers');
  }, 180_000);
});
