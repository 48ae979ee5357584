import { useEffect, useId, useState } from 'react';
import type { StudentCheckpoint } from '@core/contracts';
import type { dimensionPhrase, readAskedUnit } from '@core/lessons/numeric-format';
import type { missingUnitMessage, wrongDimensionMessage } from '@core/physics/grading/feedback';
import type { parseQuantity } from '@core/physics/units/parse-quantity';
import { AlertIcon, InfoIcon } from '@/components/ui/icons';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { ProblemMessage } from './problem-message';
import { SubmitRow } from './submit-row';
import type { AnswerFormProps } from './answer-props';

type NumericCheckpoint = Extract<StudentCheckpoint, { kind: 'numeric' }>;

/** The engine's unit reader and its messages: the same code and words the server grades with. */
export type QuantityReader = {
  parseQuantity: typeof parseQuantity;
  wrongDimensionMessage: typeof wrongDimensionMessage;
  missingUnitMessage: typeof missingUnitMessage;
  dimensionPhrase: typeof dimensionPhrase;
  readAskedUnit: typeof readAskedUnit;
};

let engineLoad: Promise<QuantityReader> | null = null;
let engineReady: QuantityReader | null = null;

/** The unit reader carries mathjs: it loads beside the player instead of inside its chunk. */
export function loadQuantityReader(): Promise<QuantityReader> {
  engineLoad ??= Promise.all([
    import('@core/physics/units/parse-quantity'),
    import('@core/physics/grading/feedback'),
    import('@core/lessons/numeric-format'),
  ]).then(
    ([quantity, feedback, format]) => {
      engineReady = {
        parseQuantity: quantity.parseQuantity,
        wrongDimensionMessage: feedback.wrongDimensionMessage,
        missingUnitMessage: feedback.missingUnitMessage,
        dimensionPhrase: format.dimensionPhrase,
        readAskedUnit: format.readAskedUnit,
      };
      return engineReady;
    },
    (error: unknown) => {
      // A chunk that failed to load (offline) is tried again by the next numeric question.
      engineLoad = null;
      throw error;
    },
  );
  return engineLoad;
}

// Fetched as soon as the player is, so a student who goes offline mid-lesson still has it.
loadQuantityReader().catch(() => undefined);

/** What the input shows under the field while the student types: how the engine reads it, or what to check. */
export type NumericReading =
  { tone: 'none' } | { tone: 'read'; value: string; converted: string | null; what: string } | { tone: 'check'; message: string };

const SUPERSCRIPTS: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** A number to the figures the student typed, with the school's decimal sign; × 10ⁿ outside 0.001 … 999 999. */
export function formatFigures(value: number, figures: number, locale: string | undefined): string {
  const digits = Math.min(21, Math.max(1, figures));
  const number = (x: number) => {
    try {
      return new Intl.NumberFormat(locale, {
        minimumSignificantDigits: digits,
        maximumSignificantDigits: digits,
        useGrouping: false,
      }).format(x);
    } catch {
      return x.toPrecision(digits);
    }
  };
  const size = Math.abs(value);
  if (value === 0 || (size >= 1e-3 && size < 1e6)) return number(value);
  const [mantissa = '0', exponent = '0'] = value.toExponential(digits - 1).split('e');
  const power = String(Number(exponent)).replace(/[-0-9]/g, (c) => SUPERSCRIPTS[c] ?? c);
  return `${number(Number(mantissa))} × 10${power}`;
}

const pure = (dimension: string) => dimension === 'dimensionless' || dimension === 'count';

/**
 * Reads the typed answer as the server will: the value and unit, the value in the asked unit when the
 * student used another, and the dimension; or the engine's own message for an unknown unit, a missing
 * unit or a wrong dimension. Only a warning: the answer can still be sent and the server decides.
 */
export function readNumericAnswer(
  engine: QuantityReader,
  text: string,
  checkpoint: Pick<NumericCheckpoint, 'askedUnit' | 'dimension'>,
  locale: string | undefined,
): NumericReading {
  if (text.trim() === '') return { tone: 'none' };
  const expected = checkpoint.dimension.trim() === '' ? undefined : checkpoint.dimension;
  const parsed = engine.parseQuantity(text, locale === undefined ? { expected } : { locale, expected });
  if (!parsed.ok) return { tone: 'check', message: parsed.error.message };
  if (expected !== undefined) {
    if (parsed.unit === '' && pure(parsed.dimension) && !pure(expected))
      return { tone: 'check', message: engine.missingUnitMessage(expected) };
    if (parsed.dimension !== expected && !(pure(parsed.dimension) && pure(expected))) {
      return { tone: 'check', message: engine.wrongDimensionMessage(text, parsed.dimension, expected) };
    }
  }
  const figures = parsed.sigFigs.max;
  const withUnit = (number: string, unit: string) => (unit === '' ? number : `${number} ${unit}`);
  const asked = engine.readAskedUnit(checkpoint.askedUnit);
  const converted =
    asked.ok && asked.display !== '' && asked.display !== parsed.unit && asked.dimension === parsed.dimension
      ? withUnit(formatFigures(parsed.value / asked.factor, figures, locale), asked.display)
      : null;
  return {
    tone: 'read',
    value: withUnit(formatFigures(parsed.magnitude, figures, locale), parsed.unit),
    converted,
    what: engine.dimensionPhrase(parsed.dimension, false),
  };
}

