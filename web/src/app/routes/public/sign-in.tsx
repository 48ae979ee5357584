import { useSearchParams } from 'react-router-dom';
import { SIGN_IN_ERRORS, type SignInErrorCode } from '@core/contracts';
import { PublicLayout } from '@/components/layouts/public-layout';
import { Banner } from '@/components/ui/banner';
import { DemoAccounts } from '@/features/auth/components/demo-accounts';
import { SignInOptions } from '@/features/auth/components/sign-in-options';

function isSignInErrorCode(code: string): code is SignInErrorCode {
  return Object.hasOwn(SIGN_IN_ERRORS, code);
}

/** The message for `?error=`; an unknown code still says that sign-in failed, and names the code. */
export function signInErrorMessage(code: string): string {
  if (isSignInErrorCode(code)) return SIGN_IN_ERRORS[code];
  return `Sign-in did not complete (reason: “${code}”). Try again, or sign in with an e-mail link.`;
}

export default function SignInRoute() {
  const [params] = useSearchParams();
  const error = params.get('error');
  return (
    <PublicLayout>
      <div className="mx-auto flex max-w-xl flex-col gap-6">
        {error ? (
          <Banner tone="error" title="You are not signed in">
            {signInErrorMessage(error)}
          </Banner>
        ) : null}
        {/* Invitation e-mails link here with the invited address filled in. */}
        <SignInOptions headingLevel={1} email={params.get('email') ?? undefined} />
        <DemoAccounts />
      </div>
    </PublicLayout>
  );
}
