import { isRouteErrorResponse, Outlet, useNavigation, useRouteError } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { PublicLayout } from '@/components/layouts/public-layout';

/** The outermost route: a skip link, a progress bar while a page's code loads, then the page. */
export function RootLayout() {
  const navigation = useNavigation();
  return (
    <>
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-surface focus:px-3 focus:py-2 focus:font-bold"
      >
        Skip to the page content
      </a>
      {navigation.state === 'loading' ? (
        <div role="progressbar" aria-label="Loading the page" className="fixed inset-x-0 top-0 z-40 h-1 animate-pulse bg-teal" />
      ) : null}
      <Outlet />
    </>
  );
}

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `The page answered ${error.status}: ${error.statusText || 'no explanation given'}.`;
  // After an update, the chunks of the old build are gone: the page must be reloaded to fetch the new ones.
  if (error instanceof TypeError && /dynamically imported module|Importing a module script failed/i.test(error.message)) {
    return 'Pinfield was updated while this page was open, so part of it could not be loaded. Reload the page to get the new version.';
  }
  if (error instanceof Error) return error.message;
  return 'An unexpected error stopped this page.';
}

/** Shown when a page throws while rendering or its code cannot be loaded: never a blank screen. */
export function RouteError() {
  const error = useRouteError();
  return (
    <PublicLayout>
      <div className="max-w-2xl">
        <h1 className="text-3xl">This page stopped working</h1>
        <p className="mt-3">{describe(error)}</p>
        <p className="mt-2 text-ink-muted">
          Nothing you saved before this is lost. Reloading usually helps; if it keeps happening, tell your school admin what you were doing.
        </p>
        <Button className="mt-5" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
      </div>
    </PublicLayout>
  );
}
