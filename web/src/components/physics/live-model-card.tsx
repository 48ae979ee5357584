import { lazy, Suspense, useMemo, useState } from 'react';
import type { LiveModel } from '@core/contracts';
import { evaluateLiveModel, formatWithUnit, liveModelDefinition, liveModelValues, LiveModelError } from '@core/lessons/models';
import { LatexView } from './latex-view';
import { ModelSlider } from './model-slider';

// uPlot stays out of the main bundle: only cards with a plot load it.
const LiveModelPlot = lazy(() => import('./live-model-plot').then((module) => ({ default: module.LiveModelPlot })));

type LiveModelCardProps = { model: LiveModel; className?: string };

function clamp(value: number, min: number, max: number): number {
  return Math.min(Math.max(value, min), max);
}

/**
 * A live equation card's model: a slider per input the teacher marked as one (with its range and
 * unit), the fixed inputs listed, the engine's output with units, and an optional plot against
 * one input with a marker at its current value.
 */
export function LiveModelCard({ model, className }: LiveModelCardProps) {
  const definition = liveModelDefinition(model);
  const [moved, setMoved] = useState<Record<string, number>>({});
  const sliders = useMemo(() => model.inputs.filter((input) => input.slider && input.min < input.max), [model]);
  const values = useMemo(() => {
    const own: Record<string, number> = {};
    for (const input of sliders) own[input.name] = clamp(moved[input.name] ?? input.value, input.min, input.max);
    return liveModelValues(model, own);
  }, [model, moved, sliders]);
  const result = useMemo(() => {
    try {
      return { ok: true as const, ...evaluateLiveModel(model, values) };
    } catch (error) {
      if (error instanceof LiveModelError) return { ok: false as const, message: error.message };
      throw error;
    }
  }, [model, values]);
  const sliderNames = new Set(sliders.map((input) => input.name));
  const fixed = definition.inputs.filter((input) => !sliderNames.has(input.name));
  return (
    <section aria-label={`Live model: ${definition.label}`} className={className}>
      <div className="flex flex-col gap-3 rounded-md border border-line bg-surface p-3">
        <p className="font-bold">{definition.label}</p>
        {sliders.map((input) => {
          const known = definition.inputs.find((entry) => entry.name === input.name);
          if (!known) return null;
          return (
            <ModelSlider
              key={input.name}
              input={known}
              range={input}
              value={values[input.name] as number}
              onChange={(next) => setMoved((current) => ({ ...current, [input.name]: next }))}
            />
          );
        })}
        {fixed.length > 0 ? (
          <div>
            <p className="text-sm text-ink-muted">Fixed</p>
            <ul className="flex flex-wrap gap-x-4 gap-y-1 font-mono text-sm">
              {fixed.map((input) => (
                <li key={input.name}>
                  <LatexView latex={input.symbol} display={false} /> = {formatWithUnit(values[input.name] as number, input.unit)}
                  <span className="sr-only"> ({input.label})</span>
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        <div className="rounded-md bg-sunken px-3 py-2" aria-live="polite">
          <span className="text-sm text-ink-muted">{definition.output.label}: </span>
          {result.ok ? (
            <output className="font-mono text-lg font-bold">{result.text}</output>
          ) : (
            <output className="text-sm font-bold text-danger">{result.message}</output>
          )}
        </div>
        {model.plot ? (
          <Suspense fallback={<p className="text-sm text-ink-muted">Loading the plot…</p>}>
            <LiveModelPlot model={model} values={values} />
          </Suspense>
        ) : null}
      </div>
    </section>
  );
}
