import type { InputHTMLAttributes } from 'react';
import { ROLE_LABELS, ROLES, type Role } from '@core/roles';
import { FieldError } from '@/components/ui/field';
import { cn } from '@/lib/cn';

type Props = {
  legend: string;
  error?: string;
  /** Props for each role's checkbox (react-hook-form's register, or checked/onChange). */
  inputProps: (role: Role) => InputHTMLAttributes<HTMLInputElement>;
  compact?: boolean;
};

/** One checkbox per role in a fieldset, with the group's error below it. */
export function RoleCheckboxes({ legend, error, inputProps, compact = false }: Props) {
  const errorId = `${legend.replace(/\W+/g, '-').toLowerCase()}-error`;
  return (
    <fieldset aria-describedby={error ? errorId : undefined} className="flex flex-col gap-2">
      <legend className={cn('font-bold', compact && 'sr-only')}>{legend}</legend>
      <div className={cn('flex flex-wrap gap-x-4 gap-y-2', !compact && 'mt-1')}>
        {ROLES.map((role) => (
          <label key={role} className="inline-flex min-h-9 cursor-pointer items-center gap-2">
            <input type="checkbox" value={role} className="size-5 accent-copper" {...inputProps(role)} />
            {ROLE_LABELS[role]}
          </label>
        ))}
      </div>
      <FieldError id={errorId} message={error} />
    </fieldset>
  );
}
