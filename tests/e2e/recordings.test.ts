import { rm, stat } from 'node:fs/promises';
import type { Page, Request, Route } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeMediaDir, makePdf, makeVideo } from '../fixtures/media/generate';
import { baseUrl, openPage, screenshot } from './support/browser';
import { signInWithPicker } from './support/sign-in';

// The DOM's element types are not in the Node-side tsconfig: only what these checks read.
interface ImageFacts {
  complete: boolean;
  naturalWidth: number;
}
interface VideoFacts {
  readyState: number;
  textTracks: { length: number };
}

const TEACHER = 'bram.ostrowe@fernhollow.example';
let dir = '';

beforeAll(async () => {
  dir = await makeMediaDir('e2e');
});

afterAll(async () => {
  if (dir) await rm(dir, { recursive: true, force: true });
});

/** The part number of a presigned UploadPart PUT straight to storage, or null for any other request. */
function partNumberOf(request: Request): number | null {
  if (request.method() !== 'PUT') return null;
  const url = new URL(request.url());
  const part = url.searchParams.get('partNumber');
  return url.searchParams.has('uploadId') && part ? Number(part) : null;
}

async function openRecordings(page: Page): Promise<void> {
  await signInWithPicker(page, TEACHER);
  await page.goto(`${baseUrl}/teacher/recordings`);
  await page.getByRole('heading', { name: 'Library' }).waitFor();
}

/** The library row of a recording, found by its title. */
function libraryRow(page: Page, title: string) {
  return page.getByRole('row').filter({ has: page.getByRole('link', { name: title, exact: true }) });
}

describe('a teacher uploads recordings', () => {
  it('uploads a generated video through the page; it is processed to ready with a poster', async () => {
    const file = await makeVideo({
      dir,
      name: 'Fadenpendel Versuch é 1.mp4',
      seconds: 4,
      width: 1280,
      height: 720,
      fps: 30,
      codec: 'h264',
      audio: true,
    });
    const page = await openPage();
    await openRecordings(page);
    await page.getByLabel('Video files to upload').setInputFiles(file);
    const row = libraryRow(page, 'Fadenpendel Versuch é 1');
    await row
      .getByText(/^(Processing|Ready)/)
      .first()
      .waitFor({ timeout: 30_000 });
    await screenshot(page, 'recordings-upload-processing');
    await row.getByText('Ready', { exact: true }).waitFor({ timeout: 60_000 });
    const poster = row.getByRole('img');
    await expect
      .poll(() => poster.evaluate((img) => ((img as unknown as ImageFacts).complete ? (img as unknown as ImageFacts).naturalWidth : 0)), {
        timeout: 10_000,
      })
      .toBeGreaterThan(0);
    await screenshot(page, 'recordings-library-ready');
  });

  it('resumes an upload cut off midway after a reload, sending only the parts storage lacks', async () => {
    // About 10 MiB: a part of 8 MiB (partSizeFor) and a short last part, which is held back.
    const file = await makeVideo({
      dir,
      name: 'Resume test.mp4',
      seconds: 5,
      width: 1280,
      height: 720,
      fps: 30,
      codec: 'h264',
      audio: false,
      bitrateKbps: 16_000,
    });
    expect((await stat(file)).size).toBeGreaterThan(8 * 1024 * 1024);
    const page = await openPage();
    await openRecordings(page);
    const stored: number[] = [];
    page.on('requestfinished', (request) => {
      const part = partNumberOf(request);
      if (part !== null) stored.push(part);
    });
    // The connection drops while part 2 is on its way: it never arrives. Held requests are never
    // released (releasing one would let it reach storage); after the reload new ones go through.
    let connected = false;
    const held: Route[] = [];
    await page.route(/partNumber=2/, (route) => (connected ? route.continue() : void held.push(route)));
    await page.getByLabel('Video files to upload').setInputFiles(file);
    await expect.poll(() => [...stored].sort(), { timeout: 30_000 }).toEqual([1]);
    await expect.poll(() => held.length, { timeout: 30_000 }).toBeGreaterThan(0);
    await screenshot(page, 'recordings-uploading');

    // The page asks before leaving while an upload runs; leaving is the point here.
    page.on('dialog', (dialog) => void dialog.accept());
    await page.reload();
    connected = true;
    const unfinished = page.getByRole('list', { name: 'Unfinished uploads' });
    await unfinished.getByText('Resume test.mp4').waitFor();
    await unfinished.getByText(/^8 MiB of 9\.\d MiB stored/).waitFor();
    await screenshot(page, 'recordings-unfinished-after-reload');
    const sent: number[] = [];
    page.on('request', (request) => {
      const part = partNumberOf(request);
      if (part !== null) sent.push(part);
    });
    await page.getByLabel('File for Resume test.mp4').setInputFiles(file);
    await libraryRow(page, 'Resume test')
      .getByText(/^(Processing|Ready)/)
      .first()
      .waitFor({ timeout: 30_000 });
    expect(sent).toEqual([2]);
  });

  it('keeps a file queued while storage is unreachable and sends it on Retry', async () => {
    const file = await makeVideo({
      dir,
      name: 'Storage outage.mp4',
      seconds: 2,
      width: 640,
      height: 360,
      fps: 25,
      codec: 'h264',
      audio: true,
    });
    const page = await openPage();
    await openRecordings(page);
    await page.route(/uploadId=/, (route) => route.abort('connectionrefused'));
    await page.getByLabel('Video files to upload').setInputFiles(file);
    await page.getByText(/Storage is not reachable right now/).waitFor({ timeout: 60_000 });
    await screenshot(page, 'recordings-storage-down');
    await page.unroute(/uploadId=/);
    await page.getByRole('button', { name: 'Retry the upload of Storage outage.mp4' }).click();
    await libraryRow(page, 'Storage outage')
      .getByText(/^(Processing|Ready)/)
      .first()
      .waitFor({ timeout: 30_000 });
  });

  it('a PDF renamed as a video ends failed, saying what the file really is', async () => {
    const pdf = await makePdf(dir, 'Worksheet waves.mp4');
    const page = await openPage();
    await openRecordings(page);
    await page.getByLabel('Video files to upload').setInputFiles(pdf);
    const row = libraryRow(page, 'Worksheet waves');
    await row.getByText('Failed', { exact: true }).waitFor({ timeout: 60_000 });
    await row.getByText('This file is a PDF, not a video.').waitFor();
    await screenshot(page, 'recordings-library-failed');
  });

  it('plays a ready recording with its captions on the recording page', async () => {
    const page = await openPage();
    await signInWithPicker(page, TEACHER);
    await page.goto(`${baseUrl}/teacher/recordings`);
    await page.getByRole('link', { name: 'Demo: magnet through a copper tube', exact: true }).click();
    const video = page.locator('video');
    await video.waitFor();
    await expect.poll(() => video.evaluate((v) => (v as unknown as VideoFacts).readyState), { timeout: 15_000 }).toBeGreaterThanOrEqual(2);
    expect(await video.evaluate((v) => (v as unknown as VideoFacts).textTracks.length)).toBeGreaterThanOrEqual(1);
    await screenshot(page, 'recording-detail');
  });
});
