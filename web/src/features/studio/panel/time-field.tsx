import { useState, type ReactNode } from 'react';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { formatTime, parseTime } from '../time/format-time';

type TimeFieldProps = {
  label: ReactNode;
  valueMs: number;
  /** Applies a typed time; returns why it is refused (the field keeps the text and shows it), or null. */
  onCommit: (ms: number) => string | null;
  /** A problem from the last save for this time. */
  problem?: string;
  hint?: ReactNode;
};

/** A time typed as m:ss.mmm, applied on Enter or when leaving the field; a bad time says what is wrong. */
export function TimeField({ label, valueMs, onCommit, problem, hint = 'minutes:seconds.milliseconds' }: TimeFieldProps) {
  // While editing, the typed text; otherwise the value as saved (so undo and drags show at once).
  const [text, setText] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  function commit() {
    if (text === null) return;
    const parsed = parseTime(text);
    if (!parsed.ok) {
      setError(parsed.message);
      return;
    }
    const refusal = parsed.ms === valueMs ? null : onCommit(parsed.ms);
    if (refusal) {
      setError(refusal);
      return;
    }
    setError(null);
    setText(null);
  }

  return (
    <Field label={label} hint={hint} error={error ?? problem}>
      {(control) => (
        <Input
          {...control}
          mono
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          className="w-40"
          value={text ?? formatTime(valueMs)}
          onChange={(event) => setText(event.target.value)}
          onBlur={commit}
          onKeyDown={(event) => {
            if (event.key === 'Enter') {
              event.preventDefault();
              commit();
            } else if (event.key === 'Escape' && text !== null) {
              event.preventDefault();
              event.stopPropagation();
              setText(null);
              setError(null);
            }
          }}
        />
      )}
    </Field>
  );
}
