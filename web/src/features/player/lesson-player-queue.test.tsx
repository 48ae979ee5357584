import { act, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useEffect, type ComponentProps } from 'react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { FakeVideoPlayer } from './fake-video-player';
import { LessonPlayer, type AnswerSender, type GradeArrival } from './lesson-player';
import { gradedOf, gradeOf, testPlayback } from './player-test-support';
import { mcAt, predictionAt, viewOf } from './logic/test-view';
import type { VideoPlayerProps } from './video-player';

let fake: FakeVideoPlayer;

vi.mock('./video-player', () => ({
  VideoPlayer: ({ onReady }: VideoPlayerProps) => {
    useEffect(() => onReady?.(fake.asPlayer()), [onReady]);
    return <div data-testid="video" />;
  },
}));

type Props = ComponentProps<typeof LessonPlayer>;

function renderPlayer(props: Partial<Props> & Pick<Props, 'view' | 'onAnswer'>) {
  const user = userEvent.setup();
  const onEvent = vi.fn();
  const all: Props = { playback: testPlayback, mode: 'watch', onEvent, ...props };
  const result = render(<LessonPlayer {...all} />);
  const update = (next: Partial<Props>) => result.rerender(<LessonPlayer {...all} {...next} />);
  return { ...result, user, onEvent, update };
}

const play = () => act(() => void fake.play());
const playTo = (ms: number) => act(() => fake.playTo(ms));
const towards = { kind: 'multiple-choice' as const, optionIds: ['a'] };

beforeEach(() => {
  fake = new FakeVideoPlayer();
});

