import { Link } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { isApiError } from '@/lib/api-client';

type WatchUnavailableProps = { error: unknown; homeHref: string; resultsHref: string; onRetry: () => void };

/** Why the lesson cannot be watched now, in the server's words, with where to go instead. */
export function WatchUnavailable({ error, homeHref, resultsHref, onRetry }: WatchUnavailableProps) {
  const code = isApiError(error) ? error.code : null;
  const message = error instanceof Error ? error.message : 'The lesson could not be loaded.';
  const home = (
    <Link to={homeHref} className="font-bold text-copper underline">
      Back to your lessons
    </Link>
  );
  if (code === 'assignment_not_open') {
    return (
      <Banner tone="info" title="This lesson is not open yet">
        <p>{message}</p>
        <p className="mt-2">{home}</p>
      </Banner>
    );
  }
  if (code === 'assignment_closed') {
    return (
      <Banner tone="info" title="This lesson has closed">
        <p>{message}</p>
        <p className="mt-2 flex flex-wrap gap-4">
          <Link to={resultsHref} className="font-bold text-copper underline">
            See your results
          </Link>
          {home}
        </p>
      </Banner>
    );
  }
  if (isApiError(error) && error.status === 404) {
    return (
      <Banner tone="error" title="This lesson is not assigned to you">
        <p>{message}</p>
        <p className="mt-2">{home}</p>
      </Banner>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <ErrorBanner error={error} title="The lesson could not be loaded" />
      <div>
        <Button variant="secondary" onClick={onRetry}>
          Try again
        </Button>
      </div>
    </div>
  );
}
