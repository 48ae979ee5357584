import { act, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CheckpointOf } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from '../checkpoint-form.test-support';

function question(): CheckpointOf<'multiple-choice'> {
  const cp = newCheckpoint('multiple-choice', 12_000);
  return {
    ...cp,
    options: [
      { id: 'opta', text: 'Towards the coil', correct: true, feedback: '' },
      { id: 'optb', text: 'Away from the coil', correct: false, feedback: '' },
      { id: 'optc', text: 'No force', correct: false, feedback: '' },
    ],
  };
}

describe('MultipleChoiceForm', () => {
  it('sends every keystroke of the question, without losing any while the studio re-renders', async () => {
    const { user, last, onChange } = renderCheckpointForm(question());
    const prompt = screen.getByLabelText('Question');
    await user.type(prompt, 'Which way does the needle swing?');
    expect(prompt).toHaveValue('Which way does the needle swing?');
    expect(last()?.prompt).toBe('Which way does the needle swing?');
    expect(onChange).toHaveBeenCalledTimes('Which way does the needle swing?'.length);
  });

  it('marks one correct option at a time, in a single change', async () => {
    const { user, last, onChange } = renderCheckpointForm(question());
    await user.click(screen.getByLabelText('Option 3 is the correct answer'));
    expect(onChange).toHaveBeenCalledTimes(1);
    expect(last()?.options.map((o) => o.correct)).toEqual([false, false, true]);
  });

  it('allows several correct options with checkboxes, and keeps only the first when going back to one', async () => {
    const { user, last } = renderCheckpointForm(question());
    await user.click(screen.getByLabelText(/Several may be correct/));
    expect(last()?.allowSeveral).toBe(true);
    await user.click(screen.getByLabelText('Option 2 is correct'));
    expect(last()?.options.map((o) => o.correct)).toEqual([true, true, false]);
    await user.click(screen.getByLabelText('One option is correct'));
    expect(last()?.allowSeveral).toBe(false);
    expect(last()?.options.map((o) => o.correct)).toEqual([true, false, false]);
  });

  it('adds, reorders and removes options, keeping their ids', async () => {
    const { user, last } = renderCheckpointForm(question());
    await user.click(screen.getByText('Add an option'));
    expect(last()?.options).toHaveLength(4);
    expect(last()?.options[3]).toMatchObject({ text: '', correct: false, feedback: '' });
    await user.click(screen.getByLabelText('Move Option 1 down'));
    expect(
      last()
        ?.options.map((o) => o.id)
        .slice(0, 3),
    ).toEqual(['optb', 'opta', 'optc']);
    expect(screen.getByLabelText('Option 1 text')).toHaveValue('Away from the coil');
    await user.click(screen.getByLabelText('Remove Option 3'));
    expect(last()?.options.map((o) => o.id)).toHaveLength(3);
    expect(last()?.options.some((o) => o.id === 'optc')).toBe(false);
  });

  it('writes per-option feedback and the shuffle setting', async () => {
    const { user, last } = renderCheckpointForm(question());
    await user.type(screen.getByLabelText('Feedback for option 2'), 'Check Lenz');
    expect(last()?.options[1]?.feedback).toBe('Check Lenz');
    await user.click(screen.getByLabelText('Shuffle the options'));
    expect(last()?.shuffle).toBe(false);
  });

  it("shows the contract's message beside a field as the teacher types", async () => {
    const { user } = renderCheckpointForm(question());
    const label = screen.getByLabelText('Label');
    await user.click(label);
    await user.paste('x'.repeat(81));
    expect(label).toHaveAccessibleDescription(expect.stringContaining('A label has at most 80 characters.'));
    expect(label).toHaveAttribute('aria-invalid', 'true');
  });

  it('places server problems under their fields and the rest at the top', () => {
    renderCheckpointForm(question(), {
      problems: [
        { path: 'options.1.text', message: 'Write this option, or remove it.' },
        { path: 'options', message: 'Mark the correct option.' },
        { path: 'atMs', message: 'Another checkpoint is 0.2 s away.' },
      ],
    });
    expect(screen.getByLabelText('Option 2 text')).toHaveAccessibleDescription(expect.stringContaining('Write this option, or remove it.'));
    expect(within(screen.getByRole('group', { name: 'Options' })).getByText('Mark the correct option.')).toBeInTheDocument();
    expect(within(screen.getByRole('alert')).getByText('Another checkpoint is 0.2 s away.')).toBeInTheDocument();
    expect(within(screen.getByRole('alert')).queryByText('Mark the correct option.')).toBeNull();
  });

  it('refuses a number that is not one, and never sends it', async () => {
    const { user, last, onChange } = renderCheckpointForm(question());
    const points = screen.getByLabelText('Points');
    await user.clear(points);
    await user.type(points, 'two');
    expect(points).toHaveAccessibleDescription(expect.stringContaining('is not a number'));
    expect(onChange).not.toHaveBeenCalled();
    await user.clear(points);
    await user.type(points, '150');
    expect(last()?.points).toBe(150);
    expect(points).toHaveAccessibleDescription(expect.stringContaining('A checkpoint is worth at most 100 points.'));
  });

  it('adds hints, shown one by one, up to the limit', async () => {
    const { user, last } = renderCheckpointForm(question());
    for (let i = 0; i < 5; i++) await user.click(screen.getByText('Add a hint'));
    expect(screen.getByText('Add a hint').closest('button')).toBeDisabled();
    await user.type(screen.getByLabelText('Hint 2 text'), 'Right-hand rule');
    expect(last()?.hints).toEqual(['', 'Right-hand rule', '', '', '']);
    await user.click(screen.getByLabelText('Move Hint 2 up'));
    expect(last()?.hints[0]).toBe('Right-hand rule');
  });

  it('shows a checkpoint changed from outside (undo) without sending it back', async () => {
    const { setFromOutside, onChange } = renderCheckpointForm(question());
    act(() => setFromOutside({ ...question(), prompt: 'Restored by undo', behaviour: 'aside' }));
    expect(await screen.findByDisplayValue('Restored by undo')).toBeInTheDocument();
    expect(screen.getByLabelText('Aside (video keeps playing)', { exact: false })).toBeChecked();
    expect(onChange).not.toHaveBeenCalled();
  });
});
