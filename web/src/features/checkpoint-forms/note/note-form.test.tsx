import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from '../checkpoint-form.test-support';

describe('NoteForm', () => {
  it('writes a remark', async () => {
    const { user, last } = renderCheckpointForm(newCheckpoint('note', 2_000));
    expect(screen.queryByText(/local regulations/)).toBeNull();
    await user.type(screen.getByLabelText('Text'), 'Watch the needle.');
    expect(last()).toMatchObject({ kind: 'note', tone: 'remark', body: 'Watch the needle.' });
  });

  it('turns into a safety caution that defers to the school rules', async () => {
    const { user, last } = renderCheckpointForm(newCheckpoint('note', 2_000));
    await user.click(screen.getByLabelText(/Safety caution/));
    expect(last()?.tone).toBe('safety');
    expect(screen.getByText(/school’s own safety rules and local regulations/)).toBeInTheDocument();
  });

  it('changes how the video meets it, and shows a too-long label', async () => {
    const { user, last } = renderCheckpointForm(newCheckpoint('note', 2_000));
    await user.click(screen.getByLabelText(/Gate \(must answer\)/));
    expect(last()?.behaviour).toBe('gate');
    const label = screen.getByLabelText('Label');
    await user.click(label);
    await user.paste('n'.repeat(81));
    expect(label).toHaveAccessibleDescription(expect.stringContaining('A label has at most 80 characters.'));
  });
});
