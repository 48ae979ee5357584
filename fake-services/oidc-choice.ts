import { z } from 'zod';
import type { OidcAccount, OidcIdentity } from './oidc-identity';
import { nameFromEmail, subFor } from './oidc-identity';
import type { TypedAddress } from './oidc-picker-page';

const emailSchema = z.email();
const MAX_NAME_LENGTH = 120;

export type Choice = { identity: OidcIdentity } | { error: string; typed: TypedAddress };

function field(body: Record<string, unknown>, name: string): string {
  const value = body[name];
  return typeof value === 'string' ? value.trim() : '';
}

/** Turns the picker's submitted form into the identity to sign in as, or says what is wrong with it. */
export function resolveChoice(body: Record<string, unknown>, accounts: OidcAccount[]): Choice {
  const picked = field(body, 'account');
  if (picked) {
    const account = accounts.find((candidate) => candidate.email.toLowerCase() === picked.toLowerCase());
    if (!account) {
      return {
        error: `"${picked}" is not one of the demo accounts here; pick one from the list or type it below.`,
        typed: { email: picked, name: '', unverified: false },
      };
    }
    return { identity: { sub: subFor(account.email), email: account.email.toLowerCase(), emailVerified: true, name: account.name } };
  }

  const typed: TypedAddress = { email: field(body, 'email'), name: field(body, 'name'), unverified: field(body, 'unverified') === 'yes' };
  if (!typed.email) return { error: 'Type an e-mail address, or pick one of the demo accounts above.', typed };
  if (!emailSchema.safeParse(typed.email).success) {
    return { error: `"${typed.email}" is not an e-mail address; write it as name@domain, e.g. sam@school.example.`, typed };
  }
  if (typed.name.length > MAX_NAME_LENGTH) return { error: `The name is too long: keep it to ${MAX_NAME_LENGTH} characters.`, typed };
  const email = typed.email.toLowerCase();
  // A typed demo address without a name keeps that account's name.
  const known = accounts.find((candidate) => candidate.email.toLowerCase() === email);
  const name = typed.name || known?.name || nameFromEmail(email);
  return { identity: { sub: subFor(email), email, emailVerified: !typed.unverified, name } };
}
