import { act, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useEffect } from 'react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { StudentCheckpoint } from '@core/contracts';
import { FakeVideoPlayer } from './fake-video-player';
import { LessonPlayer, type AnswerSender } from './lesson-player';
import { gradedOf, testPlayback } from './player-test-support';
import { answered, mcAt, viewOf } from './logic/test-view';
import type { VideoPlayerProps } from './video-player';

let fake: FakeVideoPlayer;

// video.js itself is left out: a fake player at the VideoPlayer boundary is driven by hand.
vi.mock('./video-player', () => ({
  VideoPlayer: ({ onReady }: VideoPlayerProps) => {
    useEffect(() => onReady?.(fake.asPlayer()), [onReady]);
    return <div data-testid="video" />;
  },
}));

const playback = testPlayback;
const grade = gradedOf;

function renderPlayer(checkpoints: StudentCheckpoint[], onAnswer: AnswerSender = vi.fn(), safetyNotes = '') {
  const user = userEvent.setup();
  const onEvent = vi.fn();
  const result = render(
    <LessonPlayer view={viewOf(checkpoints, safetyNotes)} playback={playback} onAnswer={onAnswer} mode="preview" onEvent={onEvent} />,
  );
  return { ...result, user, onEvent };
}

const play = () => act(() => void fake.play());
const playTo = (ms: number) => act(() => fake.playTo(ms));

beforeEach(() => {
  fake = new FakeVideoPlayer();
});

