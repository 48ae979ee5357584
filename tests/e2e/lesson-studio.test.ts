import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { apiAs, readyRecordingId } from './support/api';
import { baseUrl, openPage, screenshot } from './support/browser';
import { signInWithPicker } from './support/sign-in';

// Bram builds his own lessons, apart from the demo lessons seeded for Ada.
const TEACHER = 'bram.ostrowe@fernhollow.example';
const RECORDING = 'Demo: current balance';

// The DOM's element types are not in the Node-side tsconfig: only what these steps touch.
interface VideoLike {
  currentTime: number;
}
interface WindowLike {
  document: { activeElement: { blur?: () => void } | null };
}

/** Moves the studio's video to `seconds` (a whole number of 24 fps frames) and waits for the pin button to follow. */
async function seekTo(page: Page, seconds: number): Promise<void> {
  await page.locator('video').evaluate((video, s) => {
    (video as unknown as VideoLike).currentTime = s;
  }, seconds);
  const label = `0:${String(Math.floor(seconds)).padStart(2, '0')}.${String(Math.round((seconds % 1) * 1000)).padStart(3, '0')}`;
  await page.getByRole('button', { name: `Pin at ${label}` }).waitFor();
}

/** Leaves any field, so the studio's keyboard shortcuts apply. */
async function leaveFields(page: Page): Promise<void> {
  await page.evaluate(() => (globalThis as unknown as WindowLike).document.activeElement?.blur?.());
}

async function pinByKeyboard(page: Page, seconds: number, digit: number): Promise<void> {
  await seekTo(page, seconds);
  await leaveFields(page);
  await page.keyboard.press('p');
  await page.keyboard.press(String(digit));
}

async function pinByMouse(page: Page, seconds: number, kind: string): Promise<void> {
  await seekTo(page, seconds);
  await page.getByRole('button', { name: /^Pin at / }).click();
  await page
    .getByRole('group', { name: 'Checkpoint kinds' })
    .getByRole('button', { name: new RegExp(`^${kind}`) })
    .click();
}

/** A text field of the side panel, by its label. */
const textbox = (page: Page, name: string) => page.getByLabel('Side panel').getByRole('textbox', { name, exact: true });

async function createLessonInBrowser(page: Page, title: string): Promise<string> {
  const recordingId = await readyRecordingId(page, RECORDING);
  await page.goto(`${baseUrl}/teacher/lessons/new?recording=${recordingId}`);
  await page.getByLabel('Title').fill(title);
  const tags = page.getByLabel('Topic tags');
  await tags.fill('coil');
  await tags.press('Enter');
  // The tags mention a coil: the studio offers the usual cautions for cells and coils.
  await page
    .getByRole('button', { name: /^Add to safety notes/ })
    .first()
    .click();
  await page.getByRole('button', { name: 'Create the lesson' }).click();
  await page.waitForURL(/\/teacher\/lessons\/[0-9a-f-]+\/studio$/);
  await page
    .getByText(/^Saved/)
    .first()
    .waitFor({ timeout: 20_000 });
  return page.url().split('/').at(-2) ?? '';
}

