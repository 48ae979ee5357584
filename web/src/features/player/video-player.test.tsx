import { act, render, screen, waitFor } from '@testing-library/react';
import { StrictMode } from 'react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { http, HttpResponse } from 'msw';
import type { PlaybackDto } from '@core/contracts';
import { server } from '@/testing/mocks/server';
import { testPlayback } from './player-test-support';
import { VideoPlayer, type Player } from './video-player';

const withCaptions: PlaybackDto = {
  ...testPlayback,
  posterUrl: '/media/poster-1.jpg',
  captions: [
    {
      id: '22222222-2222-4222-8222-222222222222',
      language: 'en',
      label: 'English',
      isDefault: true,
      cueCount: 3,
      url: '/api/recordings/r/captions/c.vtt',
      updatedAt: '2026-01-01T00:00:00.000Z',
    },
  ],
};

// jsdom has no CSS.supports and plays no media: say MP4 is playable so video.js loads its HTML5 tech.
beforeAll(() => {
  if (typeof window.CSS?.supports !== 'function') Object.assign(window.CSS ?? (window.CSS = {} as typeof CSS), { supports: () => false });
  vi.spyOn(HTMLMediaElement.prototype, 'canPlayType').mockReturnValue('maybe');
  vi.spyOn(HTMLMediaElement.prototype, 'load').mockImplementation(() => undefined);
  vi.spyOn(HTMLMediaElement.prototype, 'pause').mockImplementation(() => undefined);
});

describe('VideoPlayer', () => {
  it('creates one video.js player with the poster and caption tracks, and disposes it on unmount', async () => {
    server.use(
      http.get(
        '/api/recordings/r/captions/c.vtt',
        () =>
          new HttpResponse('WEBVTT\n\n00:00.000 --> 00:02.000\nThe coil is switched on.\n', { headers: { 'Content-Type': 'text/vtt' } }),
      ),
    );
    const ready = vi.fn<(player: Player) => void>();
    const { unmount } = render(
      <StrictMode>
        <VideoPlayer playback={withCaptions} onReady={ready} onRefresh={() => Promise.resolve(undefined)} label="Demo video" />
      </StrictMode>,
    );
    await waitFor(() => expect(ready).toHaveBeenCalled());
    const player = ready.mock.calls.at(-1)?.[0];
    if (!player) throw new Error('no player');
    // StrictMode mounted twice: only the live player is in the page.
    expect(screen.getByRole('region', { name: 'Demo video' }).querySelectorAll('.video-js')).toHaveLength(1);
    expect(player.isDisposed()).toBe(false);
    expect(player.poster()).toBe('/media/poster-1.jpg');
    const tracks = player.remoteTextTrackEls() as unknown as ArrayLike<HTMLTrackElement>;
    expect(Array.from({ length: tracks.length }, (_, i) => tracks[i]).map((t) => [t?.src, t?.srclang, t?.label, t?.kind])).toEqual([
      [expect.stringContaining('/api/recordings/r/captions/c.vtt'), 'en', 'English', 'captions'],
    ]);
    unmount();
    expect(player.isDisposed()).toBe(true);
  });

  it('swaps in fresh URLs from a new playback prop', async () => {
    const ready = vi.fn<(player: Player) => void>();
    const { rerender } = render(<VideoPlayer playback={testPlayback} onReady={ready} />);
    await waitFor(() => expect(ready).toHaveBeenCalled());
    const player = ready.mock.calls.at(-1)?.[0];
    if (!player) throw new Error('no player');
    const src = vi.spyOn(player, 'src');
    act(() =>
      rerender(<VideoPlayer playback={{ ...testPlayback, src: { url: '/media/demo.mp4?fresh=2', type: 'video/mp4' } }} onReady={ready} />),
    );
    expect(src).toHaveBeenCalledWith({ src: '/media/demo.mp4?fresh=2', type: 'video/mp4' });
    src.mockClear();
    act(() =>
      rerender(<VideoPlayer playback={{ ...testPlayback, src: { url: '/media/demo.mp4?fresh=2', type: 'video/mp4' } }} onReady={ready} />),
    );
    expect(src).not.toHaveBeenCalled();
  });
});
