import { useAuthConfig } from '../api/get-auth-config';
import { EmailAddress } from '@/components/ui/email-address';

/** In demo mode, the invented accounts a visitor can try, with the role each one shows. */
export function DemoAccounts() {
  const config = useAuthConfig();
  if (!config.data?.demoMode || config.data.demoAccounts.length === 0) return null;
  return (
    <section aria-labelledby="demo-accounts-heading" className="rounded-lg border border-teal bg-teal-soft p-5">
      <h2 id="demo-accounts-heading" className="text-xl">
        Demo accounts
      </h2>
      <p className="mt-1 text-ink">
        This copy of Pinfield runs with invented demo data. Choose <strong>Continue with Google</strong>: the local sign-in stand-in lists
        these accounts, and you pick one there.
      </p>
      <ul className="mt-3 divide-y divide-line rounded-md border border-line bg-surface">
        {config.data.demoAccounts.map((account) => (
          <li key={account.email} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-2.5">
            <span className="min-w-0">
              <span className="block font-bold sm:inline">{account.name}</span>
              <EmailAddress email={account.email} className="block text-ink-muted sm:ml-2 sm:inline" />
            </span>
            <span className="text-sm font-bold text-teal-strong">{account.label}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
