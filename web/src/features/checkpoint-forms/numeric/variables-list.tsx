import type { NumericVariable } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/input';
import { NumberField, TextField } from '../common/fields';
import { ListEditor } from '../common/list-editor';
import { useBoundField } from '../common/use-bound-field';

const ROLE_LABELS: Record<NumericVariable['role'], string> = {
  none: 'No role',
  radius: 'A radius (checks a diameter slip)',
  turns: 'Number of turns (checks turns forgotten)',
};

/** A name not yet taken: x, y, z, then x2, y2 … */
function freeName(taken: readonly string[]): string {
  for (let round = 1; ; round++) {
    for (const letter of ['x', 'y', 'z', 'w']) {
      const name = round === 1 ? letter : `${letter}${round}`;
      if (!taken.includes(name)) return name;
    }
  }
}

/** The declared variables: each student draws their own value from min to max in steps. */
export function VariablesList() {
  const variables = useBoundField<NumericVariable[]>('variables');
  const items = variables.value ?? [];
  return (
    <ListEditor
      path="variables"
      legend="Variables"
      hint="Each student gets their own values, drawn between the smallest and largest in steps. Use them in the formula and as {{name}} in the question."
      items={items}
      onChange={variables.set}
      itemName={(index) => `Variable ${index + 1}${items[index]?.name ? ` (${items[index]?.name})` : ''}`}
      newItem={(): NumericVariable => ({ name: freeName(items.map((v) => v.name)), min: 1, max: 10, step: 1, unit: '', role: 'none' })}
      addLabel="Add a variable"
      max={LIMITS.variablesMax}
      itemKey={(_, index) => String(index)}
      reorder={false}
      error={variables.zodError}
      renderItem={(_, index) => <VariableFields index={index} />}
    />
  );
}

function VariableFields({ index }: { index: number }) {
  const at = (field: string) => `variables.${index}.${field}`;
  const n = index + 1;
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <TextField path={at('name')} label={`Variable ${n} name`} mono />
      <TextField path={at('unit')} label={`Variable ${n} unit`} hint="Such as cm or A; empty for a count." mono />
      <RoleField index={index} />
      <NumberField path={at('min')} label={`Variable ${n} smallest value`} />
      <NumberField path={at('max')} label={`Variable ${n} largest value`} />
      <NumberField path={at('step')} label={`Variable ${n} step`} />
    </div>
  );
}

function RoleField({ index }: { index: number }) {
  const role = useBoundField<NumericVariable['role']>(`variables.${index}.role`);
  return (
    <Field label={`Variable ${index + 1} role`} error={role.error}>
      {(control) => (
        <Select {...control} value={role.value ?? 'none'} onChange={(event) => role.set(event.target.value as NumericVariable['role'])}>
          {(Object.keys(ROLE_LABELS) as NumericVariable['role'][]).map((value) => (
            <option key={value} value={value}>
              {ROLE_LABELS[value]}
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}
