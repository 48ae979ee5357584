import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { EmailLinkForm } from './email-link-form';
import { GoogleSignIn } from './google-sign-in';

/** The two ways in: a Google account, or a one-time link sent to a school e-mail address. */
export function SignInOptions({ headingLevel = 2, email }: { headingLevel?: 1 | 2; email?: string }) {
  const Heading = headingLevel === 1 ? 'h1' : 'h2';
  return (
    <Card className="flex flex-col gap-5" aria-labelledby="sign-in-heading">
      <Heading id="sign-in-heading" className={headingLevel === 1 ? 'text-3xl' : 'text-2xl'}>
        Sign in
      </Heading>
      <GoogleSignIn />
      <div className="flex items-center gap-3 text-sm text-ink-muted" aria-hidden="true">
        <span className="h-px flex-1 bg-line" />
        or
        <span className="h-px flex-1 bg-line" />
      </div>
      <section aria-labelledby="email-link-heading" className="flex flex-col gap-3">
        <h3 id="email-link-heading" className="text-lg">
          Sign in with an e-mail link
        </h3>
        <EmailLinkForm defaultEmail={email} />
      </section>
      <p className="border-t border-line pt-4 text-sm">
        A student with a class code and no account yet?{' '}
        <Link to={paths.join} className="font-bold text-copper underline">
          Join a class
        </Link>
      </p>
    </Card>
  );
}
