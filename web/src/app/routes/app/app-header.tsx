import type { MeDto } from '@core/contracts';
import { ROLE_LABELS, type Role } from '@core/roles';
import { Brand } from '@/components/layouts/brand';
import { TabNav, type TabLink } from '@/components/ui/tab-nav';
import { paths, roleHome } from '@/config/paths';
import { activeMembership } from '@/features/auth/api/get-me';
import { RoleSwitcher } from '@/features/auth/components/role-switcher';
import { SignOutButton } from '@/features/auth/components/sign-out-button';
import { cn } from '@/lib/cn';

// The sections of a role with more than one page; the admin section has its own navigation.
const SECTIONS: Partial<Record<Role, TabLink[]>> = {
  teacher: [
    { to: paths.teacher.home, label: 'Classes', end: true },
    { to: paths.teacher.recordings, label: 'Recordings', end: false },
    { to: paths.lessons.list(paths.teacher.home), label: 'Lessons', end: false },
  ],
  coordinator: [
    { to: paths.coordinator.home, label: 'Department', end: true },
    { to: paths.lessons.list(paths.coordinator.home), label: 'Lessons', end: false },
  ],
  substitute: [
    { to: paths.substitute.home, label: 'Cover', end: true },
    { to: paths.lessons.list(paths.substitute.home), label: 'Shared lessons', end: false },
  ],
};

function SectionNav({ role, width }: { role: Role; width: string }) {
  const links = SECTIONS[role];
  if (!links) return null;
  return <TabNav label={`${ROLE_LABELS[role]} pages`} links={links} className={cn('mx-auto px-4 sm:px-6', width)} />;
}

/**
 * Product name, the school being worked in, who is signed in and as what, the role switcher and sign-out.
 * On a phone: name and sign-out on the first line, the school, person and switcher below.
 */
export function AppHeader({ me, wide = false }: { me: MeDto; wide?: boolean }) {
  const width = wide ? 'max-w-screen-2xl' : 'max-w-6xl';
  const membership = activeMembership(me);
  const school = membership ? <span className="font-bold text-ink-muted">{membership.schoolName}</span> : null;
  return (
    <header className="border-b border-line bg-surface">
      <div className={cn('mx-auto flex flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6', width)}>
        <div className="order-1 flex min-w-0 items-center gap-4">
          <Brand to={roleHome(me.active.role)} />
          {school ? <span className="hidden border-l-2 border-copper pl-3 md:inline">{school}</span> : null}
        </div>
        <div className="order-2 ml-auto md:order-4 md:ml-0">
          <SignOutButton />
        </div>
        <div className="order-3 flex w-full flex-wrap items-center gap-x-4 gap-y-2 md:ml-auto md:w-auto">
          {school ? <span className="w-full border-l-2 border-copper pl-3 md:hidden">{school}</span> : null}
          <span className="text-sm">
            <span className="font-bold">{me.user.name}</span>
            <span className="text-ink-muted"> · {ROLE_LABELS[me.active.role]}</span>
          </span>
          <RoleSwitcher me={me} />
        </div>
      </div>
      <SectionNav role={me.active.role} width={width} />
    </header>
  );
}