function readingSentence(reading: NumericReading): string {
  if (reading.tone === 'none') return '';
  if (reading.tone === 'check') return `Check before sending: ${reading.message}`;
  return `Read as ${reading.value}${reading.converted ? ` = ${reading.converted}` : ''}, ${reading.what}.`;
}

function useQuantityReader(): QuantityReader | null {
  const [engine, setEngine] = useState<QuantityReader | null>(() => engineReady);
  useEffect(() => {
    if (engine) return;
    let live = true;
    loadQuantityReader().then(
      (loaded) => {
        if (live) setEngine(loaded);
      },
      // Without the reader the field still works; the server reads the answer as always.
      () => undefined,
    );
    return () => {
      live = false;
    };
  }, [engine]);
  return engine;
}

function ReadingLine({ id, reading }: { id: string; reading: NumericReading }) {
  if (reading.tone === 'none') return null;
  if (reading.tone === 'check') {
    return (
      <div id={id} className="flex items-start gap-2 rounded-md border-l-4 border-copper bg-copper-soft px-3 py-2" data-reading="check">
        <AlertIcon className="mt-1 size-5 shrink-0 text-copper-strong" />
        <p className="min-w-0">
          <span className="font-bold">Check before sending: </span>
          {reading.message} You can still send it.
        </p>
      </div>
    );
  }
  return (
    <p id={id} className="flex items-start gap-2 text-ink" data-reading="read">
      <InfoIcon className="mt-1 size-5 shrink-0 text-teal" />
      <span className="min-w-0">
        Read as <span className="font-mono font-bold">{reading.value}</span>
        {reading.converted ? (
          <>
            {' = '}
            <span className="font-mono font-bold">{reading.converted}</span>
          </>
        ) : null}
        , {reading.what}.
      </span>
    </p>
  );
}

export type NumericAnswerProps = AnswerFormProps<'numeric'> & {
  /** The school's locale (BCP 47), as the server reads answers with it: a comma locale reads 0,5 as a half. */
  locale?: string;
};

/**
 * A number with its unit, typed freely. As the student types, the engine's reader shows the value and
 * unit it reads (or what to check: an unknown unit, a missing unit, a wrong dimension); the answer is
 * sendable either way and the server decides (an unreadable answer comes back as a problem, no attempt used).
 */
export function NumericAnswer({ checkpoint, locked, busy, problem, onSubmit, locale }: NumericAnswerProps) {
  const [text, setText] = useState('');
  const [sentText, setSentText] = useState<string | null>(null);
  const problemId = useId();
  const readingId = useId();
  const engine = useQuantityReader();
  const unit = checkpoint.askedUnit.trim();
  // The server's own message for the text just sent replaces the live reading until the student edits it.
  const serverSaid = Boolean(problem) && text === sentText;
  const reading: NumericReading = engine && !serverSaid ? readNumericAnswer(engine, text, checkpoint, locale) : { tone: 'none' };
  const announced = useDebouncedValue(readingSentence(reading), 600);
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        setSentText(text);
        onSubmit({ kind: 'numeric', text });
      }}
    >
      <Field
        label={unit ? `Your answer, in ${unit}` : 'Your answer'}
        hint={unit ? `Type the number and its unit, for example 2.5 ${unit}.` : 'Type the number.'}
      >
        {({ id, ...control }) => (
          <div className="flex items-center gap-2">
            <Input
              id={id}
              aria-describedby={
                [control['aria-describedby'], problem ? problemId : null, reading.tone !== 'none' ? readingId : null]
                  .filter(Boolean)
                  .join(' ') || undefined
              }
              invalid={Boolean(problem)}
              mono
              autoComplete="off"
              spellCheck={false}
              inputMode="text"
              value={text}
              disabled={locked || busy}
              onChange={(event) => setText(event.target.value)}
              className="min-w-0 flex-1"
            />
            {unit ? (
              <span className="shrink-0 font-mono text-ink-muted" aria-hidden="true">
                {unit}
              </span>
            ) : null}
          </div>
        )}
      </Field>
      <ReadingLine id={readingId} reading={reading} />
      {/* Announced once typing pauses, not on every key. */}
      <p className="sr-only" aria-live="polite" aria-atomic="true">
        {locked ? '' : announced}
      </p>
      <ProblemMessage id={problemId} problem={problem} />
      <SubmitRow label="Check my answer" busy={busy} locked={locked} />
    </form>
  );
}
