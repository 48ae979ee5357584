import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CheckpointOf } from '@core/contracts';
import { LIVE_MODELS } from '@core/lessons/models';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from '../checkpoint-form.test-support';

function wireCard(): CheckpointOf<'equation'> {
  return {
    ...newCheckpoint('equation', 8_000),
    latex: 'B = \\frac{\\mu_0 I}{2\\pi d}',
    model: {
      modelId: 'straight-wire',
      inputs: [
        { name: 'I', slider: false, min: 0, max: 20, step: 0.05, value: 2 },
        { name: 'd', slider: true, min: 0.5, max: 20, step: 0.5, value: 1 },
      ],
      plot: null,
    },
  };
}

// A whole form with its Markdown fields renders slowly in jsdom on a busy two-core machine.
describe('EquationForm', { timeout: 20_000 }, () => {
  it('turns a live model on with the model’s formula and previews the card', async () => {
    const { user, last } = renderCheckpointForm(newCheckpoint('equation', 2_000));
    await user.click(screen.getByLabelText(/Add a live model/));
    expect(last()?.model?.modelId).toBe('coil-on-axis');
    expect(last()?.latex).toBe(LIVE_MODELS['coil-on-axis'].latex);
    const preview = screen.getByLabelText('Card preview');
    // The coil defaults: N = 50, a = 10 cm, I = 1 A at the centre: mu0 N I / (2a) = 314.2 µT.
    expect(within(preview).getByRole('status')).toHaveTextContent('314.2 µT');
    // The plot loads in its own chunk; without a canvas (jsdom) its text summary stands alone.
    expect(
      await within(preview).findByText(
        /^Plot of magnetic field on the axis against distance along the axis from the centre from −30 cm to 30 cm; the output ranges from .* µT to 314.2 µT; the marker is at 0 cm\.$/,
      ),
    ).toBeInTheDocument();
  });

  // OpenStax University Physics Vol. 2, §12.2: 2 A at 1 cm from a long wire is 4e-5 T = 40 µT.
  it('previews the configured card and follows a changed fixed value', async () => {
    const { user, last } = renderCheckpointForm(wireCard());
    const preview = screen.getByLabelText('Card preview');
    expect(within(preview).getByRole('status')).toHaveTextContent('40 µT');
    const current = within(screen.getByRole('listitem', { name: 'Current (I)' })).getByLabelText('Value');
    await user.clear(current);
    await user.type(current, '4');
    expect(last()?.model?.inputs[0]?.value).toBe(4);
    expect(within(screen.getByLabelText('Card preview')).getByRole('status')).toHaveTextContent('80 µT');
  });

  it('shows a model problem next to the field that causes it', async () => {
    const { user } = renderCheckpointForm(wireCard());
    const row = within(screen.getByRole('listitem', { name: 'Distance from the wire (d)' }));
    const largest = row.getByLabelText('Largest');
    await user.clear(largest);
    await user.type(largest, '0.2');
    expect(row.getByText('The largest value (0.2 cm) is below the smallest (0.5 cm).')).toBeInTheDocument();
  });

  it('shows the LaTeX parse error under the formula', async () => {
    const { user } = renderCheckpointForm(newCheckpoint('equation', 2_000));
    await user.type(screen.getByLabelText('Formula (LaTeX)'), '\\frac{{');
    expect(screen.getByText(/^The formula has an error: .*\(at the end of the formula\)$/)).toBeInTheDocument();
  });

  it('places the server’s problems for the model under their fields', () => {
    renderCheckpointForm(wireCard(), { problems: [{ path: 'model.plot', message: 'Checked on the server: plot needed.' }] });
    expect(screen.getByRole('group', { name: 'Plot' })).toHaveTextContent('Checked on the server: plot needed.');
  });
});
