import { useId, useState, type ReactNode } from 'react';
import { MarkdownField } from '@/components/rich-text/markdown-field';
import { Field, FieldError } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { cn } from '@/lib/cn';
import { useFormEnv } from './form-env';
import { parseNumber, showNumber } from './parse-number';
import { joinMessages, useBoundField } from './use-bound-field';

type Common = { path: string; label: ReactNode; hint?: ReactNode; className?: string };

/** A one-line text bound to the checkpoint. */
export function TextField({
  path,
  label,
  hint,
  className,
  mono = false,
  nullable = false,
}: Common & { mono?: boolean; /** Empty text stands for null. */ nullable?: boolean }) {
  const field = useBoundField<string | null>(path);
  return (
    <Field label={label} hint={hint} error={field.error} className={className}>
      {(control) => (
        <Input
          {...control}
          value={field.value ?? ''}
          onChange={(event) => field.set(nullable && event.target.value.trim() === '' ? null : event.target.value)}
          invalid={control.invalid}
          mono={mono}
          autoComplete="off"
          spellCheck={!mono}
        />
      )}
    </Field>
  );
}

/**
 * A number bound to the checkpoint. The typed text is kept as typed; only a text that reads as a
 * number reaches the checkpoint, so the studio never holds a half-typed "1e" or an empty field.
 */
export function NumberField({ path, label, hint, className, nullable = false, suffix }: Common & { nullable?: boolean; suffix?: string }) {
  const field = useBoundField<number | null>(path);
  const [text, setText] = useState(() => showNumber(field.value));
  const [parseError, setParseError] = useState<string | null>(null);
  const [seen, setSeen] = useState(field.value);
  // Undo or a new checkpoint from outside: show the new number unless the text already means it.
  if (!Object.is(field.value, seen)) {
    setSeen(field.value);
    const current = parseNumber(text, { nullable });
    if (!current.ok || !Object.is(current.value, field.value)) {
      setText(showNumber(field.value));
      setParseError(null);
    }
  }

  function change(raw: string) {
    setText(raw);
    const parsed = parseNumber(raw, { nullable });
    if (!parsed.ok) {
      setParseError(parsed.message);
      return;
    }
    setParseError(null);
    setSeen(parsed.value);
    field.set(parsed.value);
  }

  return (
    <Field
      label={label}
      hint={hint}
      error={joinMessages(parseError, parseError ? undefined : field.zodError, field.problem)}
      className={className}
    >
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
          {suffix ? <span className="text-ink-muted">{suffix}</span> : null}
        </div>
      )}
    </Field>
  );
}

/** A checkbox with a sentence saying what it does. */
export function ToggleField({ path, label, hint, className, disabled = false }: Common & { disabled?: boolean }) {
  const field = useBoundField<boolean>(path);
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, field.error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <div className="flex items-start gap-2">
        <input
          id={id}
          type="checkbox"
          checked={Boolean(field.value)}
          disabled={disabled}
          onChange={(event) => field.set(event.target.checked)}
          aria-describedby={describedBy}
          aria-invalid={field.error ? true : undefined}
          className="mt-1 size-5 shrink-0 accent-teal"
        />
        <div>
          <label htmlFor={id} className="font-bold">
            {label}
          </label>
          {hint ? (
            <p id={`${id}-hint`} className="text-sm text-ink-muted">
              {hint}
            </p>
          ) : null}
        </div>
      </div>
      <FieldError id={`${id}-error`} message={field.error} />
    </div>
  );
}

export type Choice<V extends string> = { value: V; label: string; hint?: ReactNode };

/** Radio buttons in a fieldset, each choice with an optional sentence. */
export function ChoiceField<V extends string>({
  path,
  label,
  hint,
  className,
  choices,
  onPick,
}: Common & { choices: readonly Choice<V>[]; onPick?: (value: V) => void }) {
  const field = useBoundField<V>(path);
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <fieldset className={cn('flex flex-col gap-2', className)} aria-describedby={field.error ? errorId : undefined}>
      <legend className="mb-1 font-bold">{label}</legend>
      {hint ? <p className="-mt-1 text-sm text-ink-muted">{hint}</p> : null}
      {choices.map((choice) => (
        <label key={choice.value} className="flex items-start gap-2">
          <input
            type="radio"
            name={id}
            value={choice.value}
            checked={field.value === choice.value}
            onChange={() => (onPick ? onPick(choice.value) : field.set(choice.value))}
            className="mt-1 size-5 shrink-0 accent-teal"
          />
          <span>
            <span className="font-bold">{choice.label}</span>
            {choice.hint ? <span className="block text-sm text-ink-muted">{choice.hint}</span> : null}
          </span>
        </label>
      ))}
      <FieldError id={errorId} message={field.error} />
    </fieldset>
  );
}

/** Markdown bound to the checkpoint, with preview and image upload into this lesson. */
export function MarkdownPathField({
  path,
  label,
  hint,
  className,
  small = false,
  maxLength,
}: Common & { small?: boolean; maxLength?: number }) {
  const field = useBoundField<string>(path);
  const { lessonId } = useFormEnv();
  return (
    <MarkdownField
      label={label}
      hint={hint}
      value={field.value ?? ''}
      onChange={field.set}
      error={field.error}
      lessonId={lessonId || undefined}
      small={small}
      maxLength={maxLength}
      className={className}
    />
  );
}
