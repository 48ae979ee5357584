import { useId } from 'react';
import type { CheckpointOf } from '@core/contracts';
import { NumberField, TextField, ToggleField } from '../common/fields';
import { useBoundField } from '../common/use-bound-field';

type SigFigs = CheckpointOf<'numeric'>['sigFigs'];

/** How close an answer must be, how many significant figures it may have, and whether it needs a unit. */
export function ToleranceFields() {
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField
          path="relativeTolerancePercent"
          label="Relative tolerance"
          hint="Percent of the expected value; 2 % is common practice. Empty: use only the absolute tolerance."
          nullable
          suffix="%"
        />
        <TextField
          path="absoluteTolerance"
          label="Absolute tolerance"
          hint="A quantity in the answer's unit, such as 0.5 uT; empty for none. Within either tolerance counts as right."
          nullable
          mono
        />
      </div>
      <SigFigsFields />
      <ToggleField path="requireUnit" label="The answer must carry a unit" hint="When off, a bare number is read in the asked unit." />
    </div>
  );
}

function SigFigsFields() {
  const sigFigs = useBoundField<SigFigs>('sigFigs');
  const id = useId();
  const on = sigFigs.value !== null && sigFigs.value !== undefined;
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-bold">Significant figures</legend>
      <label className="flex items-center gap-2">
        <input type="radio" name={id} checked={!on} onChange={() => sigFigs.set(null)} className="size-5 accent-teal" />
        <span>Not checked</span>
      </label>
      <label className="flex items-center gap-2">
        <input
          type="radio"
          name={id}
          checked={on}
          onChange={() => sigFigs.set({ min: 2, max: 4, penalty: 0.5 })}
          className="size-5 accent-teal"
        />
        <span>Checked: take points off outside a range</span>
      </label>
      {on ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <NumberField path="sigFigs.min" label="Fewest figures" />
          <NumberField path="sigFigs.max" label="Most figures" />
          <NumberField path="sigFigs.penalty" label="Penalty" hint="Share of the score taken off, 0 to 1 (0.5 is half)." />
        </div>
      ) : null}
      {sigFigs.error && !on ? <p className="text-sm font-bold text-danger">{sigFigs.error}</p> : null}
    </fieldset>
  );
}
