import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CheckpointOf } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { renderCheckpointForm } from '../checkpoint-form.test-support';

type Numeric = CheckpointOf<'numeric'>;

/** Field at the centre of a flat circular coil, B = μ0·N·I / (2a). */
function coilQuestion(overrides: Partial<Numeric> = {}): Numeric {
  return {
    ...newCheckpoint('numeric', 30_000),
    key: 'coilcentre01',
    prompt: 'A coil of radius {{a}} has {{N}} turns and carries {{I}}. Find B at its centre.',
    expected: 'mu0*N*I/(2*a)',
    askedUnit: 'mT',
    variables: [
      { name: 'a', min: 5, max: 5, step: 1, unit: 'cm', role: 'radius' },
      { name: 'N', min: 20, max: 20, step: 1, unit: '', role: 'turns' },
      { name: 'I', min: 2, max: 2, step: 1, unit: 'A', role: 'none' },
    ],
    ...overrides,
  };
}

const preview = () => screen.getByRole('region', { name: 'Expected answer for sample values' });

describe('NumericForm', () => {
  it('shows the expected answer for sample values', () => {
    renderCheckpointForm(coilQuestion());
    // B = μ0 N I / (2a) = 4π×10⁻⁷ × 20 × 2 A / (2 × 0.05 m) = 5.027×10⁻⁴ T (field at the centre of a circular
    // loop: Halliday, Resnick & Walker, Fundamentals of Physics, ch. 29, "Magnetic field due to a current").
    expect(preview()).toHaveTextContent('For sample values a = 5 cm, N = 20, I = 2 A: expected 0.5027 mT');
  });

  it('warns when the formula does not have the dimension of the asked unit, and when it does not evaluate', async () => {
    const { user } = renderCheckpointForm(coilQuestion());
    const asked = screen.getByLabelText('Asked unit');
    await user.clear(asked);
    await user.type(asked, 'A');
    expect(preview()).toHaveTextContent('The formula gives a magnetic field; the question asks for an electric current (A).');
    const expected = screen.getByLabelText('Expected answer');
    await user.clear(expected);
    await user.click(expected);
    await user.paste('mu0*N*I/(2*');
    expect(preview()).toHaveTextContent('cannot be used');
    expect(preview()).not.toHaveTextContent('expected 0.');
  });

  it('draws another sample on request', async () => {
    const { user } = renderCheckpointForm(
      coilQuestion({
        variables: [
          { name: 'a', min: 2, max: 9, step: 0.5, unit: 'cm', role: 'radius' },
          { name: 'N', min: 20, max: 20, step: 1, unit: '', role: 'turns' },
          { name: 'I', min: 2, max: 2, step: 1, unit: 'A', role: 'none' },
        ],
        askedUnit: 'uT',
      }),
    );
    const first = preview().textContent;
    expect(first).toMatch(/For sample values a = [\d.]+ cm, N = 20, I = 2 A: expected [\d.]+ µT/);
    await user.click(within(preview()).getByText('New sample'));
    expect(preview().textContent).toMatch(/For sample values a = [\d.]+ cm, N = 20, I = 2 A: expected [\d.]+ µT/);
    expect(preview().textContent).not.toBe(first);
  });

  it('flags a placeholder that names no variable as the teacher types', async () => {
    const { user, last } = renderCheckpointForm(coilQuestion());
    const prompt = screen.getByLabelText('Question');
    await user.click(prompt);
    await user.paste(' Use {{b}}.');
    expect(prompt).toHaveAccessibleDescription(expect.stringContaining('{{b}} is not a declared variable (declared: a, N, I).'));
    expect(last()?.prompt).toContain('{{b}}');
  });

  it('edits variables, tolerance, significant figures and mistakes', async () => {
    const { user, last } = renderCheckpointForm(coilQuestion({ variables: [] }));
    await user.click(screen.getByText('Add a variable'));
    expect(last()?.variables).toEqual([{ name: 'x', min: 1, max: 10, step: 1, unit: '', role: 'none' }]);
    const name = screen.getByLabelText('Variable 1 name');
    await user.clear(name);
    await user.type(name, 'r');
    await user.type(screen.getByLabelText('Variable 1 unit'), 'cm');
    await user.selectOptions(screen.getByLabelText('Variable 1 role'), 'radius');
    expect(last()?.variables[0]).toMatchObject({ name: 'r', unit: 'cm', role: 'radius' });

    const percent = screen.getByLabelText('Relative tolerance');
    await user.clear(percent);
    expect(last()?.relativeTolerancePercent).toBeNull();
    await user.type(screen.getByLabelText('Absolute tolerance'), '0.5 uT');
    expect(last()?.absoluteTolerance).toBe('0.5 uT');

    await user.click(screen.getByLabelText(/Checked: take points off/));
    expect(last()?.sigFigs).toEqual({ min: 2, max: 4, penalty: 0.5 });
    const most = screen.getByLabelText('Most figures');
    await user.clear(most);
    await user.type(most, '3');
    expect(last()?.sigFigs?.max).toBe(3);

    await user.click(screen.getByText('Add a mistake'));
    await user.type(screen.getByLabelText('Mistake 1 formula'), 'mu0*N*I/a');
    expect(last()?.distractors[0]?.formula).toBe('mu0*N*I/a');
  });

  it("shows a variable name the contract refuses, and the server's problem on its field", async () => {
    const { user } = renderCheckpointForm(coilQuestion(), {
      problems: [{ path: 'variables.2.max', message: 'The largest value (2) is smaller than the smallest (3).' }],
    });
    expect(screen.getByLabelText('Variable 3 largest value')).toHaveAccessibleDescription(
      expect.stringContaining('The largest value (2) is smaller than the smallest (3).'),
    );
    const name = screen.getByLabelText('Variable 1 name');
    await user.clear(name);
    await user.type(name, '2a');
    expect(name).toHaveAccessibleDescription(expect.stringContaining('A variable name starts with a letter'));
  });
});
