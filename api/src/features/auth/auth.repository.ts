import type { Db } from '../../db/knex';

export interface TokenRow {
  id: string;
  purpose: 'sign_in' | 'join';
  email: string;
  name: string | null;
  userId: string | null;
  classId: string | null;
}

export async function findUserIdByEmail(db: Db, email: string): Promise<string | undefined> {
  const row = await db('users').select('id').where({ email }).first<{ id: string } | undefined>();
  return row?.id;
}

export async function hasMembership(db: Db, userId: string): Promise<boolean> {
  return Boolean(await db('memberships').where({ user_id: userId }).first('id'));
}

export async function findIdentityUser(db: Db, provider: string, subject: string): Promise<string | undefined> {
  const row = await db('identities').select('user_id').where({ provider, subject }).first<{ user_id: string } | undefined>();
  return row?.user_id;
}

export async function insertIdentity(
  db: Db,
  identity: { userId: string; provider: string; subject: string; email: string },
): Promise<void> {
  await db('identities').insert({
    user_id: identity.userId,
    provider: identity.provider,
    subject: identity.subject,
    email: identity.email,
  });
}

export async function insertToken(
  db: Db,
  token: {
    tokenHash: string;
    purpose: TokenRow['purpose'];
    email: string;
    name?: string;
    userId?: string;
    classId?: string;
    expiresAt: Date;
  },
): Promise<void> {
  await db('sign_in_tokens').insert({
    token_hash: token.tokenHash,
    purpose: token.purpose,
    email: token.email,
    name: token.name ?? null,
    user_id: token.userId ?? null,
    class_id: token.classId ?? null,
    expires_at: token.expiresAt,
  });
}

/** Marks an unused, unexpired token as used and returns it; one statement, so two clicks cannot both win. */
export async function claimToken(db: Db, tokenHash: string): Promise<TokenRow | undefined> {
  const [row] = await db('sign_in_tokens')
    .where({ token_hash: tokenHash })
    .whereNull('used_at')
    .where('expires_at', '>', db.fn.now())
    .update({ used_at: db.fn.now() })
    .returning(['id', 'purpose', 'email', 'name', 'user_id as userId', 'class_id as classId']);
  return row as TokenRow | undefined;
}

/** First sign-in turns invitations into active memberships. */
export async function activateMemberships(db: Db, userId: string): Promise<void> {
  await db('memberships').where({ user_id: userId, status: 'invited' }).update({ status: 'active', updated_at: db.fn.now() });
  await db('invitations').where({ user_id: userId }).whereNull('accepted_at').update({ accepted_at: db.fn.now() });
}

export async function touchSignIn(db: Db, userId: string): Promise<void> {
  await db('users').where({ id: userId }).update({ last_sign_in_at: db.fn.now() });
}
