import { useNavigate, useSearchParams } from 'react-router-dom';
import { EmailLinkVerifySchema } from '@core/contracts';
import { PublicLayout } from '@/components/layouts/public-layout';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { roleHome } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { useVerifyEmailLink } from '@/features/auth/api/verify-email-link';
import { EmailLinkForm } from '@/features/auth/components/email-link-form';

/**
 * The page a sign-in e-mail links to. Opening it does nothing but show a button: mail filters open links to
 * scan them, so only the button press (a POST) uses the token up.
 */
export default function SignInLinkRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const verify = useVerifyEmailLink();
  const parsed = EmailLinkVerifySchema.safeParse({ token: params.get('token') ?? '' });

  function signIn() {
    if (!parsed.success) return;
    verify.mutate(parsed.data, { onSuccess: (me) => void navigate(roleHome(me.active.role), { replace: true }) });
  }

  // A used or expired link cannot work again: only a new link helps. Other failures (network) may be retried.
  const linkRefused = verify.isError && isApiError(verify.error) && verify.error.code === 'link_invalid';
  const needsNewLink = !parsed.success || verify.isError;
  return (
    <PublicLayout>
      <div className="mx-auto flex max-w-xl flex-col gap-6">
        <Card className="flex flex-col gap-4">
          <h1 className="text-3xl">Finish signing in</h1>
          {parsed.success && !linkRefused ? (
            <>
              <p>Press the button to finish signing in on this device. The link then stops working, so keep this tab until you are in.</p>
              <div>
                <Button size="lg" onClick={signIn} busy={verify.isPending} disabled={verify.isSuccess}>
                  Sign in to Pinfield
                </Button>
              </div>
            </>
          ) : !parsed.success ? (
            <Banner tone="error" title="This link cannot be used">
              {parsed.error.issues[0]?.message ?? 'The sign-in link is incomplete.'} Copy the whole link from the e-mail, or request a new
              one below.
            </Banner>
          ) : null}
          {verify.isError ? <ErrorBanner error={verify.error} title="You are not signed in" /> : null}
        </Card>
        {needsNewLink ? (
          <Card className="flex flex-col gap-3" aria-labelledby="new-link-heading">
            <h2 id="new-link-heading" className="text-xl">
              Request a new sign-in link
            </h2>
            <EmailLinkForm submitLabel="Send a new link" />
          </Card>
        ) : null}
      </div>
    </PublicLayout>
  );
}
