import { useMemo, useState } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { CheckpointOf } from '@core/contracts';
import { sampleExpected, type NumericCheckpointSpec, type SampleExpected } from '@core/lessons/numeric-spec';
import { Button } from '@/components/ui/button';
import { AlertIcon, CheckIcon } from '@/components/ui/icons';
import { LiveRegion } from '@/components/ui/live-region';

type Numeric = CheckpointOf<'numeric'>;

function compute(specText: string, seed: string): SampleExpected {
  try {
    return sampleExpected(JSON.parse(specText) as NumericCheckpointSpec, seed);
  } catch (error) {
    // The engine reports expected failures as `problem`; anything else still must not take the form down.
    const message = error instanceof Error ? error.message : String(error);
    return { values: {}, expectedText: null, problem: `The expected answer could not be worked out: ${message}` };
  }
}

/** "For sample values a = 4.5 cm, N = 20: expected 0.279 mT", recomputed as the teacher types. */
export function SamplePreview() {
  const { control } = useFormContext<Numeric>();
  const checkpoint = useWatch({ control }) as Numeric;
  const [round, setRound] = useState(1);
  const seed = `studio-sample-${round}`;
  const { key, expected, askedUnit, variables, relativeTolerancePercent, absoluteTolerance, sigFigs, requireUnit, distractors } =
    checkpoint;
  // Only what the engine reads, as text: the sample is recomputed when one of these changes, not on prompt keystrokes.
  const specText = JSON.stringify({
    key,
    expected,
    askedUnit,
    variables,
    relativeTolerancePercent,
    absoluteTolerance,
    sigFigs,
    requireUnit,
    distractors,
  } satisfies NumericCheckpointSpec);
  const sample = useMemo(() => compute(specText, seed), [specText, seed]);
  const values = Object.entries(sample.values).map(([name, value]) => `${name} = ${value}`);
  const lead = values.length > 0 ? `For sample values ${values.join(', ')}` : 'With no variables';
  return (
    <section aria-label="Expected answer for sample values" className="flex flex-col gap-2 rounded-md border border-line bg-sunken p-3">
      <LiveRegion>
        {sample.expectedText !== null ? (
          <p className="flex items-start gap-1.5">
            <CheckIcon className="mt-1 size-4 shrink-0 text-success" />
            <span>
              {lead}: expected <strong className="font-mono">{sample.expectedText}</strong>
            </span>
          </p>
        ) : (
          <p className="flex items-start gap-1.5 font-bold text-danger">
            <AlertIcon className="mt-1 size-4 shrink-0" />
            <span>{sample.problem ?? 'No expected answer yet.'}</span>
          </p>
        )}
      </LiveRegion>
      {checkpoint.variables.length > 0 ? (
        <div>
          <Button variant="secondary" size="sm" onClick={() => setRound(round + 1)}>
            New sample
          </Button>
        </div>
      ) : null}
    </section>
  );
}
