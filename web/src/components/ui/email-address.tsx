import { Fragment } from 'react';
import { cn } from '@/lib/cn';

/**
 * An e-mail address in the monospace face. On narrow screens it may wrap: preferably right after the @,
 * otherwise anywhere, so a long address never pushes the page wider than the phone.
 */
export function EmailAddress({ email, className }: { email: string; className?: string }) {
  const at = email.indexOf('@');
  return (
    <span className={cn('font-mono text-sm wrap-anywhere', className)}>
      {at < 0 ? (
        email
      ) : (
        <Fragment>
          {email.slice(0, at + 1)}
          {/* Chromium breaks at <wbr> even under white-space: nowrap: offer the break on phones only. */}
          <wbr className="sm:hidden" />
          {email.slice(at + 1)}
        </Fragment>
      )}
    </span>
  );
}
