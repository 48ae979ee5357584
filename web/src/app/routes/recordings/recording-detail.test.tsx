import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { CaptionDto, RecordingDetailDto } from '@core/contracts';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { buildCaption, buildPlayback, buildRecordingDetail, STORAGE_ORIGIN } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

beforeAll(async () => {
  await import('./recording-detail');
});

function mockDetail(detail: () => RecordingDetailDto) {
  const playbacks: string[] = [];
  server.use(
    http.get(`/api/recordings/${detail().id}`, () => HttpResponse.json(detail())),
    http.get(`/api/recordings/${detail().id}/playback`, () => {
      const url = `${STORAGE_ORIGIN}/pinfield-media/web.mp4?X-Amz-Signature=${playbacks.length + 1}`;
      playbacks.push(url);
      return HttpResponse.json(buildPlayback(detail(), { src: { url, type: 'video/mp4' } }));
    }),
  );
  return playbacks;
}

function vttFile(text = 'WEBVTT\n\n00:00.000 --> 00:02.000\nThe magnet falls.\n') {
  return new File([text], 'captions.vtt', { type: 'text/vtt' });
}

describe('recording detail', { timeout: 20_000 }, () => {
  it('shows the facts, the preview with its captions, and the download link', async () => {
    signInAs(buildMe(['teacher']));
    const english = buildCaption({ label: 'English', language: 'en', isDefault: true });
    const french = buildCaption({ label: 'Français', language: 'fr', isDefault: false, cueCount: 1 });
    const recording = buildRecordingDetail({
      title: 'Pendulum release (test)',
      captions: [english, french],
      renditionMode: 'transcode',
      rotation: 90,
    });
    mockDetail(() => recording);
    renderApp(`/teacher/recordings/${recording.id}`);
    expect(await screen.findByRole('heading', { level: 1, name: 'Pendulum release (test)' })).toBeInTheDocument();
    const facts = screen.getByRole('region', { name: 'About the file' });
    expect(facts).toHaveTextContent('Length00:41');
    expect(facts).toHaveTextContent('1280 × 720 pixels, turned 90° when played');
    expect(facts).toHaveTextContent('29.97 frames per second');
    expect(facts).toHaveTextContent('Video formatH.264');
    expect(facts).toHaveTextContent('Sound formatAAC');
    expect(facts).toHaveTextContent('Converted to H.264 video and AAC sound');
    expect(facts).toHaveTextContent('pendulum-release.mp4');

    const player = await screen.findByLabelText('Preview of Pendulum release (test)');
    expect(player).toHaveAttribute('src', `${STORAGE_ORIGIN}/pinfield-media/web.mp4?X-Amz-Signature=1`);
    const tracks = player.querySelectorAll('track');
    expect(
      Array.from(tracks, (track) => [track.getAttribute('srclang'), track.getAttribute('src'), track.hasAttribute('default')]),
    ).toEqual([
      ['en', english.url, true],
      ['fr', french.url, false],
    ]);
    expect(screen.getByRole('link', { name: 'Download original' })).toHaveAttribute('href', `/api/recordings/${recording.id}/download`);
    expect(screen.getByRole('table', { name: 'Captions' })).toHaveTextContent('Français');
  });

  it('after a media error, fetches fresh URLs and resumes at the same moment, playing', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecordingDetail();
    const playbacks = mockDetail(() => recording);
    renderApp(`/teacher/recordings/${recording.id}`);
    const player = (await screen.findByLabelText(`Preview of ${recording.title}`)) as HTMLVideoElement;
    const play = vi.fn(() => Promise.resolve());
    Object.defineProperty(player, 'paused', { configurable: true, get: () => false });
    player.play = play;
    player.currentTime = 754.3;

    fireEvent.error(player); // how an expired presigned URL shows up mid-play
    await waitFor(() => expect(player).toHaveAttribute('src', `${STORAGE_ORIGIN}/pinfield-media/web.mp4?X-Amz-Signature=2`));
    expect(playbacks).toHaveLength(2);
    player.currentTime = 0; // a browser starts a new source from the beginning
    fireEvent.loadedMetadata(player);
    expect(player.currentTime).toBe(754.3);
    expect(play).toHaveBeenCalledTimes(1);
  });

  it('a second error in a row stops asking and says the video does not play', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecordingDetail();
    const playbacks = mockDetail(() => recording);
    renderApp(`/teacher/recordings/${recording.id}`);
    const player = await screen.findByLabelText(`Preview of ${recording.title}`);
    fireEvent.error(player);
    await waitFor(() => expect(playbacks).toHaveLength(2));
    fireEvent.error(player);
    expect(await screen.findByText('The video does not play')).toBeInTheDocument();
    expect(playbacks).toHaveLength(2);
  });

  it('a processing recording says so with its percentage, and shows no player yet', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecordingDetail({
      state: 'processing',
      progress: 40,
      posterUrl: null,
      durationSeconds: null,
      renditionMode: null,
    });
    mockDetail(() => recording);
    renderApp(`/teacher/recordings/${recording.id}`);
    expect(await screen.findByText('Processing 40 %')).toBeInTheDocument();
    expect(screen.getByText(/preparing the web version/)).toBeInTheDocument();
    expect(screen.queryByLabelText(`Preview of ${recording.title}`)).not.toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'About the file' })).toHaveTextContent('LengthKnown after processing');
  });

  it('a failed recording whose original was deleted offers no download', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecordingDetail({
      state: 'failed',
      failure: { code: 'size_mismatch', message: 'Storage holds 10 MiB, but the upload was started for 12 MiB.', retryable: false },
    });
    mockDetail(() => recording);
    renderApp(`/teacher/recordings/${recording.id}`);
    expect(await screen.findByText('Storage holds 10 MiB, but the upload was started for 12 MiB.')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Download original' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Retry processing/ })).not.toBeInTheDocument();
  });
});