describe('LessonPlayer with a durable answer queue', { timeout: 20_000 }, () => {
  it('opens a gate once its answer is queued, and shows the grade, hints and a retry when it arrives (once)', async () => {
    const onAnswer = vi.fn<AnswerSender>().mockResolvedValue({ status: 'queued' });
    const { user, onEvent, update } = renderPlayer({ view: viewOf([mcAt('gate01', 5000, 'gate')]), onAnswer });
    play();
    playTo(5100);
    const dialog = screen.getByRole('dialog');
    await user.click(within(dialog).getByRole('radio', { name: 'Towards the coil' }));
    await user.click(within(dialog).getByRole('button', { name: 'Check my answer' }));
    expect(await within(dialog).findByText('Saved on this device, not graded yet')).toBeInTheDocument();
    expect(onEvent).toHaveBeenCalledWith({ type: 'queued', key: 'gate01', attempt: 1 });
    expect(within(dialog).queryByRole('button', { name: 'Try again' })).toBeNull();
    // The gate lets the video go on.
    await user.click(within(dialog).getByRole('button', { name: 'Continue' }));
    expect(fake.isPaused).toBe(false);
    act(() => fake.seekByViewer(20_000));
    expect(fake.ms).toBe(20_000);

    const arrival: GradeArrival = {
      id: 'key-1',
      key: 'gate01',
      attempt: 1,
      answer: towards,
      grade: gradeOf({ hints: ['Use the right-hand rule.'] }),
      feedbackHidden: false,
    };
    update({ arrivals: [arrival] });
    update({ arrivals: [arrival] });
    expect(onEvent.mock.calls.filter(([event]) => event.type === 'graded')).toHaveLength(1);
    await user.click(screen.getByRole('button', { name: /Checkpoint 1 of 1 at 0:05\.0: Question gate01, done/ }));
    const reopened = screen.getByRole('dialog');
    expect(within(reopened).getByText('Not right yet')).toBeInTheDocument();
    expect(within(reopened).getByText('Use the right-hand rule.')).toBeInTheDocument();
    await user.click(within(reopened).getByRole('button', { name: 'Try again' }));
    await user.click(within(reopened).getByRole('radio', { name: 'Away from the coil' }));
    await user.click(within(reopened).getByRole('button', { name: 'Check my answer' }));
    // Attempt 2: the queued one counted as attempt 1.
    expect(onAnswer).toHaveBeenLastCalledWith('gate01', { kind: 'multiple-choice', optionIds: ['b'] }, 2);
  });

  it('says a refused queued answer was not recorded and opens the form again', async () => {
    const onAnswer = vi.fn<AnswerSender>().mockResolvedValue({ status: 'queued' });
    const { user, update } = renderPlayer({ view: viewOf([mcAt('pause1', 2000)]), onAnswer });
    play();
    playTo(2100);
    await user.click(screen.getByRole('radio', { name: 'Towards the coil' }));
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(await screen.findByText('Saved on this device, not graded yet')).toBeInTheDocument();
    update({
      refusals: [{ id: 'key-1', key: 'pause1', attempt: 1, message: 'This lesson closed on 3 Dec 2026, 17:00 (school time).' }],
    });
    const dialog = screen.getByRole('dialog');
    expect(within(dialog).getByText('The answer was not sent')).toBeInTheDocument();
    expect(within(dialog).getByText('This lesson closed on 3 Dec 2026, 17:00 (school time).')).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Check my answer' })).toBeEnabled();
    expect(within(dialog).queryByText('Saved on this device, not graded yet')).toBeNull();
  });

  it('shows a neutral "saved" with feedback hidden, and lets the answer be changed while attempts remain', async () => {
    const onAnswer = vi
      .fn<AnswerSender>()
      .mockResolvedValue(
        gradedOf({ correct: null, feedback: 'Your answer is saved. Feedback comes after the due date.', attemptsLeft: 1 }, true),
      );
    const { user } = renderPlayer({ view: viewOf([mcAt('pause1', 2000)]), onAnswer });
    play();
    playTo(2100);
    await user.click(screen.getByRole('radio', { name: 'Towards the coil' }));
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(await screen.findByText('Answer saved')).toBeInTheDocument();
    expect(screen.getByText('Your answer is saved. Feedback comes after the due date.')).toBeInTheDocument();
    expect(screen.getByText('You can change it once more; your latest answer is the one that counts.')).toBeInTheDocument();
    expect(screen.queryByText('Not right yet')).toBeNull();
    expect(screen.queryByText('Right')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Change my answer' }));
    expect(screen.getByRole('button', { name: 'Check my answer' })).toBeInTheDocument();
  });

  it('keeps a queued prediction beside the reveal without asking for what happened', async () => {
    const onAnswer = vi.fn<AnswerSender>().mockResolvedValue({ status: 'queued' });
    const { user } = renderPlayer({ view: viewOf([predictionAt('pred01', 2000, 6000)]), onAnswer });
    play();
    playTo(2100);
    await user.click(screen.getByRole('radio', { name: 'Stay put' }));
    await user.click(screen.getByRole('button', { name: 'Save my prediction' }));
    await user.click(await screen.findByRole('button', { name: 'Continue' }));
    playTo(6100);
    const dialog = screen.getByRole('dialog');
    expect(within(within(dialog).getByRole('region', { name: 'Your prediction' })).getByText('Stay put')).toBeInTheDocument();
    expect(within(dialog).getByText(/saved on this device and not graded yet/)).toBeInTheDocument();
    expect(within(dialog).queryByRole('button', { name: 'Show what happened' })).toBeNull();
    // The explanation can still be given; it is queued behind the prediction.
    await user.type(within(dialog).getByRole('textbox', { name: /Explain the difference/ }), 'More current.');
    await user.click(within(dialog).getByRole('button', { name: 'Send my explanation' }));
    expect(onAnswer).toHaveBeenLastCalledWith(
      'pred01',
      { kind: 'prediction', optionId: 'p2', text: null, explanation: 'More current.' },
      2,
    );
  });

  it('says when the reveal policy shows what happened later instead of offering to show it', async () => {
    const onAnswer = vi.fn<AnswerSender>().mockResolvedValue(gradedOf({ correct: null, feedback: 'Prediction saved.', attemptsLeft: 0 }));
    const { user } = renderPlayer({
      view: viewOf([predictionAt('pred01', 2000, 6000)]),
      onAnswer,
      revealNote: 'Answers and explanations are shown after 3 Dec 2026, 17:00.',
    });
    play();
    playTo(2100);
    await user.click(screen.getByRole('radio', { name: 'Turn further' }));
    await user.click(screen.getByRole('button', { name: 'Save my prediction' }));
    await user.click(await screen.findByRole('button', { name: 'Continue' }));
    playTo(6100);
    const dialog = screen.getByRole('dialog');
    expect(within(dialog).getByText('Answers and explanations are shown after 3 Dec 2026, 17:00.')).toBeInTheDocument();
    expect(within(dialog).queryByRole('button', { name: 'Show what happened' })).toBeNull();
    expect(within(dialog).getByRole('button', { name: 'Send my explanation' })).toBeInTheDocument();
  });

  it('announces where the video stopped', () => {
    renderPlayer({ view: viewOf([mcAt('pause1', 2000)]), onAnswer: vi.fn<AnswerSender>() });
    play();
    playTo(2100);
    expect(screen.getByText('The video stopped at 0:02.0: Question pause1.')).toBeInTheDocument();
  });
});
