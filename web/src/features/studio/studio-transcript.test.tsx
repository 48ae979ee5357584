import { act, screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { buildCaption } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { buildContent, buildStudioLesson, buildStudioPlayback, fakePlayer, mockDraftSaves, renderStudio } from './studio.test-support';

const VTT =
  'WEBVTT\n\n00:01.000 --> 00:04.000\nThe compass needle points north.\n\n00:04.000 --> 00:08.500\nNow we switch the current on.\n';

describe('studio: transcript and timeline media', { timeout: 40_000 }, () => {
  it('lists the caption lines, highlights the current one, jumps on click and pins from a line', async () => {
    const lesson = buildStudioLesson(buildContent());
    mockDraftSaves(lesson);
    const caption = buildCaption({ url: `/api/recordings/${lesson.recording.id}/captions/c1.vtt` });
    server.use(http.get(caption.url, () => new HttpResponse(VTT, { headers: { 'Content-Type': 'text/vtt' } })));
    const player = fakePlayer(0);
    const { user } = renderStudio(lesson, { player, playback: buildStudioPlayback(lesson, { captions: [caption] }) });

    const lines = await screen.findByRole('list', { name: 'Lines of English' });
    expect(within(lines).getAllByRole('listitem')).toHaveLength(2);
    act(() => player.play(5));
    expect(within(lines).getAllByRole('listitem')[1]).toHaveAttribute('aria-current', 'true');
    expect(within(lines).getAllByRole('listitem')[0]).not.toHaveAttribute('aria-current');

    await user.click(screen.getByRole('button', { name: 'Jump to 0:01.000: The compass needle points north.' }));
    expect(player.currentTime()).toBe(1);
    expect(within(lines).getAllByRole('listitem')[0]).toHaveAttribute('aria-current', 'true');

    await user.click(screen.getByRole('button', { name: 'Pin here, at 0:04.000' }));
    const picker = screen.getByRole('dialog', { name: 'Pin at 0:04.000' });
    await user.click(within(picker).getByRole('button', { name: 'Prediction' }));
    expect(screen.getByRole('button', { name: 'Prediction, at 0:04.000' })).toHaveAttribute('aria-pressed', 'true');
    expect(player.currentTime()).toBe(4);
  });

  it('says when there are no captions, draws the thumbnail strip, and seeks when the strip is clicked', async () => {
    const lesson = buildStudioLesson(buildContent());
    mockDraftSaves(lesson);
    const sheet = 'http://127.0.0.1:4312/pinfield-media/sheet-0.jpg?X-Amz-Signature=s';
    const thumbs = `WEBVTT\n\n00:00:00.000 --> 00:00:30.000\n${sheet}#xywh=0,0,160,90\n\n00:00:30.000 --> 00:01:00.000\n${sheet}#xywh=160,0,160,90\n`;
    server.use(
      http.get(`/api/lessons/${lesson.id}/thumbnails.vtt`, () => new HttpResponse(thumbs, { headers: { 'Content-Type': 'text/vtt' } })),
    );
    const player = fakePlayer(0);
    const { user } = renderStudio(lesson, {
      player,
      playback: buildStudioPlayback(lesson, { thumbnailsUrl: `/api/lessons/${lesson.id}/thumbnails.vtt` }),
    });
    expect(await screen.findByText(/This recording has no captions yet/)).toBeInTheDocument();
    const strip = await screen.findByTestId('thumbnail-strip');
    const tiles = Array.from(strip.querySelectorAll<HTMLElement>('[style*="background-image"]'));
    expect(tiles.length).toBeGreaterThan(1);
    expect(tiles[0]!.style.backgroundPosition).toBe('0px 0px');
    expect(tiles.at(-1)!.style.backgroundPosition).toBe('-160px 0px');
    // 800 px fallback width for 60 s: 400 px is 0:30.
    await user.pointer({ keys: '[MouseLeft]', target: screen.getByTestId('seek-strip'), coords: { clientX: 400 } });
    expect(player.currentTime()).toBe(30);
    expect(screen.getByText(/playhead 0:30.000/)).toBeInTheDocument();
  });

  it('zooms the timeline with its buttons and adds a chapter at the playhead', async () => {
    const lesson = buildStudioLesson(buildContent());
    const saves = mockDraftSaves(lesson);
    const { user } = renderStudio(lesson, { player: fakePlayer(10) });
    await user.click(await screen.findByRole('button', { name: 'Zoom in' }));
    expect(within(screen.getByRole('group', { name: 'Zoom' })).getByText('1.5×')).toBeInTheDocument();
    await user.keyboard('=');
    expect(within(screen.getByRole('group', { name: 'Zoom' })).getByText('2×')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add chapter here' }));
    expect(screen.getByRole('button', { name: 'Chapter “Chapter 1”, 0:10.000 to 1:00.000' })).toBeInTheDocument();
    await user.type(screen.getByRole('textbox', { name: 'Chapter title' }), 'Current on');
    expect(screen.getByRole('button', { name: 'Chapter “Current on”, 0:10.000 to 1:00.000' })).toHaveAttribute('aria-pressed', 'true');
    act(() => (document.activeElement as HTMLElement).blur()); // shortcuts wait while typing in a field
    await user.keyboard('c'); // inside the new chapter: refused with the reason
    expect(screen.getByText(/0:10.000 is inside the chapter “Current on”/)).toBeInTheDocument();
    await screen.findByText('Saved · 14:02');
    expect(saves.at(-1)?.content.chapters).toEqual([expect.objectContaining({ title: 'Current on', startMs: 10_000, endMs: 60_000 })]);
  });
});