describe('recording captions', { timeout: 20_000 }, () => {
  it('lists each problem of an invalid WebVTT file with its line number', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecordingDetail();
    mockDetail(() => recording);
    let body: unknown;
    server.use(
      http.post(`/api/recordings/${recording.id}/captions`, async ({ request }) => {
        body = await request.json();
        return apiError(400, 'caption_invalid', 'The caption file has 2 problems.', [
          { path: 'line 3', message: 'A cue timing needs “-->” between the start and end times.' },
          { path: 'line 7', message: 'The end time 00:01.000 is before the start time 00:04.000.' },
        ]);
      }),
    );
    const { user } = renderApp(`/teacher/recordings/${recording.id}`);
    const form = (await screen.findByRole('region', { name: 'Add captions' })) as HTMLElement;
    await user.type(within(form).getByLabelText(/Language tag/), 'en-GB');
    await user.type(within(form).getByLabelText(/^Label/), 'English (UK)');
    const text = 'WEBVTT\n\n00:00.000 00:02.000\nbroken\n';
    await user.upload(within(form).getByLabelText('WebVTT file'), vttFile(text));
    await user.click(within(form).getByRole('checkbox', { name: 'Show these captions first' }));
    await user.click(within(form).getByRole('button', { name: 'Add captions' }));

    const alert = await within(form).findByRole('alert');
    expect(alert).toHaveTextContent('The caption file has 2 problems.');
    const items = within(alert).getAllByRole('listitem');
    expect(items.map((item) => item.textContent)).toEqual([
      'line 3: A cue timing needs “-->” between the start and end times.',
      'line 7: The end time 00:01.000 is before the start time 00:04.000.',
    ]);
    expect(body).toEqual({ language: 'en-GB', label: 'English (UK)', isDefault: true, vtt: text });
  });

  it('checks the language tag and the file before sending', async () => {
    signInAs(buildMe(['teacher']));
    const recording = buildRecordingDetail();
    mockDetail(() => recording);
    const { user } = renderApp(`/teacher/recordings/${recording.id}`);
    const form = (await screen.findByRole('region', { name: 'Add captions' })) as HTMLElement;
    await user.type(within(form).getByLabelText(/Language tag/), 'English');
    await user.type(within(form).getByLabelText(/^Label/), 'English');
    await user.click(within(form).getByRole('button', { name: 'Add captions' }));
    expect(await within(form).findByText('Use a language tag such as en, en-GB or fr.')).toBeInTheDocument();
    expect(within(form).getByText('The caption file is empty.')).toBeInTheDocument();
  });

  it('adds a file, makes another track the default and deletes one after confirming', async () => {
    signInAs(buildMe(['teacher']));
    let captions: CaptionDto[] = [buildCaption({ label: 'English', isDefault: true })];
    const recording = buildRecordingDetail();
    mockDetail(() => ({ ...recording, captions }));
    const added = buildCaption({ label: 'Deutsch', language: 'de', isDefault: false, cueCount: 1 });
    const patches: unknown[] = [];
    server.use(
      http.post(`/api/recordings/${recording.id}/captions`, () => {
        captions = [...captions, added];
        return HttpResponse.json(added, { status: 201 });
      }),
      http.patch(`/api/recordings/${recording.id}/captions/${added.id}`, async ({ request }) => {
        patches.push(await request.json());
        captions = captions.map((caption) => ({ ...caption, isDefault: caption.id === added.id }));
        return HttpResponse.json({ ...added, isDefault: true });
      }),
      http.delete(`/api/recordings/${recording.id}/captions/${added.id}`, () => {
        captions = captions.filter((caption) => caption.id !== added.id);
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user } = renderApp(`/teacher/recordings/${recording.id}`);
    const form = (await screen.findByRole('region', { name: 'Add captions' })) as HTMLElement;
    await user.type(within(form).getByLabelText(/Language tag/), 'de');
    await user.type(within(form).getByLabelText(/^Label/), 'Deutsch');
    await user.upload(within(form).getByLabelText('WebVTT file'), vttFile());
    await user.click(within(form).getByRole('button', { name: 'Add captions' }));
    expect(await screen.findByText('Captions “Deutsch” added')).toBeInTheDocument();

    const table = screen.getByRole('table', { name: 'Captions' });
    await user.click(await within(table).findByRole('button', { name: 'Make Deutsch the default captions' }));
    await waitFor(() => expect(within(table).getByText('Deutsch').closest('tr')).toHaveTextContent('Default'));
    expect(patches).toEqual([{ isDefault: true }]);

    await user.click(within(table).getByRole('button', { name: 'Delete the Deutsch captions' }));
    await user.click(within(screen.getByRole('alertdialog')).getByRole('button', { name: 'Delete the captions' }));
    await waitFor(() => expect(within(table).queryByText('Deutsch')).not.toBeInTheDocument());
  });
});
