import 'katex/dist/katex.min.css';
import { useMemo } from 'react';
import { cn } from '@/lib/cn';
import { describeLatexProblem, renderLatex } from './render-latex';

type LatexViewProps = {
  latex: string;
  display?: boolean;
  className?: string;
  /** Show a parse error as text beside the formula (a field that shows it itself turns this off). */
  showProblem?: boolean;
};

/**
 * A formula rendered by KaTeX with trust off. The HTML comes only from KaTeX (no teacher HTML
 * passes through), so inserting it is safe; a parse error is shown as text beside the formula.
 */
export function LatexView({ latex, display = true, className, showProblem = true }: LatexViewProps) {
  const { html, problem } = useMemo(() => renderLatex(latex, display), [latex, display]);
  const Tag = display ? 'div' : 'span';
  return (
    <Tag className={cn(display ? 'flex flex-col gap-1' : 'inline', className)}>
      {/* Safe: KaTeX output with trust off, never raw teacher HTML. */}
      <Tag className={display ? 'overflow-x-auto' : undefined} dangerouslySetInnerHTML={{ __html: html }} />
      {problem && showProblem ? (
        <Tag role="note" className="text-sm font-bold text-danger">
          The formula has an error: {describeLatexProblem(problem, latex)}
        </Tag>
      ) : null}
    </Tag>
  );
}
