import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { MeDto } from '@core/contracts';
import { ROLE_LABELS, type Role } from '@core/roles';
import { Banner } from '@/components/ui/banner';
import { Button, buttonVariants } from '@/components/ui/button';
import { roleHome } from '@/config/paths';
import { activeMembership } from '../api/get-me';
import { useSetActive } from '../api/set-active';

/** Shows `children` only when the person acts in `role`; otherwise a page that says why, never a blank screen. */
export function RequireRole({ me, role, children }: { me: MeDto; role: Role; children: ReactNode }) {
  if (me.active.role === role) return children;
  return <RoleMismatch me={me} role={role} />;
}

function RoleMismatch({ me, role }: { me: MeDto; role: Role }) {
  const mutation = useSetActive();
  const membership = activeMembership(me);
  const holdsRole = membership?.roles.includes(role) ?? false;
  const schoolId = me.active.schoolId;
  return (
    <div className="mx-auto max-w-2xl py-6">
      <h1 className="text-3xl">Not available for your role</h1>
      <p className="mt-3">
        This page is for the <strong>{ROLE_LABELS[role]}</strong> role. You are signed in as <strong>{ROLE_LABELS[me.active.role]}</strong>
        {membership ? ` at ${membership.schoolName}` : ''}.
      </p>
      {holdsRole ? (
        <p className="mt-2">You also hold the {ROLE_LABELS[role]} role here: switch to it to open this page.</p>
      ) : (
        <p className="mt-2">If you need it, ask your school admin to give you the {ROLE_LABELS[role]} role.</p>
      )}
      <div className="mt-5 flex flex-wrap gap-3">
        {holdsRole ? (
          <Button busy={mutation.isPending} onClick={() => mutation.mutate({ schoolId, role })}>
            Switch to {ROLE_LABELS[role]}
          </Button>
        ) : null}
        <Link to={roleHome(me.active.role)} className={buttonVariants({ variant: holdsRole ? 'secondary' : 'primary' })}>
          Go to your {ROLE_LABELS[me.active.role]} home
        </Link>
      </div>
      {mutation.isError ? (
        <Banner tone="error" title="Could not switch role" className="mt-4">
          {mutation.error.message}
        </Banner>
      ) : null}
    </div>
  );
}
