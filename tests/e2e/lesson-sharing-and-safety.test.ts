import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { apiAs, readyRecordingId } from './support/api';
import { baseUrl, openPage, screenshot } from './support/browser';
import { signInWithPicker } from './support/sign-in';

const OWNER = 'bram.ostrowe@fernhollow.example';
const COLLEAGUE = 'ada.quillfeather@fernhollow.example';
const SUBSTITUTE = 'dov.pellring@fernhollow.example';
const SCHOOL = 'Fernhollow Academy (demo)';

interface LessonDto {
  id: string;
  revision: number;
  draft: { settings: Record<string, unknown>; chapters: unknown[]; checkpoints: unknown[] };
}
interface MeDto {
  memberships: { schoolId: string; schoolName: string }[];
}
// Only what these checks read of the DOM (its types are not in the Node-side tsconfig).
interface Flagged {
  __injected?: number;
}
interface WindowLike {
  document: { documentElement: { scrollWidth: number } };
}

/** Acts in the demo school as a substitute (Dov covers two schools). */
async function actInDemoSchool(page: Page, role: string): Promise<void> {
  const me = await apiAs<MeDto>(page, 'GET', '/me');
  const school = me.body.memberships.find((membership) => membership.schoolName === SCHOOL);
  if (!school) throw new Error(`${SCHOOL} is not among the memberships.`);
  const switched = await apiAs(page, 'PUT', '/me/active', { schoolId: school.schoolId, role });
  expect(switched.status).toBe(200);
}

/** A draft made through the API, for what these tests check (the studio itself is tested elsewhere). */
async function lessonWith(page: Page, title: string, settings: Record<string, unknown>): Promise<LessonDto> {
  const recordingId = await readyRecordingId(page, 'Demo: magnet through a copper tube');
  const created = await apiAs<LessonDto>(page, 'POST', '/lessons', {
    recordingId,
    title,
    description: '',
    tags: ['e2e'],
    level: '',
    safetyNotes: '',
  });
  expect(created.status).toBe(201);
  const content = { ...created.body.draft, settings: { ...created.body.draft.settings, ...settings } };
  const saved = await apiAs(page, 'PUT', `/lessons/${created.body.id}/draft`, { revision: created.body.revision, content });
  expect(saved.status).toBe(200);
  return created.body;
}

const INJECTIONS = [
  '<img src=x onerror="window.__injected = 1">',
  '[a javascript link](javascript:window.__injected=2)',
  'Inline math with a link: $\\href{javascript:window.__injected=3}{click}$ and $\\url{javascript:window.__injected=4}$',
  'A class: $\\htmlClass{injected-class}{x}$ and a style: $\\htmlStyle{position:fixed}{y}$',
  '<script>window.__injected = 5</script>',
].join('\n\n');

async function expectInert(page: Page): Promise<void> {
  expect(await page.evaluate(() => (globalThis as unknown as Flagged).__injected)).toBeUndefined();
  const count = (selector: string) => page.locator(selector).count();
  expect(await count('a[href^="javascript:"]')).toBe(0);
  expect(await count('.injected-class')).toBe(0);
  expect(await count('main script, main img[src="x"]')).toBe(0);
  // Raw HTML is shown as the text it is.
  await page.getByText('<img src=x onerror="window.__injected = 1">').first().waitFor();
}

