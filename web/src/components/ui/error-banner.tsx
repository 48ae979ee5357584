import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { isApiError, type ApiErrorDetail } from '@/lib/api-client';
import { Banner } from './banner';

const TITLES: Record<number, string> = {
  0: 'No connection to Pinfield',
  401: 'You are signed out',
  403: 'Not available for your role',
  404: 'Not found',
  409: 'That conflicts with what is already saved',
  413: 'Too large to send',
  429: 'Too many attempts',
};

function titleFor(status: number): string {
  const known = TITLES[status];
  if (known) return known;
  if (status >= 500) return 'Pinfield ran into a problem';
  return 'That did not work';
}

type ErrorBannerProps = { error: unknown; title?: string; details?: ApiErrorDetail[]; className?: string };

/** Shows an API failure as a banner in the page: its specific message, and what to do next where that is clear. */
export function ErrorBanner({ error, title, details, className }: ErrorBannerProps) {
  if (!error) return null;
  const status = isApiError(error) ? error.status : -1;
  const message = error instanceof Error ? error.message : 'Something unexpected went wrong. Reload the page and try again.';
  const list = details ?? (isApiError(error) ? error.details : []);
  return (
    <Banner tone="error" title={title ?? titleFor(status)} className={className}>
      <p>{message}</p>
      {list.length > 0 ? (
        <ul className="mt-1 list-disc pl-5">
          {list.map((detail) => (
            <li key={`${detail.path}:${detail.message}`}>
              <span className="font-mono text-sm">{detail.path}</span>: {detail.message}
            </li>
          ))}
        </ul>
      ) : null}
      {status === 401 ? (
        <p className="mt-1">
          <Link to={paths.signIn} className="font-bold text-copper underline">
            Sign in again
          </Link>
        </p>
      ) : null}
    </Banner>
  );
}
