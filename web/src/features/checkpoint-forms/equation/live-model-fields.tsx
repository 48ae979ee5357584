import { useId } from 'react';
import { MODEL_IDS, type LiveModel, type ModelId, type ModelInput } from '@core/contracts';
import { defaultLiveModel, LIVE_MODELS } from '@core/lessons/models';
import { Button } from '@/components/ui/button';
import { Field, FieldError } from '@/components/ui/field';
import { Select } from '@/components/ui/input';
import { NumberField } from '../common/fields';
import { useProblemsAt } from '../common/problem-placement';
import { useBoundField } from '../common/use-bound-field';
import { ModelInputRow } from './model-input-row';

/** The paths the live-model fields render, for placing problems next to them. */
export function liveModelAnchors(model: LiveModel | null): string[] {
  if (!model) return ['model'];
  // Only fields on screen: a fixed input shows no range, so a problem there goes to its row.
  const inputs = model.inputs.flatMap((input, i) =>
    (input.slider ? ['name', 'slider', 'min', 'max', 'step', 'value'] : ['name', 'slider', 'value']).map((f) => `model.inputs.${i}.${f}`),
  );
  const plot = model.plot ? ['model.plot.input', 'model.plot.from', 'model.plot.to'] : [];
  return ['model', 'model.modelId', 'model.inputs', ...model.inputs.map((_, i) => `model.inputs.${i}`), ...inputs, 'model.plot', ...plot];
}

/** Live model on or off; the model; each input fixed or a slider; the plot. */
export function LiveModelFields() {
  const model = useBoundField<LiveModel | null>('model');
  const latex = useBoundField<string>('latex');
  const id = useId();
  const current = model.value;
  const problems = useProblemsAt('model');

  function turnOn(on: boolean) {
    if (!on) return model.set(null);
    const next = defaultLiveModel('coil-on-axis');
    model.set(next);
    // A card without a formula yet gets the model's own.
    if (!latex.value?.trim()) latex.set(LIVE_MODELS[next.modelId].latex);
  }

  return (
    <div className="flex flex-col gap-4">
      <label className="flex items-start gap-2">
        <input
          id={id}
          type="checkbox"
          checked={current !== null}
          onChange={(event) => turnOn(event.target.checked)}
          className="mt-1 size-5 accent-teal"
        />
        <span>
          <span className="font-bold">Add a live model</span>
          <span className="block text-sm text-ink-muted">Students move sliders and see the field the engine computes, with units.</span>
        </span>
      </label>
      <FieldError message={problems} />
      {current ? <ModelEditor model={current} /> : null}
    </div>
  );
}

function ModelEditor({ model }: { model: LiveModel }) {
  const modelId = useBoundField<ModelId>('model.modelId');
  const whole = useBoundField<LiveModel>('model');
  const inputs = useBoundField<ModelInput[]>('model.inputs');
  const latex = useBoundField<string>('latex');
  const definition = LIVE_MODELS[model.modelId];
  const listed = new Set(model.inputs.map((input) => input.name));
  const missing = definition ? definition.inputs.filter((input) => !listed.has(input.name)) : [];

  function pick(next: ModelId) {
    whole.set(defaultLiveModel(next));
  }

  return (
    <div className="flex flex-col gap-4">
      <Field label="Model" error={modelId.error}>
        {(control) => (
          <Select {...control} value={model.modelId} onChange={(event) => pick(event.target.value as ModelId)}>
            {MODEL_IDS.map((value) => (
              <option key={value} value={value}>
                {LIVE_MODELS[value].label}
              </option>
            ))}
          </Select>
        )}
      </Field>
      {definition ? (
        <div>
          <Button type="button" variant="secondary" onClick={() => latex.set(definition.latex)}>
            Use this model’s formula
          </Button>
        </div>
      ) : null}
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-1 font-bold">Inputs</legend>
        {inputs.error ? <p className="text-sm font-bold text-danger">{inputs.error}</p> : null}
        <ul className="flex flex-col gap-3">
          {model.inputs.map((input, index) => (
            <ModelInputRow
              key={`${input.name}-${index}`}
              modelId={model.modelId}
              index={index}
              onRemove={() => inputs.set(model.inputs.filter((_, j) => j !== index))}
            />
          ))}
        </ul>
        {missing.length > 0 ? (
          <div className="flex flex-col gap-2">
            <p className="text-sm text-ink-muted">
              Not listed (fixed at their usual value): {missing.map((input) => input.label).join(', ')}.
            </p>
            <div className="flex flex-wrap gap-2">
              {missing.map((input) => (
                <Button
                  key={input.name}
                  type="button"
                  variant="secondary"
                  onClick={() =>
                    inputs.set([
                      ...model.inputs,
                      { name: input.name, slider: false, min: input.min, max: input.max, step: input.step, value: input.defaultValue },
                    ])
                  }
                >
                  Add {input.label.toLowerCase()}
                </Button>
              ))}
            </div>
          </div>
        ) : null}
      </fieldset>
      <PlotFields model={model} />
    </div>
  );
}

function PlotFields({ model }: { model: LiveModel }) {
  const plot = useBoundField<LiveModel['plot']>('model.plot');
  const plotInput = useBoundField<string>('model.plot.input');
  const definition = LIVE_MODELS[model.modelId];
  const plottable = definition ? definition.inputs.filter((input) => input.plottable) : [];
  const id = useId();
  const problems = useProblemsAt('model.plot');
  const unitOf = (name: string) => definition?.inputs.find((input) => input.name === name)?.unit ?? '';

  function turnOn(on: boolean) {
    const first = plottable[plottable.length - 1];
    if (!on || !first) return plot.set(null);
    plot.set({ input: first.name, from: first.min, to: first.max });
  }

  function pickInput(name: string) {
    const input = plottable.find((entry) => entry.name === name);
    if (input) plot.set({ input: input.name, from: input.min, to: input.max });
  }

  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 font-bold">Plot</legend>
      <label className="flex items-center gap-2">
        <input
          id={id}
          type="checkbox"
          checked={model.plot !== null}
          onChange={(event) => turnOn(event.target.checked)}
          className="size-5 accent-teal"
        />
        <span>Show a plot of the output</span>
      </label>
      <FieldError message={problems} />
      {model.plot ? (
        <>
          <Field label="Along the horizontal axis" error={plotInput.error}>
            {(control) => (
              <Select {...control} value={model.plot?.input ?? ''} onChange={(event) => pickInput(event.target.value)}>
                {plottable.some((input) => input.name === model.plot?.input) ? null : (
                  <option value={model.plot?.input}>{model.plot?.input} (not an input)</option>
                )}
                {plottable.map((input) => (
                  <option key={input.name} value={input.name}>
                    {input.label} ({input.name})
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <div className="grid gap-4 sm:grid-cols-2">
            <NumberField key={`from-${model.plot.input}`} path="model.plot.from" label="From" suffix={unitOf(model.plot.input)} />
            <NumberField key={`to-${model.plot.input}`} path="model.plot.to" label="To" suffix={unitOf(model.plot.input)} />
          </div>
        </>
      ) : null}
    </fieldset>
  );
}
