import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import type { RecordingDto } from '@core/contracts';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { buildLimits, buildRecording } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

// A lazy chunk with Uppy in it: compile it once up front, not inside the first test's time.
beforeAll(async () => {
  await import('./recordings');
});

function mockLibrary(recordings: () => RecordingDto[]) {
  const queries: string[] = [];
  server.use(
    http.get('/api/uploads', () => HttpResponse.json({ uploads: [], limits: buildLimits() })),
    http.get('/api/recordings', ({ request }) => {
      queries.push(new URL(request.url).search);
      return HttpResponse.json({ recordings: recordings() });
    }),
  );
  return queries;
}

describe('recordings library', { timeout: 20_000 }, () => {
  it('shows poster, title, length, size, state, owner and date', async () => {
    signInAs(buildMe(['teacher']));
    mockLibrary(() => [
      buildRecording({ title: 'Pendulum release (test)', durationSeconds: 41.2, sizeBytes: 48 * 1024 * 1024 }),
      buildRecording({ title: 'Coil drop (test)', state: 'processing', progress: 37, posterUrl: null, durationSeconds: null }),
    ]);
    renderApp('/teacher/recordings');
    const table = await screen.findByRole('table', { name: 'Recordings' });
    const ready = within(table).getByRole('link', { name: 'Pendulum release (test)' }).closest('tr') as HTMLElement;
    expect(within(ready).getByRole('img', { name: 'A frame from “Pendulum release (test)”' })).toHaveAttribute(
      'src',
      expect.stringContaining('poster.jpg'),
    );
    expect(ready).toHaveTextContent('00:41');
    expect(ready).toHaveTextContent('48 MiB');
    expect(ready).toHaveTextContent('Ready');
    expect(ready).toHaveTextContent('Ada Quill');
    expect(ready).toHaveTextContent('3 Mar 2025');
    const processing = within(table).getByRole('link', { name: 'Coil drop (test)' }).closest('tr') as HTMLElement;
    expect(processing).toHaveTextContent('Processing 37 %');
    expect(within(processing).queryByRole('img')).not.toBeInTheDocument(); // a neutral panel until there is a poster
    expect(screen.getByText('2 recordings')).toBeInTheDocument();
    expect(within(screen.getByRole('navigation', { name: 'Teacher pages' })).getByRole('link', { name: 'Recordings' })).toHaveAttribute(
      'aria-current',
      'page',
    );
  });

  it('is reached from the teacher home, and files can be dropped on the upload area', async () => {
    signInAs(buildMe(['teacher']));
    mockLibrary(() => []);
    let created: unknown;
    server.use(
      http.get('/api/teacher/classes', () => HttpResponse.json({ classes: [] })),
      http.post('/api/uploads', async ({ request }) => {
        created = await request.json();
        return new Promise<Response>(() => undefined);
      }),
    );
    const { user } = renderApp('/teacher');
    await user.click(await screen.findByRole('link', { name: 'Recordings page' }));
    const drop = (await screen.findByText('Drop video files here')).parentElement as HTMLElement;
    const file = new File(['hello world'], 'drop-test.mp4', { type: 'video/mp4' });
    fireEvent.dragEnter(drop, { dataTransfer: { types: ['Files'], files: [file] } });
    expect(screen.getByText('Drop to upload')).toBeInTheDocument();
    fireEvent.drop(drop, { dataTransfer: { types: ['Files'], files: [file] } });
    const queue = await screen.findByRole('list', { name: 'Files being uploaded' });
    expect(within(queue).getByText('drop-test.mp4')).toBeInTheDocument();
    await waitFor(() => expect(created).toMatchObject({ fileName: 'drop-test.mp4', size: 11 }));
  });

  it('keeps search, state, owner and order in the URL', async () => {
    signInAs(buildMe(['teacher']));
    const queries = mockLibrary(() => []);
    const { user, router } = renderApp('/teacher/recordings?state=failed&sort=title');
    await screen.findByText('0 recordings');
    expect(queries[0]).toBe('?state=failed&owner=school&sort=title');
    expect(screen.getByLabelText('State')).toHaveValue('failed');
    expect(screen.getByLabelText('Order')).toHaveValue('title');

    await user.selectOptions(screen.getByLabelText('Uploaded by'), 'mine');
    expect(router.state.location.search).toBe('?state=failed&owner=mine&sort=title');
    await user.type(screen.getByLabelText('Search'), 'coil');
    await waitFor(() => expect(router.state.location.search).toBe('?q=coil&state=failed&owner=mine&sort=title'));
    await waitFor(() => expect(queries.at(-1)).toBe('?q=coil&state=failed&owner=mine&sort=title'));

    // Back: the search was typed into the same history entry, so back returns to before "Only me".
    await router.navigate(-1);
    await waitFor(() => expect(screen.getByLabelText('Uploaded by')).toHaveValue('school'));
    expect(screen.getByLabelText('Search')).toHaveValue('');
    expect(router.state.location.search).toBe('?state=failed&sort=title');
  });

  it('renames inline, checking the title with the shared rules first', async () => {
    signInAs(buildMe(['teacher']));
    let title = 'Pendulum release (test)';
    const recording = buildRecording();
    mockLibrary(() => [{ ...recording, title }]);
    const bodies: unknown[] = [];
    server.use(
      http.patch(`/api/recordings/${recording.id}`, async ({ request }) => {
        const body = (await request.json()) as { title: string };
        bodies.push(body);
        title = body.title;
        return HttpResponse.json({ ...recording, title });
      }),
    );
    const { user } = renderApp('/teacher/recordings');
    await user.click(await screen.findByRole('button', { name: 'Rename Pendulum release (test)' }));
    const input = screen.getByLabelText('New title for Pendulum release (test)');
    expect(input).toHaveFocus();
    await user.clear(input);
    await user.type(input, '   ');
    await user.click(screen.getByRole('button', { name: 'Save title' }));
    expect(await screen.findByText('Enter a title.')).toBeInTheDocument();
    expect(bodies).toEqual([]);

    await user.clear(input);
    await user.type(input, 'Falling magnet through a copper pipe');
    await user.click(screen.getByRole('button', { name: 'Save title' }));
    expect(await screen.findByRole('link', { name: 'Falling magnet through a copper pipe' })).toBeInTheDocument();
    expect(bodies).toEqual([{ title: 'Falling magnet through a copper pipe' }]);
    expect(screen.getByRole('button', { name: 'Rename Falling magnet through a copper pipe' })).toHaveFocus();
  });

  it('deletes only after the confirmation', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecording({ title: 'Prism (test)' });
    let deleted = false;
    mockLibrary(() => (deleted ? [] : [recording]));
    server.use(
      http.delete(`/api/recordings/${recording.id}`, () => {
        deleted = true;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user } = renderApp('/teacher/recordings');
    await user.click(await screen.findByRole('button', { name: 'Delete Prism (test)' }));
    let dialog = screen.getByRole('alertdialog', { name: 'Delete “Prism (test)”?' });
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument();
    expect(deleted).toBe(false);
    expect(screen.getByRole('button', { name: 'Delete Prism (test)' })).toHaveFocus();

    await user.click(screen.getByRole('button', { name: 'Delete Prism (test)' }));
    dialog = screen.getByRole('alertdialog', { name: 'Delete “Prism (test)”?' });
    await user.click(within(dialog).getByRole('button', { name: 'Delete the recording' }));
    expect(await screen.findByText('No recordings yet')).toBeInTheDocument();
    expect(deleted).toBe(true);
  });

  it('a failed recording shows its reason, and Retry sends it back to processing', async () => {
    signInAs(buildMe(['teacher']));
    const truncated = 'The file stops early at 00:41 — it may not have finished copying from the phone.';
    const failed = buildRecording({
      title: 'Cart on a ramp (test)',
      state: 'failed',
      failure: { code: 'processing_error', message: truncated, retryable: true },
      posterUrl: null,
    });
    const refused = buildRecording({
      title: 'Worksheet (test)',
      state: 'failed',
      failure: { code: 'not_video', message: 'This file is a PDF, not a video.', retryable: false },
    });
    let retried = false;
    mockLibrary(() => [retried ? { ...failed, state: 'processing', progress: 0, failure: null } : failed, refused]);
    server.use(
      http.post(`/api/recordings/${failed.id}/retry`, () => {
        retried = true;
        return HttpResponse.json({ ...failed, state: 'processing', progress: 0, failure: null });
      }),
    );
    const { user } = renderApp('/teacher/recordings');
    expect(await screen.findByText(truncated)).toBeInTheDocument();
    expect(screen.getByText('This file is a PDF, not a video.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Retry processing Worksheet (test)' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry processing Cart on a ramp (test)' }));
    expect(await screen.findByText('Processing 0 %')).toBeInTheDocument();
    // Said aloud as well as shown.
    expect(screen.getByText('“Cart on a ramp (test)” is being processed.')).toBeInTheDocument();
  });

  it('a refused retry is explained next to the button', async () => {
    signInAs(buildMe(['teacher']));
    const failed = buildRecording({
      title: 'Lens (test)',
      state: 'failed',
      failure: { code: 'timed_out', message: 'Processing took too long.', retryable: true },
    });
    mockLibrary(() => [failed]);
    server.use(
      http.post(`/api/recordings/${failed.id}/retry`, () => apiError(409, 'not_retryable', 'This recording is already being processed.')),
    );
    const { user } = renderApp('/teacher/recordings');
    await user.click(await screen.findByRole('button', { name: 'Retry processing Lens (test)' }));
    expect(await screen.findByText('This recording is already being processed.')).toBeInTheDocument();
  });

  it('recordings of others: no rename, delete or retry', async () => {
    signInAs(buildMe(['teacher']));
    mockLibrary(() => [
      buildRecording({
        title: 'Colleague’s demo (test)',
        canEdit: false,
        state: 'failed',
        failure: { code: 'timed_out', message: 'Processing took too long.', retryable: true },
      }),
    ]);
    renderApp('/teacher/recordings');
    expect(await screen.findByRole('link', { name: 'Colleague’s demo (test)' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Rename|Delete|Retry/ })).not.toBeInTheDocument();
  });
});
