import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import type { RecordingDto } from '@core/contracts';
import { buildMe, nextId } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { buildLimits, buildRecording } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

beforeAll(async () => {
  await import('@/app/routes/recordings/recordings');
});

function mockLibrary(recordings: RecordingDto[]) {
  server.use(
    http.get('/api/uploads', () => HttpResponse.json({ uploads: [], limits: buildLimits() })),
    http.get('/api/recordings', () => HttpResponse.json({ recordings })),
  );
}

describe('recordings used by lessons', { timeout: 20_000 }, () => {
  it('each row names the lessons built on the recording, as links', async () => {
    signInAs(buildMe(['teacher']));
    const helmholtz = { id: nextId(), title: 'Helmholtz pair (test)', state: 'published' as const };
    const drop = { id: nextId(), title: 'Falling magnet (test)', state: 'draft' as const };
    mockLibrary([
      buildRecording({ title: 'Coil on a bench (test)', usedBy: [helmholtz, drop] }),
      buildRecording({ title: 'Prism (test)', usedBy: [] }),
    ]);
    renderApp('/teacher/recordings');
    const table = await screen.findByRole('table', { name: 'Recordings' });
    const used = within(table).getByRole('link', { name: 'Coil on a bench (test)' }).closest('tr') as HTMLElement;
    expect(used).toHaveTextContent('Used by: Helmholtz pair (test) (published), Falling magnet (test) (draft)');
    expect(within(used).getByRole('link', { name: 'Helmholtz pair (test)' })).toHaveAttribute('href', `/teacher/lessons/${helmholtz.id}`);
    const unused = within(table).getByRole('link', { name: 'Prism (test)' }).closest('tr') as HTMLElement;
    expect(unused).not.toHaveTextContent('Used by');
  });

  it('a refused delete shows the server’s sentence naming the lessons, inside the dialog', async () => {
    signInAs(buildMe(['teacher']));
    const helmholtz = { id: nextId(), title: 'Helmholtz pair (test)', state: 'published' as const };
    const recording = buildRecording({ title: 'Coil on a bench (test)', usedBy: [helmholtz] });
    mockLibrary([recording]);
    const sentence = '“Helmholtz pair (test)” uses this recording. Delete or archive that lesson first.';
    server.use(http.delete(`/api/recordings/${recording.id}`, () => apiError(409, 'recording_in_use', sentence)));
    const { user } = renderApp('/teacher/recordings');
    await user.click(await screen.findByRole('button', { name: 'Delete Coil on a bench (test)' }));
    const dialog = screen.getByRole('alertdialog', { name: 'Delete “Coil on a bench (test)”?' });
    // Said before the attempt, too.
    expect(dialog).toHaveTextContent('Used by: Helmholtz pair (test) (published)');
    await user.click(within(dialog).getByRole('button', { name: 'Delete the recording' }));
    const refusal = await within(dialog).findByRole('alert');
    expect(refusal).toHaveTextContent('The recording was not deleted');
    expect(refusal).toHaveTextContent(sentence);
    expect(within(refusal).getByRole('link', { name: 'Helmholtz pair (test)' })).toHaveAttribute(
      'href',
      `/teacher/lessons/${helmholtz.id}`,
    );
    // The recording is still listed: nothing was lost.
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(screen.getByRole('link', { name: 'Coil on a bench (test)' })).toBeInTheDocument();
  });

  it('another failure keeps its own message under the buttons', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecording({ title: 'Prism (test)', usedBy: [] });
    mockLibrary([recording]);
    server.use(
      http.delete(`/api/recordings/${recording.id}`, () => apiError(500, 'internal', 'Pinfield could not delete the files; try again.')),
    );
    const { user } = renderApp('/teacher/recordings');
    await user.click(await screen.findByRole('button', { name: 'Delete Prism (test)' }));
    const dialog = screen.getByRole('alertdialog');
    await user.click(within(dialog).getByRole('button', { name: 'Delete the recording' }));
    expect(await within(dialog).findByText('Pinfield could not delete the files; try again.')).toBeInTheDocument();
    expect(within(dialog).queryByText('The recording was not deleted')).not.toBeInTheDocument();
  });
});
