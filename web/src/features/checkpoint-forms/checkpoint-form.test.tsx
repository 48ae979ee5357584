import { act, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CHECKPOINT_KIND_LABELS, CHECKPOINT_KINDS } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from './checkpoint-form.test-support';

describe('CheckpointForm', () => {
  it.each(CHECKPOINT_KINDS)('shows the %s form for that kind', (kind) => {
    renderCheckpointForm(newCheckpoint(kind, 1_000));
    expect(screen.getByRole('form', { name: `${CHECKPOINT_KIND_LABELS[kind]} settings` })).toBeInTheDocument();
    expect(screen.getAllByRole('form')).toHaveLength(1);
  });

  it('starts afresh when another checkpoint is chosen', async () => {
    const first = { ...newCheckpoint('note', 1_000), body: 'First note' };
    const second = { ...newCheckpoint('note', 9_000), body: 'Second note' };
    const { user, setFromOutside, last } = renderCheckpointForm(first);
    await user.type(screen.getByLabelText('Text'), '!');
    expect(last()?.key).toBe(first.key);
    act(() => setFromOutside(second));
    expect(screen.getByLabelText('Text')).toHaveValue('Second note');
    await user.type(screen.getByLabelText('Text'), '?');
    expect(last()).toMatchObject({ key: second.key, body: 'Second note?' });
  });
});
