import { useState } from 'react';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { useFormEnv } from '../common/form-env';
import { joinMessages, useBoundField } from '../common/use-bound-field';
import { formatClock, parseClock, revealProblem } from './time-text';

/** The reveal time as m:ss.mmm, checked live against the pin and the recording's end. */
export function RevealTimeField() {
  const reveal = useBoundField<number>('revealAtMs');
  const at = useBoundField<number>('atMs');
  const { durationMs } = useFormEnv();
  const [text, setText] = useState(() => formatClock(reveal.value));
  const [parseError, setParseError] = useState<string | null>(null);
  const [seen, setSeen] = useState(reveal.value);
  if (reveal.value !== seen) {
    setSeen(reveal.value);
    const current = parseClock(text);
    if (!current.ok || current.ms !== reveal.value) {
      setText(formatClock(reveal.value));
      setParseError(null);
    }
  }

  function change(raw: string) {
    setText(raw);
    const parsed = parseClock(raw);
    if (!parsed.ok) {
      setParseError(parsed.message);
      return;
    }
    setParseError(null);
    setSeen(parsed.ms);
    reveal.set(parsed.ms);
  }

  const placement = parseError ? null : revealProblem(reveal.value, at.value, durationMs);
  return (
    <Field
      label="Reveal time"
      hint={`Later in the recording (minutes:seconds.milliseconds): the video pauses again and shows the student's prediction beside what happened. The prediction is pinned at ${formatClock(at.value)}.`}
      error={joinMessages(parseError, placement, parseError ? undefined : reveal.zodError, reveal.problem)}
    >
      {(control) => (
        <Input
          {...control}
          value={text}
          onChange={(event) => change(event.target.value)}
          invalid={control.invalid}
          mono
          inputMode="decimal"
          autoComplete="off"
          className="max-w-48"
        />
      )}
    </Field>
  );
}
