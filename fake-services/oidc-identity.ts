import { createHash } from 'node:crypto';
import { escapeHtml } from './html';

export interface OidcAccount {
  email: string;
  name: string;
  /** Shown on the picker, e.g. the role: "Teacher". */
  label: string;
}

/** The person a sign-in resolves to; becomes the id_token claims and the userinfo body. */
export interface OidcIdentity {
  sub: string;
  email: string;
  emailVerified: boolean;
  name: string;
}

export interface UserinfoClaims {
  sub: string;
  email: string;
  email_verified: boolean;
  name: string;
  given_name: string;
  family_name: string;
  picture: string;
}

export const SUB_PATTERN = /^[0-9a-f]{24}$/;

/** Same address (any case) -> same subject, so signing in again links to the same identity. */
export function subFor(email: string): string {
  return createHash('sha256').update(`pinfield-oidc-fake:${email.trim().toLowerCase()}`).digest('hex').slice(0, 24);
}

/** "sam.o-rivera@x" -> "Sam O Rivera": a readable name when none was typed. */
export function nameFromEmail(email: string): string {
  const local = email.split('@')[0] ?? email;
  const words = local.split(/[._+\-\d]+/).filter((word) => word.length > 0);
  if (words.length === 0) return local;
  return words.map((word) => word.charAt(0).toUpperCase() + word.slice(1)).join(' ');
}

export function splitName(name: string): { given: string; family: string } {
  const words = name.trim().split(/\s+/);
  return { given: words[0] ?? '', family: words.slice(1).join(' ') };
}

export function initialsOf(name: string): string {
  const { given, family } = splitName(name);
  const letters = [given, family.split(/\s+/).pop() ?? '']
    .map((word) => Array.from(word).find((char) => /\p{L}/u.test(char)) ?? '')
    .join('');
  return letters.toUpperCase() || '?';
}

/** Claims for the token and userinfo; `picture` points at this fake, never at another host. */
export function claimsFor(identity: OidcIdentity, baseUrl: string): UserinfoClaims {
  const { given, family } = splitName(identity.name);
  const picture = `${baseUrl}/avatar/${identity.sub}.svg?initials=${encodeURIComponent(initialsOf(identity.name))}`;
  return {
    sub: identity.sub,
    email: identity.email,
    email_verified: identity.emailVerified,
    name: identity.name,
    given_name: given,
    family_name: family,
    picture,
  };
}

// Background colours that all keep white initials above 4.5:1 contrast.
const AVATAR_COLOURS = ['#1f5f8b', '#6b3fa0', '#1d6b46', '#8a3b12', '#a1264b', '#3d4f5c'];

/** A round SVG avatar with the initials; the colour follows from the subject. */
export function avatarSvg(sub: string, initials: string): string {
  const colour = AVATAR_COLOURS[Number.parseInt(sub.slice(0, 4), 16) % AVATAR_COLOURS.length] ?? '#3d4f5c';
  return `<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" viewBox="0 0 96 96" role="img" aria-label="${escapeHtml(initials)}">
<circle cx="48" cy="48" r="48" fill="${colour}"/>
<text x="48" y="49" fill="#fff" font-family="system-ui, sans-serif" font-size="38" font-weight="600" text-anchor="middle" dominant-baseline="middle">${escapeHtml(initials)}</text>
</svg>`;
}
