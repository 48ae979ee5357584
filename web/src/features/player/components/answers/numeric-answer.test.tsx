import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { CheckpointAnswer, StudentCheckpoint } from '@core/contracts';
import { formatFigures, loadQuantityReader, NumericAnswer, readNumericAnswer, type QuantityReader } from './numeric-answer';

// Hand-computed cases. Unit factors: 1 G = 1e-4 T (BIPM SI Brochure, 8th ed., Table 9), 1 µT = 1e-6 T, 1 cm = 1e-2 m.

type NumericCheckpoint = Extract<StudentCheckpoint, { kind: 'numeric' }>;

const fieldQuestion: NumericCheckpoint = {
  key: 'fieldq01',
  atMs: 12_000,
  label: 'Field at the centre',
  behaviour: 'pause',
  required: true,
  points: 1,
  attempts: 3,
  hintCount: 0,
  kind: 'numeric',
  prompt: 'What is the field at the centre of the coil (test)?',
  askedUnit: 'µT',
  dimension: 'magnetic-field',
  values: {},
};

let reader: QuantityReader;
beforeAll(async () => {
  reader = await loadQuantityReader();
});

const read = (text: string, over: Partial<NumericCheckpoint> = {}, locale: string | undefined = 'en-GB') =>
  readNumericAnswer(reader, text, { ...fieldQuestion, ...over }, locale);

describe('formatFigures', () => {
  it('keeps the figures typed and writes powers of ten outside 0.001 … 999 999', () => {
    expect(formatFigures(6.3e-5, 2, 'en-GB')).toBe('6.3 × 10⁻⁵');
    expect(formatFigures(63, 2, 'en-GB')).toBe('63');
    expect(formatFigures(6300, 4, 'en-GB')).toBe('6300');
    expect(formatFigures(1234567, 3, 'en-GB')).toBe('1.23 × 10⁶');
    expect(formatFigures(0.0005, 1, 'en-GB')).toBe('5 × 10⁻⁴');
    expect(formatFigures(2.5, 3, 'en-GB')).toBe('2.50');
    expect(formatFigures(-0.25, 2, 'en-GB')).toBe('-0.25');
    expect(formatFigures(0.5, 1, 'fr-FR')).toBe('0,5');
  });
});

describe('readNumericAnswer', () => {
  it('shows nothing for an empty field', () => {
    expect(read('')).toEqual({ tone: 'none' });
    expect(read('   ')).toEqual({ tone: 'none' });
  });

  it('reads a value in the asked unit', () => {
    expect(read('63 uT')).toEqual({ tone: 'read', value: '63 µT', converted: null, what: 'a magnetic field' });
  });

  it('converts another unit of the same dimension into the asked unit', () => {
    // 0.63 G = 0.63e-4 T = 63e-6 T = 63 µT.
    expect(read('0.63 G')).toEqual({ tone: 'read', value: '0.63 G', converted: '63 µT', what: 'a magnetic field' });
    // 6.3e-5 T = 63e-6 T.
    expect(read('6.3e-5 T')).toEqual({ tone: 'read', value: '6.3 × 10⁻⁵ T', converted: '63 µT', what: 'a magnetic field' });
  });

  it('names a wrong dimension with the server’s own sentence', () => {
    expect(read('63 m')).toEqual({ tone: 'check', message: '63 m is a length; this question asks for a magnetic field, in tesla.' });
  });

  it('asks for a missing unit', () => {
    expect(read('63')).toEqual({ tone: 'check', message: 'Add a unit: this question asks for a magnetic field, in tesla (T).' });
  });

  it('explains an unknown unit and a tonne typed for a tesla', () => {
    const unknown = read('63 qq');
    expect(unknown.tone).toBe('check');
    expect(unknown.tone === 'check' && unknown.message).toContain('"qq" is not a unit we know');
    expect(unknown.tone === 'check' && unknown.message).toContain('This question asks for a magnetic field, in tesla (T).');
    const tonnes = read('63 mt');
    expect(tonnes.tone === 'check' && tonnes.message).toContain('did you mean mT (millitesla)?');
  });

  it('reads with the school’s decimal sign', () => {
    // fr-FR writes a decimal comma: 0,5 m = 50 cm.
    expect(read('0,5 m', { askedUnit: 'cm', dimension: 'length' }, 'fr-FR')).toEqual({
      tone: 'read',
      value: '0,5 m',
      converted: '50 cm',
      what: 'a length',
    });
  });

  it('reads a plain number where no unit is asked', () => {
    expect(read('42', { askedUnit: '', dimension: 'dimensionless' })).toEqual({
      tone: 'read',
      value: '42',
      converted: null,
      what: 'a plain number',
    });
    expect(read('42 m', { askedUnit: '', dimension: 'dimensionless' })).toEqual({
      tone: 'check',
      message: '42 m is a length; this question asks for a plain number, with no unit.',
    });
  });

  it('reads without a dimension check when the question names none', () => {
    expect(read('3 m', { askedUnit: '', dimension: '' })).toEqual({ tone: 'read', value: '3 m', converted: null, what: 'a length' });
  });
});

