import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CheckpointOf } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from '../checkpoint-form.test-support';

function prediction(): CheckpointOf<'prediction'> {
  const cp = newCheckpoint('prediction', 20_000);
  return {
    ...cp,
    prompt: 'What will the needle do when the current reverses?',
    response: {
      mode: 'choices',
      options: [
        { id: 'left', text: 'Swing left' },
        { id: 'right', text: 'Swing right' },
      ],
      correctOptionId: null,
    },
  };
}

describe('PredictionForm', () => {
  it('shows the reveal time as m:ss.mmm and sends a typed one', async () => {
    const { user, last } = renderCheckpointForm(prediction());
    const reveal = screen.getByLabelText('Reveal time');
    expect(reveal).toHaveValue('0:25.000');
    await user.clear(reveal);
    await user.type(reveal, '1:05.250');
    expect(last()?.revealAtMs).toBe(65_250);
  });

  it('refuses a reveal before the pin, past the end, or not a time, live', async () => {
    const { user, onChange } = renderCheckpointForm(prediction(), { durationMs: 90_000 });
    const reveal = screen.getByLabelText('Reveal time');
    await user.clear(reveal);
    await user.type(reveal, '0:10');
    expect(reveal).toHaveAccessibleDescription(
      expect.stringContaining('The reveal must come after the prediction, which is pinned at 0:20.000.'),
    );
    await user.clear(reveal);
    await user.type(reveal, '2:00');
    expect(reveal).toHaveAccessibleDescription(expect.stringContaining('The recording ends at 1:30.000'));
    onChange.mockClear();
    await user.clear(reveal);
    await user.type(reveal, 'soon');
    expect(reveal).toHaveAccessibleDescription(expect.stringContaining('“soon” is not a time'));
    expect(onChange).not.toHaveBeenCalled();
  });

  it('switches to free text and back without losing the choices', async () => {
    const { user, last } = renderCheckpointForm(prediction());
    await user.click(screen.getByLabelText(/Free text/));
    expect(last()?.response).toEqual({ mode: 'text' });
    expect(screen.getByLabelText('Score this prediction')).toBeDisabled();
    await user.click(screen.getByLabelText(/^Choices/));
    expect(last()?.response).toMatchObject({ mode: 'choices', options: [{ id: 'left' }, { id: 'right' }] });
  });

  it('scores only with a correct choice picked', async () => {
    const { user, last } = renderCheckpointForm(prediction());
    await user.click(screen.getByLabelText('Score this prediction'));
    expect(last()?.scored).toBe(true);
    await user.click(screen.getByLabelText('Choice 2: Swing right'));
    expect(last()?.response).toMatchObject({ mode: 'choices', correctOptionId: 'right' });
    // Removing the correct choice clears it rather than keeping a dangling id.
    await user.click(screen.getByLabelText('Remove Choice 2'));
    expect(last()?.response).toMatchObject({ mode: 'choices', correctOptionId: null });
  });

  it('edits the reveal text and the explain toggle, and places a server problem', async () => {
    const { user, last } = renderCheckpointForm(prediction(), {
      problems: [
        { path: 'response.correctOptionId', message: 'A scored prediction needs its correct choice: pick it, or turn scoring off.' },
      ],
    });
    expect(screen.getByText('A scored prediction needs its correct choice: pick it, or turn scoring off.')).toBeInTheDocument();
    expect(screen.queryByRole('alert')).toBeNull();
    await user.type(screen.getByLabelText('Reveal text'), 'It swings right.');
    await user.click(screen.getByLabelText('Ask “explain the difference”'));
    expect(last()).toMatchObject({ revealText: 'It swings right.', askExplanation: false });
  });
});