describe('LessonPlayer', { timeout: 20_000 }, () => {
  it('holds the video until the safety notes are acknowledged', async () => {
    const { user, onEvent } = renderPlayer([mcAt('pause1', 5000)], vi.fn(), 'Keep the cell **away** from the magnet.');
    expect(screen.getByRole('heading', { name: 'Safety notes before you watch' })).toBeInTheDocument();
    expect(screen.getByText(/Your school’s own safety rules and local regulations come first/)).toBeInTheDocument();
    // No big play button under the "read the notes" text (player.css hides it on this class).
    expect(fake.element).toHaveClass('pf-locked');
    play();
    expect(fake.isPaused).toBe(true);
    await user.click(screen.getByRole('button', { name: 'I have read the safety notes' }));
    expect(onEvent).toHaveBeenCalledWith({ type: 'safety-acknowledged' });
    expect(fake.element).not.toHaveClass('pf-locked');
    play();
    expect(fake.isPaused).toBe(false);
  });

  it('does not repeat the line deferring to the school when the notes already say so', () => {
    renderPlayer(
      [mcAt('pause1', 5000)],
      vi.fn(),
      "Keep magnets apart. Follow your school's safety rules and local regulations, which take precedence over this note.",
    );
    expect(screen.getByText(/which take precedence over this note/)).toBeInTheDocument();
    expect(screen.queryByText(/Your school’s own safety rules and local regulations come first/)).toBeNull();
  });

  it('opens the panel in the column beside the video, after the video in reading order', () => {
    renderPlayer([mcAt('pause1', 2000)]);
    play();
    playTo(2100);
    const dialog = screen.getByRole('dialog', { name: 'Question pause1' });
    expect(dialog.closest('[data-player-side]')).not.toBeNull();
    expect(screen.getByTestId('video').closest('[data-player-side]')).toBeNull();
    expect(screen.getByTestId('video').compareDocumentPosition(dialog) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });

  it('stops at a pause pin, grades through the server, offers hints and retries, and resumes', async () => {
    const onAnswer = vi
      .fn<AnswerSender>()
      .mockResolvedValueOnce(grade({ hints: ['Use the right-hand rule.'] }))
      .mockResolvedValueOnce(
        grade({
          correct: true,
          score: 1,
          feedback: 'Correct.',
          attemptsLeft: 0,
          reveal: { answer: 'Towards the coil', explanation: 'The field points along the axis.' },
        }),
      );
    const { user, container } = renderPlayer([mcAt('pause1', 5000)], onAnswer);
    play();
    playTo(5180);
    // Overshot by one timeupdate: back to the pin, paused there.
    expect(fake.isPaused).toBe(true);
    expect(fake.ms).toBe(5000);
    const dialog = screen.getByRole('dialog', { name: 'Question pause1' });
    expect(container.querySelector('[data-stop-ms="5000"]')).not.toBeNull();
    expect(within(dialog).getByRole('heading', { name: 'Question pause1' })).toHaveFocus();
    expect(within(dialog).getByRole('button', { name: 'Skip for now' })).toBeInTheDocument();

    await user.click(within(dialog).getByRole('radio', { name: 'Away from the coil' }));
    await user.click(within(dialog).getByRole('button', { name: 'Check my answer' }));
    expect(onAnswer).toHaveBeenLastCalledWith('pause1', { kind: 'multiple-choice', optionIds: ['b'] }, 1);
    expect(await within(dialog).findByText('Not right yet')).toBeInTheDocument();
    expect(within(dialog).getByText('Use the right-hand rule.')).toBeInTheDocument();
    expect(within(dialog).getByText('1 attempt left.')).toBeInTheDocument();

    await user.click(within(dialog).getByRole('button', { name: 'Try again' }));
    await user.click(within(dialog).getByRole('radio', { name: 'Towards the coil' }));
    await user.click(within(dialog).getByRole('button', { name: 'Check my answer' }));
    expect(onAnswer).toHaveBeenLastCalledWith('pause1', { kind: 'multiple-choice', optionIds: ['a'] }, 2);
    expect(await within(dialog).findByText('Right')).toBeInTheDocument();
    expect(within(dialog).getByText('The field points along the axis.')).toBeInTheDocument();
    expect(within(dialog).queryByRole('button', { name: 'Try again' })).toBeNull();

    await user.click(within(dialog).getByRole('button', { name: 'Continue' }));
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(fake.isPaused).toBe(false);
    expect(fake.element).toHaveFocus();
  });

  it('lets a pause pin be skipped and does not stop there again', async () => {
    const { user, onEvent } = renderPlayer([mcAt('pause1', 2000)]);
    play();
    playTo(2100);
    await user.click(screen.getByRole('button', { name: 'Skip for now' }));
    expect(onEvent).toHaveBeenCalledWith({ type: 'skipped', key: 'pause1' });
    expect(fake.isPaused).toBe(false);
    act(() => fake.seekByViewer(1000));
    playTo(2500);
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(fake.isPaused).toBe(false);
  });

  it('keeps an unanswered gate: no skip, and a seek past it comes back with a message', async () => {
    const onAnswer = vi.fn<AnswerSender>().mockResolvedValue(grade({}));
    const { user } = renderPlayer([mcAt('gate01', 5000, 'gate')], onAnswer);
    play();
    playTo(5100);
    const dialog = screen.getByRole('dialog');
    expect(within(dialog).queryByRole('button', { name: 'Skip for now' })).toBeNull();
    expect(within(dialog).queryByRole('button', { name: 'Continue' })).toBeNull();
    act(() => fake.seekByViewer(20_000));
    expect(fake.ms).toBe(5000);
    expect(screen.getByText(/Answer this checkpoint before going past 0:05\.0/)).toBeInTheDocument();
    play();
    expect(fake.isPaused).toBe(true);

    await user.click(screen.getByRole('radio', { name: 'Towards the coil' }));
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    const go = await screen.findByRole('button', { name: 'Continue' });
    // Answered: the "answer before going past" message has done its work.
    expect(screen.queryByText(/Answer this checkpoint before going past/)).toBeNull();
    await user.click(go);
    act(() => fake.seekByViewer(20_000));
    expect(fake.ms).toBe(20_000);
  });

  it('shows the server’s reading problem for a numeric answer without using an attempt', async () => {
    const numeric: StudentCheckpoint = {
      key: 'numer1',
      atMs: 1000,
      label: '',
      behaviour: 'pause',
      ...answered,
      kind: 'numeric',
      prompt: 'Find the field at the centre.',
      askedUnit: 'mT',
      dimension: 'magnetic-field',
      values: {},
    };
    const onAnswer = vi
      .fn<AnswerSender>()
      .mockResolvedValueOnce(grade({ invalid: true, feedback: 'The unit “mTT” is not one Pinfield knows.', attemptsLeft: 2 }))
      .mockResolvedValueOnce(grade({ correct: true, score: 1, feedback: 'Correct.', attemptsLeft: 1 }));
    const { user } = renderPlayer([numeric], onAnswer);
    play();
    playTo(1200);
    const input = screen.getByRole('textbox', { name: 'Your answer, in mT' });
    expect(input).toHaveClass('font-mono');
    await user.type(input, '4.5 mTT');
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(await screen.findByText('This answer could not be read (no attempt used)')).toBeInTheDocument();
    expect(screen.getByText('The unit “mTT” is not one Pinfield knows.')).toBeInTheDocument();
    await user.clear(input);
    await user.type(input, '4.5 mT');
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(onAnswer).toHaveBeenLastCalledWith('numer1', { kind: 'numeric', text: '4.5 mT' }, 1);
    expect(await screen.findByText('Right')).toBeInTheDocument();
  });

  it('says when an answer could not be sent, and sends it again', async () => {
    const onAnswer = vi.fn<AnswerSender>().mockRejectedValueOnce(new TypeError('Failed to fetch')).mockResolvedValueOnce(grade({}));
    const { user } = renderPlayer([mcAt('pause1', 1000)], onAnswer);
    play();
    playTo(1100);
    await user.click(screen.getByRole('radio', { name: 'Towards the coil' }));
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(await screen.findByText('The answer was not sent')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(onAnswer).toHaveBeenLastCalledWith('pause1', { kind: 'multiple-choice', optionIds: ['a'] }, 1);
    expect(await screen.findByText('Not right yet')).toBeInTheDocument();
  });
});
