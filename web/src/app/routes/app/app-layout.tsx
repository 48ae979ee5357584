import { Navigate, Outlet, useMatches } from 'react-router-dom';
import { cn } from '@/lib/cn';
import { Button } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { PublicLayout } from '@/components/layouts/public-layout';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { MeProvider } from '@/features/auth/components/me-context';
import { AppHeader } from './app-header';

/** The signed-in shell: knows who is signed in before any page inside it renders; signed-out visitors go to sign-in. */
export function AppLayout() {
  const me = useMe();
  const wide = useWidePage();
  if (me.isPending) return <Loading label="Checking who is signed in…" className="px-6" />;
  if (me.isError) {
    return (
      <PublicLayout>
        <ErrorBanner error={me.error} title="Pinfield could not check your sign-in" />
        <Button className="mt-4" variant="secondary" onClick={() => void me.refetch()}>
          Try again
        </Button>
      </PublicLayout>
    );
  }
  if (!me.data) return <Navigate to={paths.signIn} replace />;
  return (
    <MeProvider me={me.data}>
      <div className="flex min-h-dvh flex-col">
        <AppHeader me={me.data} wide={wide} />
        <main id="main" className={cn('mx-auto w-full flex-1 px-4 sm:px-6', wide ? 'max-w-screen-2xl py-4' : 'max-w-6xl py-8')}>
          <Outlet />
        </main>
      </div>
    </MeProvider>
  );
}

/** Pages that need the whole window (the studio) say so with `handle: { wide: true }` on their route. */
function useWidePage(): boolean {
  return useMatches().some((match) => (match.handle as { wide?: boolean } | undefined)?.wide === true);
}
