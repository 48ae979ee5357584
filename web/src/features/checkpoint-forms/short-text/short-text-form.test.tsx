import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CheckpointOf } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from '../checkpoint-form.test-support';

function question(): CheckpointOf<'short-text'> {
  return { ...newCheckpoint('short-text', 5_000), prompt: 'Name the unit of magnetic flux density.', accepted: ['tesla'] };
}

describe('ShortTextForm', () => {
  it('edits the accepted answers', async () => {
    const { user, last } = renderCheckpointForm(question());
    await user.click(screen.getByText('Add an accepted answer'));
    await user.type(screen.getByLabelText('Accepted answer 2 text'), 'T');
    expect(last()?.accepted).toEqual(['tesla', 'T']);
    await user.click(screen.getByLabelText('Remove Accepted answer 1'));
    expect(last()?.accepted).toEqual(['T']);
  });

  it('sets the case and spacing rules, and the trial answer follows them', async () => {
    const { user, last } = renderCheckpointForm({ ...question(), accepted: ['north pole'] });
    const trial = screen.getByLabelText('Try an answer');
    await user.type(trial, 'North   Pole');
    expect(screen.getByText('Counts as right.')).toBeInTheDocument();

    await user.click(screen.getByLabelText('Case matters'));
    expect(last()?.caseSensitive).toBe(true);
    expect(screen.getByText('Would not count as right.')).toBeInTheDocument();

    await user.click(screen.getByLabelText('Case matters'));
    await user.click(screen.getByLabelText(/Spaces as typed/));
    expect(last()?.spacing).toBe('exact');
    expect(screen.getByText('Would not count as right.')).toBeInTheDocument();

    await user.click(screen.getByLabelText(/Spaces do not count at all/));
    expect(last()?.spacing).toBe('ignore');
    await user.clear(trial);
    await user.type(trial, 'northpole');
    expect(screen.getByText('Counts as right.')).toBeInTheDocument();
  });

  it('shows the publish problem of the accepted list, and the contract limit on an answer', async () => {
    const { user } = renderCheckpointForm(
      { ...question(), accepted: [''] },
      {
        problems: [{ path: 'accepted', message: 'Add at least one accepted answer.' }],
      },
    );
    expect(screen.getByText('Add at least one accepted answer.')).toBeInTheDocument();
    const answer = screen.getByLabelText('Accepted answer 1 text');
    await user.click(answer);
    await user.paste('t'.repeat(201));
    expect(answer).toHaveAccessibleDescription(expect.stringContaining('An accepted answer has at most 200 characters.'));
  });
});
