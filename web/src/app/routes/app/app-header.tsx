import type { MeDto } from '@core/contracts';
import { ROLE_LABELS } from '@core/roles';
import { Brand } from '@/components/layouts/brand';
import { roleHome } from '@/config/paths';
import { activeMembership } from '@/features/auth/api/get-me';
import { RoleSwitcher } from '@/features/auth/components/role-switcher';
import { SignOutButton } from '@/features/auth/components/sign-out-button';

/** Product name, the school being worked in, who is signed in and as what, the role switcher and sign-out. It wraps on phones. */
export function AppHeader({ me }: { me: MeDto }) {
  const membership = activeMembership(me);
  return (
    <header className="border-b border-line bg-surface">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-3 px-4 py-3 sm:px-6">
        <div className="flex min-w-0 flex-wrap items-center gap-x-4 gap-y-1">
          <Brand to={roleHome(me.active.role)} />
          {membership ? (
            <span className="min-w-0 border-l-2 border-copper pl-3 font-bold text-ink-muted">{membership.schoolName}</span>
          ) : null}
        </div>
        <div className="ml-auto flex flex-wrap items-center justify-end gap-x-4 gap-y-2">
          <RoleSwitcher me={me} />
          <span className="text-sm">
            <span className="font-bold">{me.user.name}</span>
            <span className="text-ink-muted"> · {ROLE_LABELS[me.active.role]}</span>
          </span>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