describe('the lesson studio', () => {
  it('builds a lesson: every kind pinned by keyboard and mouse, edited, dragged, published, reopened', async () => {
    const page = await openPage({ width: 1440, height: 900 });
    await signInWithPicker(page, TEACHER);
    const lessonId = await createLessonInBrowser(page, 'E2E: force on a wire');

    await pinByMouse(page, 0.5, 'Prediction');
    await textbox(page, 'Question').fill('What will the wire do when the current is switched on?');
    await textbox(page, 'Choice 1 text').fill('Jump up');
    await textbox(page, 'Choice 2 text').fill('Stay still');
    await textbox(page, 'Reveal text').fill('The wire jumps: a force acts on a current in a field.');
    await screenshot(page, 'studio-form-prediction');

    await pinByKeyboard(page, 1, 1);
    await textbox(page, 'Question').fill('Which way is the force on the wire?');
    await textbox(page, 'Option 1 text').fill('Up');
    await textbox(page, 'Option 2 text').fill('Down');
    await screenshot(page, 'studio-form-multiple-choice');

    await pinByKeyboard(page, 2, 2);
    await textbox(page, 'Question').fill('A coil of {{N}} turns and radius {{a}} carries {{I}}. What is the field at its centre?');
    const variables: [string, string, string][] = [
      ['N', '20', ''],
      ['a', '5', 'cm'],
      ['I', '2', 'A'],
    ];
    for (const [index, [name, value, unit]] of variables.entries()) {
      await page.getByLabel('Side panel').getByRole('button', { name: 'Add a variable' }).click();
      const n = index + 1;
      await textbox(page, `Variable ${n} name`).fill(name);
      await textbox(page, `Variable ${n} smallest value`).fill(value);
      await textbox(page, `Variable ${n} largest value`).fill(value);
      await textbox(page, `Variable ${n} step`).fill('1');
      await textbox(page, `Variable ${n} unit`).fill(unit);
    }
    await textbox(page, 'Expected answer').fill('mu0*N*I/(2*a)');
    await textbox(page, 'Asked unit').fill('mT');
    // The form computes the expected answer as the teacher types (B = μ0·N·I/(2R): OpenStax University Physics
    // Vol. 2, §12.4; 4π×10⁻⁷ × 20 × 2 / (2 × 0.05) T = 0.5027 mT).
    await page
      .getByLabel('Side panel')
      .getByText(/0\.5027\s*mT/)
      .first()
      .waitFor();
    await screenshot(page, 'studio-form-numeric');

    await pinByMouse(page, 3, 'Short answer');
    await textbox(page, 'Question').fill('Name the rule that gives the direction of the force.');
    await textbox(page, 'Accepted answer 1 text').fill('left-hand rule');
    await screenshot(page, 'studio-form-short-text');

    await pinByKeyboard(page, 4, 4);
    await textbox(page, 'Formula (LaTeX)').fill('F = B I L \\sin\\theta');
    await screenshot(page, 'studio-form-equation');

    await pinByKeyboard(page, 5, 5);
    await textbox(page, 'Question').fill('Along which axis does the force point?');
    await screenshot(page, 'studio-form-sign');

    await pinByMouse(page, 6, 'Note');
    await textbox(page, 'Text').fill('Switch the current off between runs.');
    await screenshot(page, 'studio-form-note');

    // Drag the note's marker a second later along the timeline.
    const note = page.getByRole('button', { name: /^Note: .*, at 0:06\.000/ });
    const box = await note.boundingBox();
    const strip = await page.getByRole('region', { name: 'Timeline' }).boundingBox();
    if (!box || !strip) throw new Error('The note marker or the timeline is not on screen.');
    const pixelsPerSecond = (strip.width - 2) / 8;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width / 2 + pixelsPerSecond * 0.5, box.y + box.height / 2, { steps: 5 });
    await page.mouse.move(box.x + box.width / 2 + pixelsPerSecond, box.y + box.height / 2, { steps: 5 });
    await page.mouse.up();
    await page.getByRole('button', { name: /^Note: .*, at 0:0(6\.[5-9]|7\.[0-4])\d\d/ }).waitFor();

    // Nudge the equation card by one frame with the keyboard.
    await page.getByRole('button', { name: /^Equation card.*, at 0:04\.000/ }).focus();
    await page.keyboard.press('Enter');
    await leaveFields(page);
    await page.keyboard.press('.');
    await page.getByRole('button', { name: /^Equation card.*, at 0:04\.042/ }).waitFor();
    await screenshot(page, 'studio-timeline-every-kind');

    await page.getByText('No problems: this draft is ready to publish.').waitFor({ timeout: 20_000 });
    await page
      .getByText(/^Saved/)
      .first()
      .waitFor({ timeout: 20_000 });
    await page.getByRole('button', { name: 'Publish…' }).click();
    await page.getByLabel('Note for this version').fill('First version');
    await page.getByRole('button', { name: 'Publish version 1' }).click();
    await page
      .getByText(/^v1\b|Version 1/)
      .first()
      .waitFor({ timeout: 20_000 });

    // Reopened: the overview lists version 1 with its seven checkpoints added.
    await page.goto(`${baseUrl}/teacher/lessons/${lessonId}`);
    const versions = page.getByRole('list', { name: 'Versions' });
    await versions.getByText('First version').waitFor();
    const { body } = await apiAs<{ versions: { number: number; changes: { added: unknown[] } }[] }>(
      page,
      'GET',
      `/lessons/${lessonId}/versions`,
    );
    expect(body.versions.map((v) => [v.number, v.changes.added.length])).toEqual([[1, 7]]);
    await screenshot(page, 'lesson-overview-published');
  });

  it('keeps an autosaved edit across a reload, and stops two tabs from overwriting each other', async () => {
    const page = await openPage({ width: 1440, height: 900 });
    await signInWithPicker(page, TEACHER);
    const lessonId = await createLessonInBrowser(page, 'E2E: autosave and two tabs');
    await pinByKeyboard(page, 1, 7);
    await textbox(page, 'Text').fill('Typed just before a reload.');
    await page
      .getByText(/^Saved/)
      .first()
      .waitFor({ timeout: 20_000 });
    await page.reload();
    await page.getByRole('button', { name: /^Note: Typed just before a reload/ }).waitFor({ timeout: 20_000 });

    // A second tab of the same person edits and saves; the first tab's next edit meets a conflict.
    const second = await page.context().newPage();
    await second.goto(`${baseUrl}/teacher/lessons/${lessonId}/studio`);
    await second.getByRole('button', { name: /^Note: Typed just before a reload/ }).click();
    await textbox(second, 'Text').fill('Changed in the second tab.');
    await second
      .getByText(/^Saved/)
      .first()
      .waitFor({ timeout: 20_000 });

    await page.getByRole('button', { name: /^Note: Typed just before a reload/ }).click();
    await textbox(page, 'Text').fill('Changed in the first tab.');
    await page.getByText('Saving is paused: this lesson changed elsewhere').waitFor({ timeout: 20_000 });
    await screenshot(page, 'studio-conflict');
    // Nothing was overwritten: the stored draft is the second tab's.
    const stored = await apiAs<{ draft: { checkpoints: { body?: string }[] } }>(page, 'GET', `/lessons/${lessonId}`);
    expect(stored.body.draft.checkpoints[0]?.body).toBe('Changed in the second tab.');
    await page.getByRole('button', { name: 'Load the newer version' }).click();
    await page.getByRole('button', { name: /^Note: Changed in the second tab/ }).waitFor();
    await second.close();
  });
});

