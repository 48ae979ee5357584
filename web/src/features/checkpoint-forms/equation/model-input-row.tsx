import type { ModelId } from '@core/contracts';
import { LIVE_MODELS } from '@core/lessons/models';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { NumberField, ToggleField } from '../common/fields';
import { useProblemsAt } from '../common/problem-placement';
import { useBoundField } from '../common/use-bound-field';

type ModelInputRowProps = { modelId: ModelId; index: number; onRemove: () => void };

/** One input of the live model: fixed at a value, or a slider with its range and step. */
export function ModelInputRow({ modelId, index, onRemove }: ModelInputRowProps) {
  const path = `model.inputs.${index}`;
  const name = useBoundField<string>(`${path}.name`);
  const slider = useBoundField<boolean>(`${path}.slider`);
  const rowProblems = useProblemsAt(path);
  const known = LIVE_MODELS[modelId]?.inputs.find((input) => input.name === name.value);
  const title = known ? `${known.label} (${known.name})` : `Unknown input “${name.value}”`;
  const unit = known?.unit ?? '';
  return (
    <li aria-label={title} className="flex flex-col gap-3 rounded-md border border-line bg-surface p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-bold">{title}</p>
        <Button type="button" variant="ghost" size="sm" onClick={onRemove} aria-label={`Remove ${title}`}>
          Remove
        </Button>
      </div>
      <FieldError message={[name.error, rowProblems].filter(Boolean).join(' ') || undefined} />
      {known ? (
        <>
          <ToggleField path={`${path}.slider`} label="Slider for the student" hint="Otherwise the value stays fixed." />
          <div className="grid gap-3 sm:grid-cols-2">
            <NumberField path={`${path}.value`} label={slider.value ? 'Starting value' : 'Value'} suffix={unit} />
            {slider.value ? (
              <>
                <NumberField path={`${path}.min`} label="Smallest" suffix={unit} />
                <NumberField path={`${path}.max`} label="Largest" suffix={unit} />
                <NumberField path={`${path}.step`} label="Step" suffix={unit} />
              </>
            ) : null}
          </div>
        </>
      ) : null}
    </li>
  );
}
