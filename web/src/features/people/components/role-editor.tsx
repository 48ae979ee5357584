import { useState } from 'react';
import type { PersonDto } from '@core/contracts';
import { ROLE_LABELS, type Role } from '@core/roles';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { useUpdatePerson } from '../api/update-person';
import { RoleCheckboxes } from './role-checkboxes';

/** A person's roles as badges, with an inline editor (checkboxes, save, cancel) when the admin may change them. */
export function RoleEditor({ person }: { person: PersonDto }) {
  const [editing, setEditing] = useState(false);
  const [roles, setRoles] = useState<Role[]>(person.roles);
  const [localError, setLocalError] = useState<string | undefined>();
  const mutation = useUpdatePerson();

  function toggle(role: Role, checked: boolean) {
    setRoles((current) => (checked ? [...current, role] : current.filter((item) => item !== role)));
  }

  function save() {
    setLocalError(undefined);
    if (roles.length === 0) {
      setLocalError('Choose at least one role.');
      return;
    }
    mutation.mutate({ userId: person.userId, roles }, { onSuccess: () => setEditing(false) });
  }

  if (!editing) {
    return (
      <div className="flex flex-wrap items-center gap-1.5">
        {person.roles.map((role) => (
          <Badge key={role} tone={role === 'admin' ? 'copper' : 'neutral'}>
            {ROLE_LABELS[role]}
          </Badge>
        ))}
        {person.abilities.changeRoles ? (
          <Button
            variant="ghost"
            size="sm"
            className="underline"
            onClick={() => {
              setRoles(person.roles);
              mutation.reset();
              setEditing(true);
            }}
            aria-label={`Change the roles of ${person.name}`}
          >
            Change
          </Button>
        ) : null}
      </div>
    );
  }

  const serverError = mutation.isError ? mutation.error.message : undefined;
  return (
    <div className="flex min-w-64 flex-col gap-2">
      <RoleCheckboxes
        legend={`Roles of ${person.name}`}
        compact
        inputProps={(role) => ({ checked: roles.includes(role), onChange: (event) => toggle(role, event.target.checked) })}
      />
      <FieldError message={localError ?? serverError} />
      <div className="flex gap-2">
        <Button size="sm" onClick={save} busy={mutation.isPending}>
          Save roles
        </Button>
        <Button size="sm" variant="secondary" onClick={() => setEditing(false)}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
