/** Authorization request parameters the picker carries from GET /authorize to the mock's authorize step. */
export const CARRIED_PARAMS = [
  'client_id',
  'redirect_uri',
  'response_type',
  'scope',
  'state',
  'nonce',
  'code_challenge',
  'code_challenge_method',
  'login_hint',
] as const;

export type CarriedParam = (typeof CARRIED_PARAMS)[number];
export type AuthorizeParams = Partial<Record<CarriedParam, string>> & { client_id: string; redirect_uri: string };

/**
 * Outcome of checking an authorization request: usable params, an error to show on the page
 * (client or redirect URI not trustworthy, RFC 6749 4.1.2.1), or an error to send back to the client.
 */
export type AuthorizeCheck = { ok: true; params: AuthorizeParams } | { ok: false; show: string } | { ok: false; redirect: string };

/** Validates an authorization request read from a query string or a submitted form. */
export function checkAuthorizeRequest(source: Record<string, unknown>, expectedClientId: string): AuthorizeCheck {
  const params: Partial<Record<CarriedParam, string>> = {};
  for (const name of CARRIED_PARAMS) {
    const value = source[name];
    if (value === undefined || value === '') continue;
    if (typeof value !== 'string') return { ok: false, show: `The parameter ${name} was given more than once; send it once.` };
    params[name] = value;
  }

  const clientId = params.client_id;
  if (!clientId) return { ok: false, show: 'The sign-in request has no client_id, so it cannot say which app is asking.' };
  if (clientId !== expectedClientId) {
    return { ok: false, show: `Unknown client_id "${clientId}". This stand-in is set up for the client "${expectedClientId}".` };
  }
  const redirectUri = params.redirect_uri;
  if (!redirectUri) return { ok: false, show: 'The sign-in request has no redirect_uri, so there is nowhere to send the answer.' };
  const target = parseHttpUrl(redirectUri);
  if (!target) return { ok: false, show: `The redirect_uri "${redirectUri}" is not an absolute http(s) URL.` };
  if (target.hash) return { ok: false, show: `The redirect_uri "${redirectUri}" must not contain a fragment (#...).` };

  const checked: AuthorizeParams = { ...params, client_id: clientId, redirect_uri: redirectUri };
  const problem = responseProblem(checked);
  if (problem) return { ok: false, redirect: errorRedirect(checked, problem.error, problem.description) };
  return { ok: true, params: checked };
}

function responseProblem(params: AuthorizeParams): { error: string; description: string } | undefined {
  if (params.response_type !== 'code') {
    return {
      error: 'unsupported_response_type',
      description: `response_type must be "code" (got "${params.response_type ?? ''}").`,
    };
  }
  const method = params.code_challenge_method;
  if (method !== undefined && !params.code_challenge) {
    return { error: 'invalid_request', description: 'code_challenge_method was sent without a code_challenge.' };
  }
  if (method !== undefined && method !== 'S256' && method !== 'plain') {
    return { error: 'invalid_request', description: `code_challenge_method must be "S256" or "plain" (got "${method}").` };
  }
  if (params.code_challenge !== undefined && !/^[A-Za-z0-9\-._~]{43,128}$/.test(params.code_challenge)) {
    return { error: 'invalid_request', description: 'code_challenge must be 43 to 128 characters of A-Z, a-z, 0-9, "-", ".", "_" or "~".' };
  }
  return undefined;
}

function parseHttpUrl(value: string): URL | undefined {
  try {
    const url = new URL(value);
    return url.protocol === 'http:' || url.protocol === 'https:' ? url : undefined;
  } catch {
    return undefined;
  }
}

/** The client's redirect_uri with an OAuth error and the original state. */
export function errorRedirect(params: AuthorizeParams, error: string, description: string): string {
  const url = new URL(params.redirect_uri);
  url.searchParams.set('error', error);
  url.searchParams.set('error_description', description);
  if (params.state !== undefined) url.searchParams.set('state', params.state);
  return url.href;
}

/** Params in a fixed order, so a form round trip can be compared exactly. */
export function paramsToSearch(params: AuthorizeParams): URLSearchParams {
  const search = new URLSearchParams();
  for (const name of CARRIED_PARAMS) {
    const value = params[name];
    if (value !== undefined) search.set(name, value);
  }
  return search;
}
