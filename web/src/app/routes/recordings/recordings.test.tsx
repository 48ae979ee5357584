import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import type { OpenUploadDto, RecordingDto, UploadComplete } from '@core/contracts';
import { STORAGE_DOWN_MESSAGE } from '@/features/recordings/upload/upload-problems';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { buildLimits, buildOpenUpload, buildRecording, buildUpload, STORAGE_ORIGIN } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

const MIB = 1024 * 1024;
// Real Uppy runs with hashing and several requests per file: on a busy two-core machine that can pass the 5 s default.
const UPLOAD_TEST_TIMEOUT_MS = 30_000;

// The page is a lazy chunk with Uppy in it: compile it once up front, not inside the first test's time.
beforeAll(async () => {
  await import('./recordings');
});

function mockLibrary({ recordings = () => [] as RecordingDto[], uploads = [] as OpenUploadDto[] } = {}) {
  const queries: string[] = [];
  server.use(
    http.get('/api/uploads', () => HttpResponse.json({ uploads, limits: buildLimits() })),
    http.get('/api/recordings', ({ request }) => {
      queries.push(new URL(request.url).search);
      return HttpResponse.json({ recordings: recordings() });
    }),
  );
  return queries;
}

/** Storage and the upload API for one upload that stores whatever is sent; returns what was signed and completed. */
function mockStorage(upload = buildUpload({ size: 11 })) {
  const signed: number[] = [];
  const completed: UploadComplete[] = [];
  server.use(
    http.post(`/api/uploads/${upload.id}/parts/:partNumber`, ({ params }) => {
      signed.push(Number(params.partNumber));
      return HttpResponse.json({
        url: `${STORAGE_ORIGIN}/pinfield-media/original?partNumber=${String(params.partNumber)}`,
        expiresAt: '2099-01-01T00:00:00.000Z',
        contentLength: 1,
      });
    }),
    http.put(`${STORAGE_ORIGIN}/pinfield-media/original`, ({ request }) => {
      const part = new URL(request.url).searchParams.get('partNumber');
      return new HttpResponse(null, { headers: { ETag: `"e${part}"` } });
    }),
    http.post(`/api/uploads/${upload.id}/complete`, async ({ request }) => {
      completed.push((await request.json()) as UploadComplete);
      return HttpResponse.json(buildRecording({ id: upload.recordingId, state: 'processing', progress: 0 }));
    }),
  );
  return { upload, signed, completed };
}

const video = (name = 'falling-magnet.mp4', content = 'hello world') =>
  new File([content], name, { type: 'video/mp4', lastModified: 1_700_000_000_000 });

