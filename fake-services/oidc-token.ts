import type { Request, Response } from 'express';
import type { ExpiringMap } from './expiring-map';
import type { OidcIdentity } from './oidc-identity';

/** What an authorization code stands for until the app redeems it at /token. */
export interface IssuedCode {
  identity: OidcIdentity;
  redirectUri: string;
  hasChallenge: boolean;
}

interface TokenGuardDeps {
  clientId: string;
  clientSecret: string;
  codes: ExpiringMap<string, IssuedCode>;
}

function oauthError(res: Response, status: number, error: string, description: string): undefined {
  res.status(status).set('Cache-Control', 'no-store').json({ error, error_description: description });
  return undefined;
}

function bodyField(req: Request, name: string): string | undefined {
  const body: unknown = req.body;
  if (typeof body !== 'object' || body === null) return undefined;
  const value = (body as Record<string, unknown>)[name];
  return typeof value === 'string' ? value : undefined;
}

/** Client credentials from HTTP Basic (RFC 6749 2.3.1: form-encoded inside) or from the form body. */
function clientCredentials(req: Request): { id?: string; secret?: string; basic: boolean; conflict: boolean } {
  const header = req.get('authorization');
  const bodySecret = bodyField(req, 'client_secret');
  if (header?.startsWith('Basic ')) {
    const decoded = Buffer.from(header.slice(6), 'base64').toString('utf8');
    const colon = decoded.indexOf(':');
    const unform = (part: string): string => decodeURIComponent(part.replace(/\+/g, ' '));
    try {
      const id = unform(colon < 0 ? decoded : decoded.slice(0, colon));
      const secret = colon < 0 ? undefined : unform(decoded.slice(colon + 1));
      return { id, secret, basic: true, conflict: bodySecret !== undefined };
    } catch {
      return { basic: true, conflict: false };
    }
  }
  return { id: bodyField(req, 'client_id'), secret: bodySecret, basic: false, conflict: false };
}

/**
 * Checks a token request before the mock signs anything: client secret, grant type, a code issued
 * by this picker, the same redirect_uri, and PKCE when the code was bound to a challenge.
 */
export function guardToken(req: Request, res: Response, deps: TokenGuardDeps): OidcIdentity | undefined {
  const client = clientCredentials(req);
  if (client.conflict)
    return oauthError(res, 400, 'invalid_request', 'Send the client secret once: either HTTP Basic or client_secret in the body.');
  if (!client.id || client.secret === undefined) {
    return oauthError(
      res,
      401,
      'invalid_client',
      'Client authentication is missing: send client_id and client_secret (form body or HTTP Basic).',
    );
  }
  if (client.id !== deps.clientId) return oauthError(res, 401, 'invalid_client', `Unknown client_id "${client.id}".`);
  if (client.secret !== deps.clientSecret) return oauthError(res, 401, 'invalid_client', 'The client secret is wrong.');

  const grantType = bodyField(req, 'grant_type');
  if (grantType !== 'authorization_code') {
    return oauthError(res, 400, 'unsupported_grant_type', `Only grant_type "authorization_code" is supported (got "${grantType ?? ''}").`);
  }
  const code = bodyField(req, 'code');
  if (!code) return oauthError(res, 400, 'invalid_request', 'The token request has no code.');
  const issued = deps.codes.take(code);
  if (!issued) return oauthError(res, 400, 'invalid_grant', 'The code is unknown, expired or already used.');

  const redirectUri = bodyField(req, 'redirect_uri');
  if (!redirectUri)
    return oauthError(res, 400, 'invalid_request', 'The token request has no redirect_uri; send the one used at /authorize.');
  if (redirectUri !== issued.redirectUri) {
    return oauthError(res, 400, 'invalid_grant', 'redirect_uri does not match the one used at /authorize.');
  }
  const verifier = bodyField(req, 'code_verifier');
  if (issued.hasChallenge && !verifier) {
    return oauthError(res, 400, 'invalid_grant', 'This code was requested with a code_challenge: send its code_verifier.');
  }
  if (!issued.hasChallenge && verifier !== undefined) {
    return oauthError(res, 400, 'invalid_request', 'A code_verifier was sent, but the authorization request had no code_challenge.');
  }
  return issued.identity;
}

/** Finds the identity behind an access token sent as ?access_token= (as the Google strategy does) or as a Bearer header. */
export function guardUserinfo(req: Request, res: Response, tokens: ExpiringMap<string, OidcIdentity>): OidcIdentity | undefined {
  const fromQuery = req.query['access_token'];
  const header = req.get('authorization');
  const fromHeader = header?.startsWith('Bearer ') ? header.slice(7).trim() : undefined;
  res.set('WWW-Authenticate', 'Bearer realm="local-sign-in-stand-in"');
  if (fromQuery !== undefined && fromHeader !== undefined) {
    return oauthError(res, 400, 'invalid_request', 'Send the access token once: either ?access_token= or an Authorization: Bearer header.');
  }
  const token = fromHeader ?? fromQuery;
  if (token === undefined || token === '') {
    return oauthError(res, 401, 'invalid_request', 'No access token: send it as ?access_token= or an Authorization: Bearer header.');
  }
  if (typeof token !== 'string') return oauthError(res, 400, 'invalid_request', 'access_token was given more than once.');
  const identity = tokens.get(token);
  if (!identity) return oauthError(res, 401, 'invalid_token', 'The access token is unknown or has expired.');
  res.removeHeader('WWW-Authenticate');
  return identity;
}
