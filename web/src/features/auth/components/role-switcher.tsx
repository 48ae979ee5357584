import { useId } from 'react';
import { useNavigate } from 'react-router-dom';
import type { MeDto } from '@core/contracts';
import { ROLE_LABELS, type Role } from '@core/roles';
import { Select } from '@/components/ui/input';
import { roleHome } from '@/config/paths';
import { useSetActive } from '../api/set-active';

type Choice = { value: string; schoolId: string; role: Role; label: string };

/** Every (school, role) pair the person can act as. */
export function activeChoices(me: MeDto): Choice[] {
  const manySchools = me.memberships.length > 1;
  return me.memberships.flatMap((membership) =>
    membership.roles.map((role) => ({
      value: `${membership.schoolId}:${role}`,
      schoolId: membership.schoolId,
      role,
      label: manySchools ? `${ROLE_LABELS[role]} · ${membership.schoolName}` : ROLE_LABELS[role],
    })),
  );
}

/** Lets a person with several roles or schools change which one they act as, then takes them to that role's home. */
export function RoleSwitcher({ me }: { me: MeDto }) {
  const id = useId();
  const navigate = useNavigate();
  const mutation = useSetActive();
  const choices = activeChoices(me);
  if (choices.length < 2) return null;
  const current = `${me.active.schoolId}:${me.active.role}`;

  function change(value: string) {
    const choice = choices.find((option) => option.value === value);
    if (!choice) return;
    mutation.mutate({ schoolId: choice.schoolId, role: choice.role }, { onSuccess: (next) => void navigate(roleHome(next.active.role)) });
  }

  return (
    <div className="flex min-w-0 max-w-full flex-col gap-1">
      <div className="flex min-w-0 items-center gap-2">
        <label htmlFor={id} className="text-sm font-bold whitespace-nowrap">
          Acting as
        </label>
        <Select
          id={id}
          value={current}
          disabled={mutation.isPending}
          onChange={(event) => change(event.target.value)}
          className="min-h-9 w-auto min-w-0 max-w-full truncate py-1 text-sm md:max-w-60"
        >
          {choices.map((choice) => (
            <option key={choice.value} value={choice.value}>
              {choice.label}
            </option>
          ))}
        </Select>
      </div>
      {mutation.isError ? (
        <p role="alert" className="text-sm font-bold text-danger">
          Could not switch: {mutation.error.message}
        </p>
      ) : null}
    </div>
  );
}
