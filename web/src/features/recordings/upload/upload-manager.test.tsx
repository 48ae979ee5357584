import { createHash } from 'node:crypto';
import { render, screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { UploadComplete, UploadCreate } from '@core/contracts';
import { apiError } from '@/testing/mocks/handlers';
import { buildRecording, buildUpload, STORAGE_ORIGIN } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { UploadRowView } from '../components/upload-row';
import { UploadManager } from './upload-manager';
import { STORAGE_DOWN_MESSAGE } from './upload-problems';
import { createTransport, type TransportUppy } from './uppy-transport';

const MIB = 1024 * 1024;
// Real Uppy runs with hashing and several requests per file: on a busy two-core machine that can pass the 5 s default.
const UPLOAD_TEST_TIMEOUT_MS = 30_000;
const partUrl = (partNumber: number) => `${STORAGE_ORIGIN}/pinfield-media/original?partNumber=${partNumber}&uploadId=s3-upload`;
let managers: UploadManager[] = [];

function setup(now = () => 0) {
  let uppy: TransportUppy | undefined;
  const manager = new UploadManager({
    retryDelays: [],
    now,
    transport: (options) => (uppy = createTransport(options)),
  });
  managers.push(manager);
  return { manager, uppy: () => uppy as TransportUppy };
}

afterEach(() => {
  managers.forEach((manager) => manager.destroy());
  managers = [];
});

/** Handlers for one upload of `size` bytes in one part; records what the page sent. */
function mockUpload(size: number, storagePut: () => Response | Promise<Response>) {
  const upload = buildUpload({ size, partCount: 1 });
  const sent = {
    created: [] as UploadCreate[],
    signed: [] as number[],
    listed: 0,
    completed: [] as UploadComplete[],
    csrf: [] as (string | null)[],
  };
  server.use(
    http.post('/api/uploads', async ({ request }) => {
      sent.csrf.push(request.headers.get('X-CSRF-Token'));
      sent.created.push((await request.json()) as UploadCreate);
      return HttpResponse.json(upload, { status: 201 });
    }),
    http.post(`/api/uploads/${upload.id}/parts/:partNumber`, ({ params }) => {
      sent.signed.push(Number(params.partNumber));
      return HttpResponse.json({ url: partUrl(Number(params.partNumber)), expiresAt: '2099-01-01T00:00:00.000Z', contentLength: size });
    }),
    http.get(`/api/uploads/${upload.id}/parts`, () => {
      sent.listed += 1;
      return HttpResponse.json({ parts: [] });
    }),
    http.put(`${STORAGE_ORIGIN}/pinfield-media/original`, storagePut),
    http.post(`/api/uploads/${upload.id}/complete`, async ({ request }) => {
      sent.completed.push((await request.json()) as UploadComplete);
      return HttpResponse.json(buildRecording({ id: upload.recordingId, state: 'processing', progress: 0 }));
    }),
  );
  return { upload, sent };
}

const stored = () => new HttpResponse(null, { status: 200, headers: { ETag: '"etag-1"' } });

describe('upload manager (Uppy, multipart, through the API)', { timeout: UPLOAD_TEST_TIMEOUT_MS }, () => {
  it('creates the upload with the first part’s SHA-256, sends the part to storage and completes with its ETag', async () => {
    const { manager } = setup();
    const { upload, sent } = mockUpload(11, stored);
    const file = new File(['hello world'], 'pendulum release é.mp4', { type: 'video/mp4', lastModified: 1_700_000_000_000 });
    manager.addFiles([file]);
    await vi.waitFor(() => expect(manager.getRows()[0]?.status).toBe('done'));

    expect(sent.created).toEqual([
      {
        fileName: 'pendulum release é.mp4',
        size: 11,
        type: 'video/mp4',
        lastModified: 1_700_000_000_000,
        firstPartSha256: createHash('sha256').update('hello world').digest('hex'),
      },
    ]);
    expect(sent.csrf).toEqual(['csrf-1']);
    expect(sent.signed).toEqual([1]);
    expect(sent.completed).toEqual([{ parts: [{ partNumber: 1, etag: '"etag-1"' }] }]);
    expect(manager.getRows()[0]).toMatchObject({ uploadId: upload.id, recordingId: upload.recordingId, bytesSent: 11 });
  });

  it('shows percent, smoothed speed and time left from Uppy’s progress events', async () => {
    let clock = 0;
    const { manager, uppy } = setup(() => clock);
    // The API has not answered yet, so only the progress events below move the row.
    let answer: ((response: Response) => void) | undefined;
    server.use(http.post('/api/uploads', () => new Promise<Response>((resolve) => (answer = resolve))));
    const file = new File([new Uint8Array(10 * MIB)], 'coil-drop.mov', { type: 'video/quicktime' });
    manager.addFiles([file]);
    const id = manager.getRows()[0]?.id ?? '';

    const progress = (bytesUploaded: number) =>
      uppy().emit('upload-progress', uppy().getFile(id), { uploadStarted: 1, bytesUploaded, bytesTotal: 10 * MIB });
    progress(0);
    clock = 1000;
    progress(MIB);
    const { rerender } = render(<UploadRowView row={manager.getRows()[0]!} actions={noActions} />);
    expect(screen.getByText('10 % · 1.0 MiB/s · 9 s left')).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Upload of coil-drop.mov' })).toHaveAttribute('aria-valuenow', '10');

    clock = 2000;
    progress(4 * MIB); // one fast second (3 MiB/s) moves the estimate part of the way, not all of it
    rerender(<UploadRowView row={manager.getRows()[0]!} actions={noActions} />);
    const rate = 1 + (1 - Math.exp(-1 / 5)) * 2; // MiB/s after smoothing
    expect(screen.getByText(`40 % · ${rate.toFixed(1)} MiB/s · ${Math.ceil(6 / rate)} s left`)).toBeInTheDocument();
    await vi.waitFor(() => expect(answer).toBeDefined());
    answer?.(apiError(503, 'storage_unavailable', 'File storage is not reachable right now.'));
    await vi.waitFor(() => expect(manager.getRows()[0]?.status).toBe('error'));
  });

  it('storage down: the file stays queued with the storage sentence, and Retry sends it to the same upload', async () => {
    const { manager } = setup();
    let storageUp = false;
    const { sent } = mockUpload(11, () => (storageUp ? stored() : HttpResponse.error()));
    manager.addFiles([new File(['hello world'], 'spring.mp4', { type: 'video/mp4' })]);
    await vi.waitFor(() => expect(manager.getRows()[0]?.status).toBe('error'));
    expect(manager.getRows()[0]?.problem).toEqual({ kind: 'storage', message: STORAGE_DOWN_MESSAGE, retryable: true });

    storageUp = true;
    manager.retry(manager.getRows()[0]!.id);
    await vi.waitFor(() => expect(manager.getRows()[0]?.status).toBe('done'));
    // Continued, not started over: one upload created, its stored parts asked for before sending.
    expect(sent.created).toHaveLength(1);
    expect(sent.listed).toBe(1);
    expect(sent.completed).toHaveLength(1);
  });

  it('an API refusal shows the API’s sentence and offers no Retry', async () => {
    const { manager } = setup();
    server.use(http.post('/api/uploads', () => apiError(400, 'not_video', 'This file is a PDF, not a video.')));
    manager.addFiles([new File(['%PDF-1.7'], 'worksheet.mp4', { type: 'video/mp4' })]);
    await vi.waitFor(() => expect(manager.getRows()[0]?.status).toBe('error'));
    expect(manager.getRows()[0]?.problem).toEqual({ kind: 'refused', message: 'This file is a PDF, not a video.', retryable: false });
  });

  it('Cancel deletes the upload on the server and takes the row away', async () => {
    const { manager } = setup();
    // Storage never answers: the part is still on its way when Cancel is pressed.
    const { upload } = mockUpload(11, () => new Promise<Response>(() => undefined));
    const deleted: string[] = [];
    server.use(
      http.delete('/api/uploads/:uploadId', ({ params }) => {
        deleted.push(String(params.uploadId));
        return new HttpResponse(null, { status: 204 });
      }),
    );
    manager.addFiles([new File(['hello world'], 'lens.mp4', { type: 'video/mp4' })]);
    await vi.waitFor(() => expect(manager.getRows()[0]?.uploadId).toBe(upload.id));
    await manager.cancel(manager.getRows()[0]!.id);
    expect(deleted).toEqual([upload.id]);
    expect(manager.getRows()).toEqual([]);
  });

  it('says so when the same file is chosen twice', async () => {
    const { manager } = setup();
    server.use(http.post('/api/uploads', () => new Promise<Response>(() => undefined)));
    const file = new File(['hello world'], 'prism.mp4', { type: 'video/mp4', lastModified: 5 });
    expect(manager.addFiles([file])).toEqual([]);
    expect(manager.addFiles([new File(['hello world'], 'prism.mp4', { type: 'video/mp4', lastModified: 5 })])).toEqual([
      '“prism.mp4” is already in the upload list.',
    ]);
    expect(manager.getRows()).toHaveLength(1);
  });
});

const noActions = { pause: vi.fn(), resume: vi.fn(), retry: vi.fn(), cancel: vi.fn(() => Promise.resolve()), dismiss: vi.fn() };
