import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatDuration } from '@core/recordings';
import { lastDecodableFrame } from '../../../tests/fixtures/media/inspect';
import {
  makeAudioOnly,
  makeGarbage,
  makeJpeg,
  makeMediaDir,
  makePdf,
  makeTruncated,
  makeVideo,
  makeZeroByte,
  makeZeroedTail,
} from '../../../tests/fixtures/media/generate';
import { findEarlyEnd } from './completeness';
import { MediaFailure } from './media-failure';
import { probeDetails } from './probe';
import { processMedia } from './process-media';

const SLOW = { timeout: 120_000 };
let dir: string;
let phoneFile: string; // index at the front, so a cut keeps the declared duration
let indexAtEnd: string;

beforeAll(async () => {
  dir = await makeMediaDir('bad');
  phoneFile = await makeVideo({
    dir,
    name: 'phone fast.mp4',
    seconds: 6,
    width: 320,
    height: 180,
    fps: 30,
    codec: 'h264',
    audio: true,
    faststart: true,
  });
  indexAtEnd = await makeVideo({ dir, name: 'phone.mp4', seconds: 6, width: 320, height: 180, fps: 30, codec: 'h264', audio: true });
}, 120_000);
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function failureOf(inputPath: string): Promise<MediaFailure> {
  const error: unknown = await processMedia({ inputPath, workDir: join(dir, 'out'), nice: 10 }).then(
    () => new Error('expected processing to fail'),
    (e: unknown) => e,
  );
  if (!(error instanceof MediaFailure)) throw error;
  return error;
}

/** "The file stops early at 00:03 — …" -> 3 */
function stopSeconds(message: string): number {
  const [, mm, ss] = /stops early at (\d\d):(\d\d) —/.exec(message) ?? [];
  if (mm === undefined) throw new Error(`no time in: ${message}`);
  return Number(mm) * 60 + Number(ss);
}

describe('processMedia: files that fail with a reason the teacher can act on', () => {
  it('calls a PDF renamed .mp4 a PDF', async () => {
    const failure = await failureOf(await makePdf(dir, 'Arbeitsblatt é.mp4'));
    expect(failure).toMatchObject({ code: 'not_video', retryable: false, message: 'This file is a PDF, not a video.' });
  });

  it('names a picture', SLOW, async () => {
    const failure = await failureOf(await makeJpeg(dir, 'Tafelbild é.mov'));
    expect(failure).toMatchObject({ code: 'not_video', message: 'This file is a picture (JPEG), not a video.' });
  });

  it('says unknown bytes are not a video', async () => {
    const failure = await failureOf(await makeGarbage(dir, { bytes: 200_000 }));
    expect(failure).toMatchObject({
      code: 'not_video',
      retryable: false,
      message: 'This file is not a video: Pinfield does not recognise its type.',
    });
  });

  it('reports a zero-byte file as empty', async () => {
    const failure = await failureOf(await makeZeroByte(dir));
    expect(failure).toMatchObject({ code: 'empty', retryable: false });
    expect(failure.message).toMatch(/^The file is empty \(0 bytes\)/);
  });

  it.each(['mp4', 'm4a', 'mp3'] as const)('finds no video track in sound only (%s)', SLOW, async (container) => {
    const failure = await failureOf(await makeAudioOnly({ dir, seconds: 2, container }));
    expect(failure).toMatchObject({
      code: 'no_video_track',
      retryable: false,
      message: 'This file has no video track — it may be an audio recording.',
    });
  });

  it('calls an MP4 whose index never arrived incomplete', SLOW, async () => {
    const failure = await failureOf(await makeTruncated(indexAtEnd, { keepFraction: 0.6 }));
    expect(failure).toMatchObject({
      code: 'truncated',
      retryable: false,
      message: 'The file is incomplete — it may not have finished copying from the phone.',
    });
  });

  it('says where a file cut short stops', SLOW, async () => {
    const cut = await makeTruncated(phoneFile, { keepFraction: 0.55 });
    const failure = await failureOf(cut);
    expect(failure).toMatchObject({ code: 'truncated', retryable: false });
    // Checked against a plain ffprobe decode of the same bytes from the start.
    const last = await lastDecodableFrame(cut);
    expect(last).toBeLessThan(5);
    expect(stopSeconds(failure.message)).toBeGreaterThanOrEqual(Math.floor(last));
    expect(stopSeconds(failure.message)).toBeLessThanOrEqual(Math.floor(last + 0.1));
    expect(failure.message).toBe(
      `The file stops early at ${formatDuration(stopSeconds(failure.message))} — it may not have finished copying from the phone.`,
    );
  });

  it('says where a file whose end is zeros stops decoding', SLOW, async () => {
    const zeroed = await makeZeroedTail(phoneFile, { fromFraction: 0.5 });
    const failure = await failureOf(zeroed);
    expect(failure.code).toBe('truncated');
    const last = await lastDecodableFrame(zeroed);
    expect(last).toBeLessThan(5);
    expect(stopSeconds(failure.message)).toBeGreaterThanOrEqual(Math.floor(last) - 1);
    expect(stopSeconds(failure.message)).toBeLessThanOrEqual(Math.floor(last + 0.1));
  });

  it('calls a cut Matroska file short too', SLOW, async () => {
    const mkv = await makeVideo({ dir, seconds: 6, width: 320, height: 180, fps: 30, codec: 'h264', audio: true, container: 'mkv' });
    const failure = await failureOf(await makeTruncated(mkv, { keepFraction: 0.5 }));
    expect(failure.code).toBe('truncated');
    expect(stopSeconds(failure.message)).toBeLessThan(5);
  });

  it('finds the early end before any encoding starts', SLOW, async () => {
    const cut = await makeTruncated(phoneFile, { keepFraction: 0.55 });
    const zeroed = await makeZeroedTail(phoneFile, { fromFraction: 0.5 });
    const run = { nice: 10 };
    expect(await findEarlyEnd(phoneFile, await probeDetails(phoneFile), run)).toBeNull();
    for (const broken of [cut, zeroed]) {
      const details = await probeDetails(broken);
      expect(details.videoEndSeconds).toBeCloseTo(6, 1); // the index still promises 6 s
      const stop = await findEarlyEnd(broken, details, run);
      expect(stop).not.toBeNull();
      expect(Math.abs(stop! - (await lastDecodableFrame(broken)))).toBeLessThan(0.6);
    }
  });

  it('does not call a whole file short', SLOW, async () => {
    await expect(processMedia({ inputPath: phoneFile, workDir: join(dir, 'whole'), nice: 10 })).resolves.toMatchObject({
      rendition: { mode: 'remux' },
    });
  });
});
