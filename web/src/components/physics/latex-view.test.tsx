import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { LatexField } from './latex-field';
import { LatexView } from './latex-view';

describe('LatexView', { timeout: 20_000 }, () => {
  it('renders a formula with KaTeX and no error', () => {
    const { container } = render(<LatexView latex="B = \frac{\mu_0 N I}{2a}" />);
    expect(container.querySelector('.katex-display')).not.toBeNull();
    expect(container.querySelector('.mfrac')).not.toBeNull();
    expect(screen.queryByText(/The formula has an error/)).toBeNull();
  });

  it('shows a parse error as readable text next to the formula', () => {
    render(<LatexView latex="\frac{" />);
    expect(screen.getByRole('note')).toHaveTextContent(
      "The formula has an error: Unexpected end of input in a macro argument, expected '}' (at the end of the formula)",
    );
  });

  // Issue 5, Security: \href{javascript:...}, \url and \htmlClass stay inert (KaTeX with trust off).
  it('renders no javascript: link, no url link and no teacher class for dangerous commands', () => {
    const { container } = render(
      <>
        <LatexView latex="\href{javascript:alert(1)}{x}" />
        <LatexView latex="\url{javascript:alert(2)}" />
        <LatexView latex="\htmlClass{evil}{y} \htmlStyle{color:red}{z}" />
      </>,
    );
    expect(container.querySelectorAll('a')).toHaveLength(0);
    expect(container.innerHTML).not.toMatch(/href=/i);
    expect(container.querySelector('.evil')).toBeNull();
    // The untrusted commands show as text; nothing carries the teacher's style.
    expect(container.querySelectorAll('[style*="color:red"]')).toHaveLength(0);
  });

  it('renders inline when display is off', () => {
    const { container } = render(<LatexView latex="x^2" display={false} />);
    expect(container.querySelector('.katex-display')).toBeNull();
    expect(container.querySelector('.katex')).not.toBeNull();
  });
});

describe('LatexField', { timeout: 20_000 }, () => {
  function Harness() {
    const [value, setValue] = useState('');
    return <LatexField label="Formula (LaTeX)" value={value} onChange={setValue} />;
  }

  it('previews as the teacher types and shows the parse error with its position inline', async () => {
    const user = userEvent.setup();
    const { container } = render(<Harness />);
    const box = screen.getByLabelText('Formula (LaTeX)');
    expect(screen.getByText('Type a formula to see it here.')).toBeInTheDocument();
    // userEvent reads { as a key descriptor: {{ types one brace.
    await user.type(box, '\\sqrt{{2');
    expect(box).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText(/^The formula has an error: Expected '}', got 'EOF' \(at the end of the formula\)$/)).toBeInTheDocument();
    // A mistake in the middle is placed by its character.
    await user.clear(box);
    await user.type(box, 'a \\foo b');
    expect(screen.getByText(/^The formula has an error: Undefined control sequence: \\foo \(at character 3\)$/)).toBeInTheDocument();
    await user.clear(box);
    await user.type(box, '\\sqrt{{2}');
    expect(box).not.toHaveAttribute('aria-invalid');
    expect(screen.queryByText(/The formula has an error/)).toBeNull();
    expect(container.querySelector('.sqrt')).not.toBeNull();
  });
});
