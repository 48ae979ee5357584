import { useId } from 'react';
import { useController, useFormContext } from 'react-hook-form';
import { FieldError } from '@/components/ui/field';
import { plural } from '@/lib/format';
import type { AssignFormValues } from '../form-values';

export type ClassChoice = { id: string; name: string; studentCount: number };

/** The teacher's classes as checkboxes (inside the assign form's FormProvider); each one ticked gets its own assignment. */
export function ClassCheckboxes({ classes }: { classes: ClassChoice[] }) {
  const { control } = useFormContext<AssignFormValues>();
  const { field, fieldState } = useController({ control, name: 'classIds' });
  const id = useId();
  const errorId = `${id}-error`;
  const chosen = new Set(field.value);
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={fieldState.error ? `${id}-hint ${errorId}` : `${id}-hint`}>
      <legend className="mb-1 font-bold">Classes</legend>
      <p id={`${id}-hint`} className="-mt-1 text-sm text-ink-muted">
        Each class you tick gets its own assignment with these dates, so you can follow and change each class on its own.
      </p>
      <div className="flex flex-col gap-1">
        {classes.map((item, index) => (
          <label key={item.id} className="inline-flex min-h-9 cursor-pointer items-center gap-3">
            <input
              type="checkbox"
              value={item.id}
              checked={chosen.has(item.id)}
              ref={index === 0 ? field.ref : undefined}
              onBlur={field.onBlur}
              onChange={(event) =>
                field.onChange(event.target.checked ? [...field.value, item.id] : field.value.filter((classId) => classId !== item.id))
              }
              className="size-5 shrink-0 accent-teal"
            />
            <span>
              <span className="font-bold">{item.name}</span>{' '}
              <span className="text-sm text-ink-muted">({plural(item.studentCount, 'student')})</span>
            </span>
          </label>
        ))}
      </div>
      <FieldError id={errorId} message={fieldState.error?.message} />
    </fieldset>
  );
}
