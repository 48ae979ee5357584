import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildRecording } from '@/testing/mocks/recordings';
import { renderWithProviders } from '@/testing/test-utils';
import { MakeLessonLink } from './make-lesson-link';

describe('Make a lesson link', () => {
  it('opens the new-lesson form with a ready recording chosen', () => {
    const recording = buildRecording({ title: 'Coil on a bench (test)', state: 'ready', usedBy: [] });
    renderWithProviders(<MakeLessonLink recording={recording} />);
    expect(screen.getByRole('link', { name: 'Make a lesson from Coil on a bench (test)' })).toHaveAttribute(
      'href',
      `/teacher/lessons/new?recording=${recording.id}`,
    );
  });

  it('is not offered while the recording is not ready', () => {
    renderWithProviders(<MakeLessonLink recording={buildRecording({ state: 'processing', usedBy: [] })} />);
    expect(screen.queryByRole('link')).not.toBeInTheDocument();
  });
});
