import { useId } from 'react';
import type { ModelInput } from '@core/contracts';
import type { LiveModelInputDefinition } from '@core/lessons/models';
import { formatWithUnit } from '@core/lessons/models';
import { LatexView } from './latex-view';

type ModelSliderProps = {
  input: LiveModelInputDefinition;
  range: Pick<ModelInput, 'min' | 'max' | 'step'>;
  value: number;
  onChange: (next: number) => void;
};

/** One model input as a range slider, its symbol, its current value with unit and its ends. */
export function ModelSlider({ input, range, value, onChange }: ModelSliderProps) {
  const id = useId();
  const text = formatWithUnit(value, input.unit);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="flex flex-wrap items-baseline justify-between gap-2">
        <span>
          {input.label} (<LatexView latex={input.symbol} display={false} />)
        </span>
        <span className="font-mono font-bold">{text}</span>
      </label>
      <input
        id={id}
        type="range"
        min={range.min}
        max={range.max}
        step={range.step}
        value={value}
        aria-valuetext={text}
        className="w-full accent-teal"
        onChange={(event) => onChange(Number(event.target.value))}
      />
      <div className="flex justify-between font-mono text-xs text-ink-muted" aria-hidden="true">
        <span>{formatWithUnit(range.min, input.unit)}</span>
        <span>{formatWithUnit(range.max, input.unit)}</span>
      </div>
    </div>
  );
}
