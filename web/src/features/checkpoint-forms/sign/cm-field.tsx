import { useState, type ReactNode } from 'react';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { parseNumber } from '../common/parse-number';
import { joinMessages, useBoundField } from '../common/use-bound-field';

type CmFieldProps = { path: string; label: ReactNode; hint?: string };

/** Metres rounded for display in cm without float noise (0.07 m reads 7, not 7.000000000000001). */
const toCm = (metres: number | undefined) =>
  typeof metres === 'number' && Number.isFinite(metres) ? String(Number((metres * 100).toPrecision(12))) : '';

/** A length stored in metres, typed in centimetres; a text that is not a number stays unsaved with its message. */
export function CmField({ path, label, hint }: CmFieldProps) {
  const field = useBoundField<number>(path);
  const [text, setText] = useState(() => toCm(field.value));
  const [parseError, setParseError] = useState<string | null>(null);
  const [seen, setSeen] = useState(field.value);
  // A new value from outside (undo, another checkpoint): show it unless the text already means it.
  if (!Object.is(field.value, seen)) {
    setSeen(field.value);
    const current = parseNumber(text);
    if (!current.ok || current.value === null || !Object.is(current.value / 100, field.value)) {
      setText(toCm(field.value));
      setParseError(null);
    }
  }

  function change(raw: string) {
    setText(raw);
    const parsed = parseNumber(raw);
    if (!parsed.ok || parsed.value === null) {
      setParseError(parsed.ok ? 'Enter a number.' : parsed.message);
      return;
    }
    setParseError(null);
    const metres = parsed.value / 100;
    setSeen(metres);
    field.set(metres);
  }

  return (
    <Field label={label} hint={hint} error={joinMessages(parseError, parseError ? undefined : field.zodError, field.problem)}>
      {(control) => (
        <div className="flex items-center gap-2">
          <Input
            {...control}
            value={text}
            onChange={(event) => change(event.target.value)}
            invalid={control.invalid}
            inputMode="decimal"
            autoComplete="off"
          />
          <span className="text-ink-muted">cm</span>
        </div>
      )}
    </Field>
  );
}