describe('recordings page: uploads', { timeout: UPLOAD_TEST_TIMEOUT_MS }, () => {
  it('uploads a chosen file; the library then shows it processing', async () => {
    signInAs(buildMe(['teacher']));
    const { upload, signed, completed } = mockStorage();
    let created = false;
    mockLibrary({
      recordings: () =>
        created
          ? [buildRecording({ id: upload.recordingId, title: 'falling-magnet', state: 'processing', progress: 0, posterUrl: null })]
          : [],
    });
    server.use(
      http.post('/api/uploads', () => {
        created = true;
        return HttpResponse.json(upload, { status: 201 });
      }),
    );
    const { user } = renderApp('/teacher/recordings');
    expect(await screen.findByText('No recordings yet')).toBeInTheDocument();
    expect(screen.getByText('Up to 2 GiB per file. You use 3 GiB of your 20 GiB.')).toBeInTheDocument();
    const input = screen.getByLabelText('Video files to upload');
    expect(input).toHaveAttribute('accept', 'video/*,.mp4,.mov,.mkv');
    await user.upload(input, video());

    const queue = await screen.findByRole('list', { name: 'Files being uploaded' });
    expect(await within(queue).findByText('Uploaded. Processing has started: follow it in the library below.')).toBeInTheDocument();
    expect(signed).toEqual([1]);
    expect(completed).toEqual([{ parts: [{ partNumber: 1, etag: '"e1"' }] }]);
    const table = await screen.findByRole('table', { name: 'Recordings' });
    expect(await within(table).findByText('Processing 0 %')).toBeInTheDocument();
  });

  it('shows the API’s refusal on the file’s row, without Retry', async () => {
    signInAs(buildMe(['teacher']));
    mockLibrary();
    server.use(http.post('/api/uploads', () => apiError(400, 'too_large', 'The file is larger than the 2 GiB limit.')));
    const { user } = renderApp('/teacher/recordings');
    await user.upload(await screen.findByLabelText('Video files to upload'), video('whole-term.mp4'));
    expect(await screen.findByText('The file is larger than the 2 GiB limit.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Retry the upload of whole-term.mp4' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove whole-term.mp4 from the list' }));
    expect(screen.queryByText('The file is larger than the 2 GiB limit.')).not.toBeInTheDocument();
  });

  it('storage down: the file stays in the queue and goes when Retry is pressed', async () => {
    signInAs(buildMe(['teacher']));
    mockLibrary();
    const { upload } = mockStorage();
    let storageUp = false;
    server.use(
      http.post('/api/uploads', () =>
        storageUp
          ? HttpResponse.json(upload, { status: 201 })
          : apiError(503, 'storage_unavailable', 'File storage is not reachable right now.'),
      ),
    );
    const { user } = renderApp('/teacher/recordings');
    await user.upload(await screen.findByLabelText('Video files to upload'), video('spring.mp4'));
    expect(await screen.findByText(STORAGE_DOWN_MESSAGE)).toBeInTheDocument();
    storageUp = true;
    await user.click(screen.getByRole('button', { name: 'Retry the upload of spring.mp4' }));
    expect(await screen.findByText('Uploaded. Processing has started: follow it in the library below.')).toBeInTheDocument();
  });

  it('Cancel asks first, then deletes the upload', async () => {
    signInAs(buildMe(['teacher']));
    mockLibrary();
    const upload = buildUpload({ size: 11 });
    const deleted: string[] = [];
    server.use(
      http.post('/api/uploads', () => HttpResponse.json(upload, { status: 201 })),
      // Signing never answers: the file stays mid-upload until cancelled.
      http.post(`/api/uploads/${upload.id}/parts/:partNumber`, () => new Promise<Response>(() => undefined)),
      http.delete(`/api/uploads/${upload.id}`, () => {
        deleted.push(upload.id);
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user } = renderApp('/teacher/recordings');
    await user.upload(await screen.findByLabelText('Video files to upload'), video('lens.mp4'));
    await screen.findByText(/measuring speed/);
    await user.click(screen.getByRole('button', { name: 'Cancel the upload of lens.mp4' }));
    const dialog = screen.getByRole('alertdialog', { name: 'Cancel the upload of “lens.mp4”?' });
    expect(within(dialog).getByRole('button', { name: 'Keep uploading' })).toHaveFocus();
    await user.click(within(dialog).getByRole('button', { name: 'Cancel the upload' }));
    await waitFor(() => expect(deleted).toEqual([upload.id]));
    expect(screen.queryByRole('list', { name: 'Files being uploaded' })).not.toBeInTheDocument();
  });
});

describe('recordings page: unfinished uploads', { timeout: UPLOAD_TEST_TIMEOUT_MS }, () => {
  const open = buildOpenUpload({
    fileName: 'pendulum-release.mp4',
    size: Math.round(1.4 * 1024 * MIB),
    uploadedBytes: 312 * MIB,
    uploadedParts: 39,
    partCount: 180,
  });

  it('lists what is stored and shows the API’s sentence when another file is chosen', async () => {
    signInAs(buildMe(['teacher']));
    mockLibrary({ uploads: [open] });
    const mismatch = 'This is not the same file: it has 11 bytes, the upload was started with 1.4 GiB.';
    server.use(http.post(`/api/uploads/${open.id}/resume`, () => apiError(409, 'file_mismatch', mismatch)));
    const { user } = renderApp('/teacher/recordings');
    const list = await screen.findByRole('list', { name: 'Unfinished uploads' });
    expect(within(list).getByText(/312 MiB of 1.4 GiB stored/)).toBeInTheDocument();
    await user.upload(within(list).getByLabelText('File for pendulum-release.mp4'), video('other.mp4'));
    expect(await within(list).findByText(mismatch)).toBeInTheDocument();
  });

  it('with the same file chosen again, sends only the parts storage does not have', async () => {
    signInAs(buildMe(['teacher']));
    const size = 8 * MIB + 100;
    const resumable = buildOpenUpload({
      fileName: 'ramp.mp4',
      size,
      partSize: 8 * MIB,
      partCount: 2,
      uploadedBytes: 8 * MIB,
      uploadedParts: 1,
    });
    mockLibrary({ uploads: [resumable] });
    const { signed, completed } = mockStorage(resumable);
    let resumeBody: unknown;
    server.use(
      http.post(`/api/uploads/${resumable.id}/resume`, async ({ request }) => {
        resumeBody = await request.json();
        return HttpResponse.json(resumable);
      }),
      http.get(`/api/uploads/${resumable.id}/parts`, () => HttpResponse.json({ parts: [{ partNumber: 1, size: 8 * MIB, etag: '"e1"' }] })),
    );
    const { user } = renderApp('/teacher/recordings');
    const list = await screen.findByRole('list', { name: 'Unfinished uploads' });
    const file = new File([new Uint8Array(size)], 'ramp.mp4', { type: 'video/mp4', lastModified: 1_700_000_000_000 });
    await user.upload(within(list).getByLabelText('File for ramp.mp4'), file);

    expect(await screen.findByText('Uploaded. Processing has started: follow it in the library below.')).toBeInTheDocument();
    expect(resumeBody).toMatchObject({ fileName: 'ramp.mp4', size, lastModified: 1_700_000_000_000 });
    expect(signed).toEqual([2]);
    expect(completed).toEqual([
      {
        parts: [
          { partNumber: 1, etag: '"e1"' },
          { partNumber: 2, etag: '"e2"' },
        ],
      },
    ]);
    // It is in the queue now, not among the unfinished ones.
    expect(screen.queryByRole('list', { name: 'Unfinished uploads' })).not.toBeInTheDocument();
  });
});