describe('a crowded timeline', () => {
  it('keeps every marker reachable when checkpoints sit half a second apart', async () => {
    const page = await openPage({ width: 1280, height: 800 });
    await signInWithPicker(page, TEACHER);
    const recordingId = await readyRecordingId(page, 'Demo: magnet through a copper tube');
    const created = await apiAs<{ id: string; revision: number; draft: { checkpoints: unknown[] } & Record<string, unknown> }>(
      page,
      'POST',
      '/lessons',
      { recordingId, title: 'E2E: crowded timeline', description: '', tags: [], level: '', safetyNotes: '' },
    );
    // Notes are the simplest complete checkpoint; the first test covers every kind's marker.
    const checkpoints = Array.from({ length: 18 }, (_, index) => ({
      key: `crowd${String(index).padStart(4, '0')}`,
      atMs: 500 + index * 500,
      label: `Remark ${index + 1}`,
      behaviour: 'aside',
      kind: 'note',
      tone: 'remark',
      body: `Remark ${index + 1}`,
    }));
    const saved = await apiAs(page, 'PUT', `/lessons/${created.body.id}/draft`, {
      revision: created.body.revision,
      content: { ...created.body.draft, checkpoints },
    });
    expect(saved.status).toBe(200);
    await page.goto(`${baseUrl}/teacher/lessons/${created.body.id}/studio`);
    const markers = page.getByRole('region', { name: 'Timeline' }).getByRole('button', { name: /^Note: / });
    await markers.first().waitFor();
    expect(await markers.count()).toBe(18);
    // Arrow keys walk the markers in time order.
    await markers.first().focus();
    await page.keyboard.press('ArrowRight');
    await page
      .getByRole('button', { name: /^Note: .*, at 0:01\.000/ })
      .and(page.locator(':focus'))
      .waitFor();
    await screenshot(page, 'studio-timeline-crowded');
  });
});
