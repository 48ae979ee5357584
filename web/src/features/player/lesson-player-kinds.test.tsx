import { act, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useEffect } from 'react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { StudentCheckpoint, StudentLessonView } from '@core/contracts';
import { FakeVideoPlayer } from './fake-video-player';
import { LessonPlayer, type AnswerSender } from './lesson-player';
import { gradedOf, testPlayback } from './player-test-support';
import { answered, mcAt, predictionAt, viewOf } from './logic/test-view';
import type { VideoPlayerProps } from './video-player';

let fake: FakeVideoPlayer;

vi.mock('./video-player', () => ({
  VideoPlayer: ({ onReady }: VideoPlayerProps) => {
    useEffect(() => onReady?.(fake.asPlayer()), [onReady]);
    return <div data-testid="video" />;
  },
}));

function renderView(view: StudentLessonView, onAnswer: AnswerSender = vi.fn()) {
  const user = userEvent.setup();
  render(<LessonPlayer view={view} playback={testPlayback} onAnswer={onAnswer} mode="watch" />);
  return { user };
}

const play = () => act(() => void fake.play());
const playTo = (ms: number) => act(() => fake.playTo(ms));

beforeEach(() => {
  fake = new FakeVideoPlayer();
});

describe('LessonPlayer kinds', { timeout: 20_000 }, () => {
  it('takes a prediction at the pin and shows it beside what happened at the reveal, with an explanation', async () => {
    const onAnswer = vi
      .fn<AnswerSender>()
      .mockResolvedValueOnce(
        gradedOf({
          correct: null,
          feedback: 'Prediction saved. Watch what happens next.',
          attemptsLeft: 0,
          reveal: { answer: '', explanation: 'The needle turned further.' },
        }),
      )
      .mockResolvedValueOnce(
        gradedOf({
          correct: null,
          feedback: 'Prediction saved.',
          attemptsLeft: 0,
          reveal: { answer: '', explanation: 'The needle turned further.' },
        }),
      );
    const { user } = renderView(viewOf([predictionAt('pred01', 2000, 9000)]), onAnswer);
    play();
    playTo(2100);
    await user.click(screen.getByRole('radio', { name: 'Stay put' }));
    await user.click(screen.getByRole('button', { name: 'Save my prediction' }));
    expect(await screen.findByText('Saved')).toBeInTheDocument();
    // What happens is kept for the reveal time.
    expect(screen.queryByText('The needle turned further.')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Continue' }));

    playTo(9200);
    expect(fake.ms).toBe(9000);
    const dialog = screen.getByRole('dialog');
    expect(within(within(dialog).getByRole('region', { name: 'Your prediction' })).getByText('Stay put')).toBeInTheDocument();
    const happened = within(dialog).getByRole('region', { name: 'What happened' });
    expect(within(happened).getByText('The needle turned further.')).toBeInTheDocument();
    // The teacher's account of what happens, not a "why" as after a question.
    expect(within(happened).getByText('The teacher’s account')).toBeInTheDocument();
    expect(within(happened).queryByText('Why')).toBeNull();
    await user.type(within(dialog).getByRole('textbox', { name: /Explain the difference/ }), 'The field grew with the current.');
    await user.click(within(dialog).getByRole('button', { name: 'Send my explanation' }));
    expect(onAnswer).toHaveBeenLastCalledWith(
      'pred01',
      { kind: 'prediction', optionId: 'p2', text: null, explanation: 'The field grew with the current.' },
      2,
    );
    expect(await within(dialog).findByText('Your explanation')).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Continue' }));
    expect(fake.isPaused).toBe(false);
  });

  it('keeps whether a scored prediction matched until the reveal', async () => {
    const scored = { ...predictionAt('pred02', 1000, 4000), scored: true, askExplanation: false } as StudentCheckpoint;
    const onAnswer = vi.fn<AnswerSender>().mockResolvedValue(
      gradedOf({
        correct: false,
        feedback: 'Saved. Watch closely.',
        attemptsLeft: 0,
        reveal: { answer: 'Turn further', explanation: 'More current, more field.' },
      }),
    );
    const { user } = renderView(viewOf([scored]), onAnswer);
    play();
    playTo(1100);
    await user.click(screen.getByRole('radio', { name: 'Stay put' }));
    await user.click(screen.getByRole('button', { name: 'Save my prediction' }));
    expect(await screen.findByText('Saved')).toBeInTheDocument();
    expect(screen.queryByText('Not right yet')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Try again' })).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Continue' }));
    playTo(4100);
    expect(screen.getByText('Your prediction did not match.')).toBeInTheDocument();
    expect(screen.getByText('More current, more field.')).toBeInTheDocument();
    expect(screen.queryByRole('textbox')).toBeNull();
  });

  it('offers the sign choices by their labels and sends the chosen one', async () => {
    const sign: StudentCheckpoint = {
      key: 'sign01',
      atMs: 1000,
      label: 'Field direction',
      behaviour: 'gate',
      ...answered,
      kind: 'sign',
      prompt: 'Which way does the field point at P?',
      choiceSet: 'page',
      choices: ['into', 'out'],
      figure: null,
    };
    const onAnswer = vi.fn<AnswerSender>().mockResolvedValue(gradedOf({ correct: true, score: 1, feedback: 'Correct.' }));
    const { user } = renderView(viewOf([sign]), onAnswer);
    play();
    playTo(1100);
    await user.click(screen.getByRole('button', { name: 'Out of the page' }));
    expect(screen.getByRole('button', { name: 'Out of the page' })).toHaveAttribute('aria-pressed', 'true');
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(onAnswer).toHaveBeenCalledWith('sign01', { kind: 'sign', choice: 'out' }, 1);
    expect(await screen.findByText('Right')).toBeInTheDocument();
  });

  it('shows a safety note and an equation card, each continued without an answer', async () => {
    const note: StudentCheckpoint = {
      key: 'note01',
      atMs: 1000,
      label: '',
      behaviour: 'gate',
      kind: 'note',
      tone: 'safety',
      body: 'Switch the supply **off** before touching the coil.',
    };
    const card: StudentCheckpoint = {
      key: 'card01',
      atMs: 3000,
      label: 'Field on the axis',
      behaviour: 'pause',
      kind: 'equation',
      latex: 'B = \\frac{\\mu_0 N I}{2R}',
      caption: 'At the centre of the coil.',
      model: null,
    };
    const { user } = renderView(viewOf([note, card]));
    play();
    playTo(1100);
    expect(screen.getByText('Safety caution')).toBeInTheDocument();
    expect(screen.getByText('off')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Continue' }));
    playTo(3100);
    expect(screen.getByRole('heading', { name: 'Field on the axis' })).toBeInTheDocument();
    expect(screen.getByText('At the centre of the coil.')).toBeInTheDocument();
    expect(document.querySelector('.katex')).not.toBeNull();
    await user.click(screen.getByRole('button', { name: 'Continue' }));
    expect(fake.isPaused).toBe(false);
  });

  it('shows an aside beside the playing video until it is closed', async () => {
    const { user } = renderView(viewOf([mcAt('aside1', 1000, 'aside')]));
    play();
    playTo(1100);
    expect(fake.isPaused).toBe(false);
    const aside = screen.getByRole('complementary', { name: 'Aside: Question aside1' });
    expect(within(aside).getByText(/the video keeps playing/)).toBeInTheDocument();
    // In the column beside the video on wide screens (after it in reading order, for phones).
    expect(aside.closest('[data-player-side]')).not.toBeNull();
    expect(screen.getByTestId('video').compareDocumentPosition(aside) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    await user.click(within(aside).getByRole('button', { name: /Close the aside/ }));
    expect(screen.queryByRole('complementary')).toBeNull();
  });

  it('jumps by chapter, and a gate on the way still holds', async () => {
    const view = {
      ...viewOf([mcAt('gate01', 4000, 'gate')]),
      chapters: [
        { key: 'chap01', title: 'Setting up', startMs: 0, endMs: 4000 },
        { key: 'chap02', title: 'Doubling the current', startMs: 6000, endMs: 12000 },
      ],
    };
    const { user } = renderView(view);
    await user.click(screen.getByRole('button', { name: /Doubling the current/ }));
    expect(fake.ms).toBe(4000);
    expect(screen.getByText(/Answer this checkpoint before going past 0:04\.0/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Checkpoint 1 of 1 at 0:04.0: Question gate01, must be answered' })).toBeInTheDocument();
    // A tick on the progress bar at 4 s of 60 s.
    const ticks = fake.element.querySelectorAll<HTMLElement>('.vjs-progress-holder [data-checkpoint-ticks] > span');
    expect(Array.from(ticks).map((tick) => tick.style.left)).toEqual([`${(4 / 60) * 100}%`]);
  });
});
