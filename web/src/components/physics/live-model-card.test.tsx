import { fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { LiveModel } from '@core/contracts';
import { LiveModelCard } from './live-model-card';

const wire: LiveModel = {
  modelId: 'straight-wire',
  inputs: [
    { name: 'I', slider: false, min: 0, max: 0, step: 1, value: 2 },
    { name: 'd', slider: true, min: 0.5, max: 10, step: 0.5, value: 1 },
  ],
  plot: null,
};

// KaTeX and the first render are slow in jsdom on a busy two-core machine.
describe('LiveModelCard', { timeout: 20_000 }, () => {
  // OpenStax University Physics Vol. 2, §12.2 Example "Calculating Magnetic Field Due to Three Wires":
  // 2 A at 1 cm gives 4e-5 T; twice the distance halves it (B = mu0 I / (2 pi d)).
  it('shows the output with its unit and updates it when a slider moves', () => {
    render(<LiveModelCard model={wire} />);
    expect(screen.getByRole('status')).toHaveTextContent('40 µT');
    const slider = screen.getByLabelText(/Distance from the wire/);
    expect(slider).toHaveAttribute('min', '0.5');
    expect(slider).toHaveAttribute('max', '10');
    expect(slider).toHaveAttribute('aria-valuetext', '1 cm');
    fireEvent.change(slider, { target: { value: '2' } });
    expect(screen.getByRole('status')).toHaveTextContent('20 µT');
    expect(slider).toHaveAttribute('aria-valuetext', '2 cm');
  });

  it('lists the fixed inputs with their values and units, and no slider for them', () => {
    render(<LiveModelCard model={wire} />);
    expect(screen.queryByLabelText(/^Current/)).toBeNull();
    expect(screen.getByText('Fixed').nextElementSibling).toHaveTextContent('= 2 A');
  });

  it('shows the engine’s message instead of a value it refuses', () => {
    const dipole: LiveModel = {
      modelId: 'dipole-on-axis',
      inputs: [{ name: 'z', slider: false, min: 0, max: 0, step: 1, value: 0 }],
      plot: null,
    };
    render(<LiveModelCard model={dipole} />);
    expect(screen.getByRole('status')).toHaveTextContent(/at the dipole itself/);
  });
});
