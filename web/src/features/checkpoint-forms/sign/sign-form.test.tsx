import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CheckpointOf } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from '../checkpoint-form.test-support';

function derivedSign(choiceSet: CheckpointOf<'sign'>['choiceSet'] = 'page'): CheckpointOf<'sign'> {
  return {
    ...newCheckpoint('sign', 4_000),
    prompt: 'Which way does the field point at P?',
    choiceSet,
    answer: {
      source: 'geometry',
      geometry: { conductor: { shape: 'wire', through: [0, 0, 0], axis: 'x', current: '+' }, point: [0, -0.01, 0], component: 'z' },
    },
  };
}

// A whole form with its Markdown fields renders slowly in jsdom on a busy two-core machine.
describe('SignForm', { timeout: 20_000 }, () => {
  // OpenStax University Physics Vol. 2, §12.2 (right-hand rule 2): a current to the right in the page
  // has its field into the page below the wire and out of it above.
  it('shows the answer the engine derives from the set-up, live as the point moves', async () => {
    const { user, last } = renderCheckpointForm(derivedSign());
    expect(screen.getByText(/The engine gives:/).parentElement).toHaveTextContent('The engine gives: into the page (share 100 %)');
    expect(screen.getByRole('img', { name: /Straight wire and field point/ })).toBeInTheDocument();
    const pointY = within(screen.getByRole('group', { name: 'Field point P' })).getByLabelText(/y/);
    await user.clear(pointY);
    await user.type(pointY, '1');
    expect(last()?.answer).toMatchObject({ source: 'geometry', geometry: { point: [0, 0.01, 0] } });
    expect(screen.getByText(/The engine gives:/).parentElement).toHaveTextContent('The engine gives: out of the page (share 100 %)');
  });

  it('shows the refusal next to the geometry when the field has no dominant direction', async () => {
    const { user } = renderCheckpointForm(derivedSign('axis'));
    const point = within(screen.getByRole('group', { name: 'Field point P' }));
    // Along the wire's axis the point stays at (0, −1, 0) cm; move it to 45°: (0, −1, 1) cm.
    await user.clear(point.getByLabelText(/z/));
    await user.type(point.getByLabelText(/z/), '1');
    expect(screen.getByRole('alert')).toHaveTextContent(
      'The field there has no clearly dominant direction (largest component 71 % of the field). Move the point or set the answer by hand.',
    );
    expect(screen.queryByText(/The engine gives:/)).toBeNull();
  });

  it('refuses a point on the wire and keeps a text that is not a number out of the checkpoint', async () => {
    const { user, last } = renderCheckpointForm(derivedSign());
    const y = within(screen.getByRole('group', { name: 'Field point P' })).getByLabelText(/y/);
    await user.clear(y);
    await user.type(y, '0');
    expect(screen.getByRole('alert')).toHaveTextContent(/^The field point is on the conductor\./);
    await user.clear(y);
    await user.type(y, 'abc');
    expect(screen.getByText(/“abc” is not a number/)).toBeInTheDocument();
    expect(last()?.answer).toMatchObject({ geometry: { point: [0, 0, 0] } });
  });

  it('sets the answer by hand from the choice set, and resets it when the set changes', async () => {
    const { user, last } = renderCheckpointForm(newCheckpoint('sign', 1_000));
    await user.click(screen.getByLabelText('−z direction'));
    expect(last()?.answer).toEqual({ source: 'set', choice: '-z' });
    await user.click(screen.getByLabelText('Into or out of the page'));
    expect(last()?.choiceSet).toBe('page');
    expect(last()?.answer).toEqual({ source: 'set', choice: 'into' });
    expect(screen.getByLabelText('Out of the page')).toBeInTheDocument();
  });

  it('switches to a derived answer with a starting loop and its diagram', async () => {
    const { user, last } = renderCheckpointForm(newCheckpoint('sign', 1_000));
    await user.click(screen.getByLabelText(/Derive it from a set-up/));
    expect(last()?.answer.source).toBe('geometry');
    // OpenStax Vol. 2 §12.4: on the axis of a loop anticlockwise seen from +z the field is along +z.
    expect(screen.getByText(/The engine gives:/).parentElement).toHaveTextContent('The engine gives: +z direction (share 100 %)');
    await user.click(screen.getByLabelText('Clockwise or anticlockwise'));
    expect(screen.getByRole('alert')).toHaveTextContent('Set the answer by hand for clockwise/anticlockwise.');
  });
});

describe('SignForm problems from the last save', { timeout: 20_000 }, () => {
  it('shows a problem about the derived answer beside the diagram, once', () => {
    const checkpoint = derivedSign();
    renderCheckpointForm(checkpoint, { problems: [{ path: 'answer.geometry', message: 'Checked on the server: look again.' }] });
    expect(screen.getAllByText('Checked on the server: look again.')).toHaveLength(1);
    expect(screen.getByRole('img', { name: /Straight wire/ }).parentElement).toHaveTextContent('Checked on the server: look again.');
  });
});
