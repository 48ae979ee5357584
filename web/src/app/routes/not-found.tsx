import { Link, useLocation } from 'react-router-dom';
import { PublicLayout } from '@/components/layouts/public-layout';
import { buttonVariants } from '@/components/ui/button';
import { paths } from '@/config/paths';

/** Any address the app has no page for. */
export default function NotFoundRoute() {
  const location = useLocation();
  return (
    <PublicLayout>
      <div className="max-w-2xl">
        <p className="font-mono text-sm font-bold text-copper">404</p>
        <h1 className="mt-1 text-3xl">Page not found</h1>
        <p className="mt-3">
          Pinfield has no page at <code className="rounded bg-sunken px-1.5 py-0.5 font-mono text-base break-all">{location.pathname}</code>
          . The address may be mistyped, or the page may have moved.
        </p>
        <Link to={paths.landing} className={`${buttonVariants({ variant: 'primary' })} mt-6`}>
          Go to Pinfield’s start page
        </Link>
      </div>
    </PublicLayout>
  );
}