function Harness({ onSubmit, problemFor }: { onSubmit: (answer: CheckpointAnswer) => void; problemFor?: string }) {
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <NumericAnswer
      checkpoint={fieldQuestion}
      locked={false}
      busy={false}
      problem={problem}
      locale="en-GB"
      onSubmit={(answer) => {
        onSubmit(answer);
        if (problemFor && answer.kind === 'numeric' && answer.text === problemFor) setProblem('The server could not read that.');
      }}
    />
  );
}

describe('NumericAnswer', { timeout: 20_000 }, () => {
  it('shows the reading as the student types, tied to the field', async () => {
    const user = userEvent.setup();
    render(<Harness onSubmit={vi.fn()} />);
    const field = screen.getByLabelText('Your answer, in µT');
    await user.type(field, '0.63 G');
    const reading = await screen.findByText(/Read as/);
    expect(reading.closest('[data-reading]')).toHaveTextContent('Read as 0.63 G = 63 µT, a magnetic field.');
    expect(field.getAttribute('aria-describedby')).toContain(reading.closest('[data-reading]')?.id);
  });

  it('warns about a wrong dimension before sending, and still sends', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn();
    render(<Harness onSubmit={onSubmit} />);
    await user.type(screen.getByLabelText('Your answer, in µT'), '63 m');
    const warning = (await screen.findByText(/63 m is a length/)).closest('[data-reading]') as HTMLElement;
    expect(warning).toHaveTextContent('Check before sending: 63 m is a length; this question asks for a magnetic field, in tesla.');
    expect(within(warning).getByText(/You can still send it/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(onSubmit).toHaveBeenCalledWith({ kind: 'numeric', text: '63 m' });
  });

  it('gives way to the server’s message for the text sent, and reads again after an edit', async () => {
    const user = userEvent.setup();
    render(<Harness onSubmit={vi.fn()} problemFor="63 qq" />);
    const field = screen.getByLabelText('Your answer, in µT');
    await user.type(field, '63 qq');
    expect(await screen.findByText(/is not a unit we know/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Check my answer' }));
    expect(await screen.findByText('The server could not read that.')).toBeInTheDocument();
    expect(screen.queryByText(/is not a unit we know/)).not.toBeInTheDocument();
    await user.clear(field);
    await user.type(field, '63 uT');
    expect((await screen.findByText(/Read as/)).closest('[data-reading]')).toHaveTextContent('Read as 63 µT, a magnetic field.');
  });

  it('announces the reading once typing pauses', async () => {
    const user = userEvent.setup();
    const { container } = render(<Harness onSubmit={vi.fn()} />);
    await user.type(screen.getByLabelText('Your answer, in µT'), '63 uT');
    const live = container.querySelector('[aria-live="polite"]') as HTMLElement;
    await vi.waitFor(() => expect(live).toHaveTextContent('Read as 63 µT, a magnetic field.'));
  });
});
