import { useId, useMemo } from 'react';
import { FieldError } from '@/components/ui/field';
import { Textarea } from '@/components/ui/input';
import { LatexView } from './latex-view';
import { describeLatexProblem, renderLatex } from './render-latex';

type LatexFieldProps = {
  label: string;
  value: string;
  onChange: (next: string) => void;
  /** A problem from the server or the form (e.g. too long), shown under the field. */
  error?: string;
  hint?: string;
  rows?: number;
};

/** A LaTeX textarea with a live KaTeX preview and the parse error (with its position) right under it. */
export function LatexField({ label, value, onChange, error, hint, rows = 3 }: LatexFieldProps) {
  const id = useId();
  const { problem } = useMemo(() => renderLatex(value, true), [value]);
  const parseMessage = problem ? `The formula has an error: ${describeLatexProblem(problem, value)}` : undefined;
  const describedBy = [hint ? `${id}-hint` : null, parseMessage ? `${id}-parse` : null, error ? `${id}-error` : null]
    .filter(Boolean)
    .join(' ');
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      <Textarea
        id={id}
        mono
        rows={rows}
        spellCheck={false}
        value={value}
        invalid={Boolean(problem || error)}
        aria-describedby={describedBy || undefined}
        onChange={(event) => onChange(event.target.value)}
      />
      <FieldError id={`${id}-parse`} message={parseMessage} />
      <FieldError id={`${id}-error`} message={error} />
      <div className="rounded-md border border-line bg-surface p-3" aria-label="Formula preview">
        <p className="text-sm text-ink-muted">Preview</p>
        {value.trim() ? (
          <LatexView latex={value} showProblem={false} />
        ) : (
          <p className="text-sm text-ink-muted">Type a formula to see it here.</p>
        )}
      </div>
    </div>
  );
}
