import { act, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { useEffect } from 'react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { StudentLessonView } from '@core/contracts';
import { FakeVideoPlayer } from '@/features/player/fake-video-player';
import { mcAt, viewOf } from '@/features/player/logic/test-view';
import { gradeOf, testPlayback } from '@/features/player/player-test-support';
import type { VideoPlayerProps } from '@/features/player/video-player';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderWithProviders } from '@/testing/test-utils';
import LessonPreviewRoute from './lesson-preview';

let fake: FakeVideoPlayer;

vi.mock('@/features/player/video-player', () => ({
  VideoPlayer: ({ onReady }: VideoPlayerProps) => {
    useEffect(() => onReady?.(fake.asPlayer()), [onReady]);
    return <div data-testid="video" />;
  },
}));

const lessonId = '11111111-1111-4111-8111-111111111111';
const view: StudentLessonView = viewOf([mcAt('pause1', 3000)]);

function renderPreview(section = '/teacher') {
  return renderWithProviders(
    <Routes>
      <Route path="/:section/lessons/:lessonId/preview" element={<LessonPreviewRoute />} />
    </Routes>,
    { route: `${section}/lessons/${lessonId}/preview` },
  );
}

function mockLesson(previewView: () => StudentLessonView = () => view) {
  let previews = 0;
  server.use(
    http.get(`/api/lessons/${lessonId}/preview`, () => {
      previews += 1;
      return HttpResponse.json(previewView());
    }),
    http.get(`/api/lessons/${lessonId}/playback`, () => HttpResponse.json(testPlayback)),
  );
  return { previews: () => previews };
}

beforeEach(() => {
  fake = new FakeVideoPlayer();
});

describe('lesson preview page', { timeout: 20_000 }, () => {
  it('says nothing is recorded and links back to the lesson in the same section', async () => {
    mockLesson();
    renderPreview('/substitute');
    expect(await screen.findByRole('heading', { name: 'Preview: Coil and compass (demo)' })).toBeInTheDocument();
    expect(screen.getByText('Answers are graded as a student’s would be, and nothing is recorded.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the lesson' })).toHaveAttribute('href', `/substitute/lessons/${lessonId}`);
  });

  it('grades an answer on the server with the attempt number and the CSRF header, and restarts with attempts cleared', async () => {
    const counts = mockLesson();
    const bodies: unknown[] = [];
    server.use(
      http.post(`/api/lessons/${lessonId}/preview/checkpoints/pause1/answer`, async ({ request }) => {
        expect(request.headers.get('X-CSRF-Token')).toBe('csrf-1');
        bodies.push(await request.json());
        return HttpResponse.json(gradeOf({ feedback: 'Look at the **needle** again.' }));
      }),
    );
    const { user } = renderPreview();
    await waitFor(() => expect(document.querySelector('[data-lesson-player][data-ready="true"]')).not.toBeNull());
    act(() => void fake.play());
    act(() => fake.playTo(3100));
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('radio', { name: 'Away from the coil' }));
    await user.click(within(dialog).getByRole('button', { name: 'Check my answer' }));
    expect(await within(dialog).findByText('needle')).toBeInTheDocument();
    expect(bodies).toEqual([{ attempt: 1, answer: { kind: 'multiple-choice', optionIds: ['b'] } }]);

    await user.click(screen.getByRole('button', { name: 'Restart preview' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(counts.previews()).toBe(2);
    await waitFor(() => expect(document.querySelector('[data-lesson-player][data-ready="true"]')).not.toBeNull());
    fake.ms = 0;
    act(() => void fake.play());
    act(() => fake.playTo(3100));
    const again = await screen.findByRole('dialog');
    await user.click(within(again).getByRole('radio', { name: 'Towards the coil' }));
    await user.click(within(again).getByRole('button', { name: 'Check my answer' }));
    await within(again).findByText('Not right yet');
    expect(bodies[1]).toEqual({ attempt: 1, answer: { kind: 'multiple-choice', optionIds: ['a'] } });
  });

  it('shows the server’s message when the preview cannot be loaded', async () => {
    server.use(
      http.get(`/api/lessons/${lessonId}/preview`, () => apiError(404, 'not_found', 'There is no lesson with this id in your school.')),
      http.get(`/api/lessons/${lessonId}/playback`, () => HttpResponse.json(testPlayback)),
    );
    renderPreview();
    expect(await screen.findByText('The lesson could not be loaded for preview')).toBeInTheDocument();
    expect(screen.getByText('There is no lesson with this id in your school.')).toBeInTheDocument();
  });
});
