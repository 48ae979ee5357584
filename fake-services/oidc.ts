import { randomUUID } from 'node:crypto';
import { createServer } from 'node:http';
import type { IncomingMessage } from 'node:http';
import express from 'express';
import type { NextFunction, Request, Response } from 'express';
import { OAuth2Issuer, OAuth2Service } from 'oauth2-mock-server';
import type { MutableRedirectUri, MutableResponse, MutableToken } from 'oauth2-mock-server';
import { ExpiringMap } from './expiring-map';
import { sendPage } from './html';
import type { AuthorizeParams } from './oidc-authorize';
import { checkAuthorizeRequest, paramsToSearch } from './oidc-authorize';
import { resolveChoice } from './oidc-choice';
import type { OidcAccount, OidcIdentity } from './oidc-identity';
import { avatarSvg, claimsFor, SUB_PATTERN } from './oidc-identity';
import { renderPicker, renderProblem } from './oidc-picker-page';
import { guardToken, guardUserinfo } from './oidc-token';
import type { IssuedCode } from './oidc-token';
import type { RunningFake } from './server-lifecycle';
import { closeHttpServer, httpUrl, listenOn } from './server-lifecycle';

export type { OidcAccount } from './oidc-identity';

export interface OidcFakeOptions {
  port: number;
  host?: string;
  clientId: string;
  clientSecret: string;
  accounts: OidcAccount[];
}

interface Ticket {
  params: AuthorizeParams;
  identity: OidcIdentity;
}

const PAGE_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src 'self' data:; base-uri 'none'; frame-ancestors 'none'";
const FIVE_MINUTES = 5 * 60 * 1000;

function asRecord(value: unknown): Record<string, unknown> {
  return typeof value === 'object' && value !== null ? (value as Record<string, unknown>) : {};
}

/**
 * Starts the OpenID Connect stand-in: an account picker at /authorize in front of
 * oauth2-mock-server, whose hooks carry the chosen person into the code, tokens and userinfo.
 */