describe('sharing, safe rendering and lesson files', () => {
  it('shows raw HTML and dangerous LaTeX as inert text in the real browser', async () => {
    const page = await openPage();
    page.on('dialog', (dialog) => void dialog.dismiss());
    await signInWithPicker(page, OWNER);
    const lesson = await lessonWith(page, 'E2E: injection attempts', { description: INJECTIONS, safetyNotes: INJECTIONS });
    await page.goto(`${baseUrl}/teacher/lessons/${lesson.id}`);
    await page.getByRole('heading', { name: 'E2E: injection attempts' }).waitFor();
    await expectInert(page);
    await screenshot(page, 'lesson-injection-overview');
    await page.goto(`${baseUrl}/teacher/lessons/${lesson.id}/preview`);
    await page.getByText('Safety notes before you watch').waitFor();
    await expectInert(page);
  });

  it('lets a colleague and a substitute view and copy a shared lesson, never edit it', async () => {
    const owner = await openPage();
    await signInWithPicker(owner, OWNER);
    const lesson = await lessonWith(owner, 'E2E: shared with the department', {});
    expect((await apiAs(owner, 'PATCH', `/lessons/${lesson.id}`, { shared: true })).status).toBe(200);
    const content = { ...lesson.draft, settings: { ...lesson.draft.settings, title: 'Changed by someone else' } };

    const colleague = await openPage();
    await signInWithPicker(colleague, COLLEAGUE);
    await colleague.goto(`${baseUrl}/teacher/lessons/${lesson.id}/studio`);
    await colleague.getByText('Only the lesson’s owner edits it').waitFor();
    const refusedColleague = await apiAs(colleague, 'PUT', `/lessons/${lesson.id}/draft`, { revision: 1, content });
    expect(refusedColleague.status).toBe(403);

    const substitute = await openPage();
    await signInWithPicker(substitute, SUBSTITUTE);
    await actInDemoSchool(substitute, 'substitute');
    await substitute.goto(`${baseUrl}/substitute/lessons`);
    await substitute.getByRole('link', { name: 'Open E2E: shared with the department' }).click();
    await substitute.getByRole('heading', { name: 'E2E: shared with the department' }).waitFor();
    expect(await substitute.getByRole('link', { name: /studio/i }).count()).toBe(0);
    const refusedSubstitute = await apiAs(substitute, 'PUT', `/lessons/${lesson.id}/draft`, { revision: 1, content });
    expect(refusedSubstitute.status).toBe(403);
    await screenshot(substitute, 'lesson-shared-substitute');
    // A copy is the substitute's own, to change as they like; the original is untouched.
    await substitute.getByRole('button', { name: /^Duplicate/ }).click();
    await substitute.getByRole('heading', { name: 'Copy of E2E: shared with the department' }).waitFor();
    const original = await apiAs<{ title: string; revision: number }>(owner, 'GET', `/lessons/${lesson.id}`);
    expect(original.body).toMatchObject({ title: 'E2E: shared with the department', revision: 1 });
  });

  it('refuses a malformed lesson file, naming the line of each problem', async () => {
    const page = await openPage();
    await signInWithPicker(page, OWNER);
    await readyRecordingId(page, 'Demo: current balance');
    await page.goto(`${baseUrl}/teacher/lessons`);
    await page.getByRole('button', { name: 'Import lesson file' }).click();
    await page.getByLabel('Recording').selectOption({ index: 1 });
    const file = [
      '{',
      '  "format": "pinfield.lesson",',
      '  "formatVersion": 1,',
      '  "lesson": {',
      '    "settings": { "title": "Broken", "description": "", "tags": [], "level": "", "safetyNotes": "", "minSpacingMs": 500 },',
      '    "chapters": [],',
      '    "checkpoints": [',
      '      { "kind": "note", "key": "abcdef123456", "atMs": "soon", "label": "", "behaviour": "aside", "tone": "remark", "body": "x" }',
      '    ]',
      '  }',
      '}',
    ].join('\n');
    await page
      .getByLabel('Lesson file', { exact: true })
      .setInputFiles({ name: 'broken.pinfield-lesson.json', mimeType: 'application/json', buffer: Buffer.from(file) });
    await page.getByRole('button', { name: 'Import lesson', exact: true }).click();
    const problems = page.getByRole('list', { name: 'Problems in the lesson file' });
    await problems.getByText(/line 8/).waitFor();
    await screenshot(page, 'lesson-import-refused');
  });

  it('pauses the preview exactly at the pin on a phone, and shows the checkpoint below the video', async () => {
    const page = await openPage({ width: 390, height: 844, mobile: true });
    await signInWithPicker(page, COLLEAGUE);
    const list = await apiAs<{ lessons: { id: string; title: string }[] }>(page, 'GET', '/lessons');
    const demo = list.body.lessons.find((lesson) => lesson.title.startsWith('Current balance'));
    if (!demo) throw new Error('The demo lesson “Current balance…” was not seeded.');
    await page.goto(`${baseUrl}/teacher/lessons/${demo.id}/preview`);
    await page.getByRole('button', { name: 'I have read the safety notes' }).click();
    const player = page.locator('[data-lesson-player]');
    await player.and(page.locator('[data-ready="true"]')).waitFor();
    await page.locator('[data-lesson-player] video').evaluate((video) => (video as unknown as { play(): Promise<void> }).play());
    await player.and(page.locator('[data-stop-ms]')).waitFor({ timeout: 20_000 });
    const stopMs = Number(await player.getAttribute('data-stop-ms'));
    const atMs = await page.$eval(
      '[data-lesson-player] video',
      (video) => (video as unknown as { currentTime: number }).currentTime * 1000,
    );
    // The demo recordings are 24 fps: within one frame of the pin.
    expect(Math.abs(atMs - stopMs)).toBeLessThanOrEqual(1000 / 24 + 1);
    const width = await page.evaluate(() => (globalThis as unknown as WindowLike).document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(390);
    await screenshot(page, 'lesson-preview-phone');
  });
});