export async function startOidcFake(options: OidcFakeOptions): Promise<RunningFake> {
  const host = options.host ?? '127.0.0.1';
  const { clientId, clientSecret, accounts } = options;
  if (!clientId) throw new Error('OIDC fake needs a clientId.');
  if (!clientSecret) throw new Error('OIDC fake needs a clientSecret.');

  const issuer = new OAuth2Issuer();
  await issuer.keys.generate('RS256');
  const service = new OAuth2Service(issuer);

  const tickets = new ExpiringMap<string, Ticket>(FIVE_MINUTES);
  const codes = new ExpiringMap<string, IssuedCode>(FIVE_MINUTES);
  const accessTokens = new ExpiringMap<string, OidcIdentity>(60 * 60 * 1000);
  // Requests let through to the mock, with who they are for: read back in its hooks.
  const approved = new WeakMap<IncomingMessage, Ticket>();
  const tokenRequests = new WeakMap<IncomingMessage, OidcIdentity>();
  const userinfoRequests = new WeakMap<IncomingMessage, OidcIdentity>();
  let baseUrl = '';

  service.on('beforeAuthorizeRedirect', (redirect: MutableRedirectUri, req: IncomingMessage) => {
    const ticket = approved.get(req);
    const code = redirect.url.searchParams.get('code');
    if (!ticket || !code) return;
    codes.set(code, {
      identity: ticket.identity,
      redirectUri: ticket.params.redirect_uri,
      hasChallenge: ticket.params.code_challenge !== undefined,
    });
  });
  service.on('beforeTokenSigning', (token: MutableToken, req: IncomingMessage) => {
    const identity = tokenRequests.get(req);
    if (identity) Object.assign(token.payload, claimsFor(identity, baseUrl));
  });
  service.on('beforeResponse', (response: MutableResponse, req: IncomingMessage) => {
    const identity = tokenRequests.get(req);
    if (!identity || response.body === '') return;
    const accessToken = response.body['access_token'];
    if (typeof accessToken === 'string') accessTokens.set(accessToken, identity);
    // Refresh is not offered (only authorization_code), so do not hand out a token for it.
    delete response.body['refresh_token'];
  });
  service.on('beforeUserinfo', (response: MutableResponse, req: IncomingMessage) => {
    const identity = userinfoRequests.get(req);
    if (identity) response.body = { ...claimsFor(identity, baseUrl) };
  });

  const app = express();
  app.disable('x-powered-by');

  const answerCheck = (res: Response, check: ReturnType<typeof checkAuthorizeRequest>): AuthorizeParams | undefined => {
    if (check.ok) return check.params;
    if ('show' in check) sendPage(res, 400, renderProblem(check.show), PAGE_CSP);
    else res.redirect(302, check.redirect);
    return undefined;
  };

  app.get('/authorize', (req: Request, res: Response, next: NextFunction) => {
    const query = asRecord(req.query);
    const params = answerCheck(res, checkAuthorizeRequest(query, clientId));
    if (!params) return;
    if (query['ticket'] === undefined) {
      sendPage(res, 200, renderPicker({ params, accounts }), PAGE_CSP);
      return;
    }
    // Second leg: the person has chosen; the mock now issues the code and redirects.
    const ticket = typeof query['ticket'] === 'string' ? tickets.take(query['ticket']) : undefined;
    if (!ticket) {
      sendPage(res, 400, renderProblem('This sign-in choice has expired or was already used.'), PAGE_CSP);
      return;
    }
    if (paramsToSearch(ticket.params).toString() !== paramsToSearch(params).toString()) {
      sendPage(res, 400, renderProblem('The sign-in request was changed after the account was chosen.'), PAGE_CSP);
      return;
    }
    approved.set(req, ticket);
    next();
  });

  app.post('/authorize', express.urlencoded({ extended: false, limit: '16kb' }), (req: Request, res: Response) => {
    const body = asRecord(req.body);
    const params = answerCheck(res, checkAuthorizeRequest(body, clientId));
    if (!params) return;
    const choice = resolveChoice(body, accounts);
    if ('error' in choice) {
      sendPage(res, 400, renderPicker({ params, accounts, error: choice.error, typed: choice.typed }), PAGE_CSP);
      return;
    }
    const ticketId = randomUUID();
    tickets.set(ticketId, { params, identity: choice.identity });
    const search = paramsToSearch(params);
    search.set('ticket', ticketId);
    res.redirect(303, `/authorize?${search.toString()}`);
  });

  app.post('/token', express.urlencoded({ extended: false, limit: '16kb' }), (req: Request, res: Response, next: NextFunction) => {
    const identity = guardToken(req, res, { clientId, clientSecret, codes });
    if (!identity) return;
    tokenRequests.set(req, identity);
    next();
  });

  app.get('/userinfo', (req: Request, res: Response, next: NextFunction) => {
    const identity = guardUserinfo(req, res, accessTokens);
    if (!identity) return;
    userinfoRequests.set(req, identity);
    next();
  });

  app.get('/.well-known/openid-configuration', (_req: Request, res: Response, next: NextFunction) => {
    // The mock advertises what it can do alone; state what this stand-in actually accepts.
    const send = res.json.bind(res);
    res.json = (body: unknown) =>
      send({
        ...asRecord(body),
        token_endpoint_auth_methods_supported: ['client_secret_post', 'client_secret_basic'],
        grant_types_supported: ['authorization_code'],
        scopes_supported: ['openid', 'email', 'profile'],
      });
    next();
  });

  app.get('/avatar/:file', (req: Request, res: Response) => {
    const sub = /^(.+)\.svg$/.exec(String(req.params['file']))?.[1] ?? '';
    const initials = typeof req.query['initials'] === 'string' ? req.query['initials'] : '';
    if (!SUB_PATTERN.test(sub) || !/^(\p{L}{1,2}|\?)$/u.test(initials)) {
      res.status(400).type('text/plain').send('Avatar URLs look like /avatar/<24 hex digits>.svg?initials=<1 or 2 letters>.');
      return;
    }
    res.set({ 'Content-Security-Policy': "default-src 'none'; style-src 'unsafe-inline'", 'Cache-Control': 'public, max-age=86400' });
    res.type('image/svg+xml').send(avatarSvg(sub, initials));
  });

  // Browsers ask for one; answer without a 404 in their console.
  app.get('/favicon.ico', (_req: Request, res: Response) => {
    res.status(204).end();
  });
  app.use(service.requestHandler);
  app.use((error: unknown, _req: Request, res: Response, _next: NextFunction) => {
    console.error('[oidc fake] request failed:', error);
    res.status(500).json({ error: 'server_error', error_description: 'The sign-in stand-in failed; see its log.' });
  });

  const server = createServer(app);
  const port = await listenOn(server, options.port, host, 'OIDC fake');
  baseUrl = httpUrl(host, port);
  issuer.url = baseUrl;
  return { url: baseUrl, close: () => closeHttpServer(server) };
}
