import { createHash, createHmac, timingSafeEqual } from 'node:crypto';
import type { IncomingHttpHeaders } from 'node:http';
import S3Error from 's3rver/lib/models/error.js';

/**
 * AWS Signature Version 4 checks for the S3 fake. s3rver 3.7.1 verifies only V2 signatures: for V4 it
 * looks up the access key and the expiry but never the signature, so a presigned part URL would take
 * a body of any length. These checks recompute the signature as S3 does (header and query auth).
 * Spec: https://docs.aws.amazon.com/AmazonS3/latest/API/sig-v4-authenticating-requests.html
 */

export interface SignableRequest {
  method: string;
  /** The path exactly as sent (still percent-encoded), without the query. */
  path: string;
  /** The raw query string, without `?`. */
  rawQuery: string;
  /** Lower-case names, as Node gives them. */
  headers: IncomingHttpHeaders;
}

/** How a request authenticates: V4 requests are checked here, V2 ones are left to s3rver. */
export type AuthKind = 'anonymous' | 'v2' | 'v4';

const ALGORITHM = 'AWS4-HMAC-SHA256';
const MAX_SKEW_MS = 15 * 60 * 1000;
const MAX_PRESIGNED_SECONDS = 7 * 24 * 3600;

/** `+` is a space, as Koa (and so s3rver) reads a query; a malformed escape is the client's error. */
function decodeQueryPart(value: string): string {
  try {
    return decodeURIComponent(value.replace(/\+/g, ' '));
  } catch {
    throw new S3Error('InvalidURI', "Couldn't parse the specified URI.");
  }
}

/** Query pairs in order, decoded; a name without `=` has the value ''. */
export function parseQuery(rawQuery: string): [string, string][] {
  return rawQuery
    .split('&')
    .filter((pair) => pair !== '')
    .map((pair) => {
      const at = pair.indexOf('=');
      return at < 0 ? [decodeQueryPart(pair), ''] : [decodeQueryPart(pair.slice(0, at)), decodeQueryPart(pair.slice(at + 1))];
    });
}

/** RFC 3986 encoding, as SigV4 canonicalises names and values. */
function escapeUri(value: string): string {
  return encodeURIComponent(value).replace(/[!'()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
}

function canonicalQuery(pairs: [string, string][]): string {
  return pairs
    .filter(([name]) => name !== 'X-Amz-Signature')
    .map(([name, value]) => [escapeUri(name), escapeUri(value)] as const)
    .sort(([a, x], [b, y]) => (a === b ? (x < y ? -1 : x > y ? 1 : 0) : a < b ? -1 : 1))
    .map(([name, value]) => `${name}=${value}`)
    .join('&');
}

function headerValue(headers: IncomingHttpHeaders, name: string): string {
  const raw = headers[name];
  const value = Array.isArray(raw) ? raw.join(',') : (raw ?? '');
  return value.replace(/[ \t]+/g, ' ').trim();
}

function sha256Hex(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

function hmac(key: string | Buffer, data: string): Buffer {
  return createHmac('sha256', key).update(data, 'utf8').digest();
}

interface SignatureInput {
  request: SignableRequest;
  pairs: [string, string][];
  signedHeaders: string[];
  payloadHash: string;
  amzDate: string;
  scope: string[];
  secret: string;
}

/** The canonical request and the signature S3 would expect for it. */
export function expectedSignature(input: SignatureInput): { canonicalRequest: string; stringToSign: string; signature: string } {
  const { request, signedHeaders } = input;
  const canonicalRequest = [
    request.method,
    request.path,
    canonicalQuery(input.pairs),
    ...signedHeaders.map((name) => `${name}:${headerValue(request.headers, name)}`),
    '',
    signedHeaders.join(';'),
    input.payloadHash,
  ].join('\n');
  const stringToSign = [ALGORITHM, input.amzDate, input.scope.join('/'), sha256Hex(canonicalRequest)].join('\n');
  let key: string | Buffer = `AWS4${input.secret}`;
  for (const part of input.scope) key = hmac(key, part);
  return { canonicalRequest, stringToSign, signature: createHmac('sha256', key).update(stringToSign, 'utf8').digest('hex') };
}

/** `20130524T000000Z` -> Date, or null when it is not in that form. */
export function parseAmzDate(value: string | undefined): Date | null {
  const match = /^(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})Z$/.exec(value ?? '');
  if (!match) return null;
  const [, y, mo, d, h, mi, s] = match.map(Number) as [number, number, number, number, number, number, number];
  const date = new Date(Date.UTC(y, mo - 1, d, h, mi, s));
  return Number.isNaN(date.getTime()) ? null : date;
}

interface Credential {
  accessKeyId: string;
  scope: string[];
}

function parseCredential(value: string, amzDate: string, malformed: (message: string) => S3Error): Credential {
  const parts = value.split('/');
  if (parts.length !== 5 || parts.some((part) => part === '')) {
    throw malformed(`The credential "${value}" is malformed: expected <access key>/<yyyymmdd>/<region>/s3/aws4_request.`);
  }
  const [accessKeyId, day, region, service, terminator] = parts as [string, string, string, string, string];
  if (day !== amzDate.slice(0, 8))
    throw malformed(`The credential date "${day}" does not match the request date "${amzDate.slice(0, 8)}".`);
  if (service !== 's3') throw malformed(`The credential names the service "${service}"; this is s3.`);
  if (terminator !== 'aws4_request') throw malformed(`The credential must end in aws4_request, not "${terminator}".`);
  return { accessKeyId, scope: [day, region, service, terminator] };
}

function secretFor(accessKeyId: string, secrets: ReadonlyMap<string, string>): string {
  const secret = secrets.get(accessKeyId);
  if (secret === undefined) {
    throw new S3Error('InvalidAccessKeyId', 'The AWS Access Key Id you provided does not exist in our records.', {
      AWSAccessKeyId: accessKeyId,
    });
  }
  return secret;
}

function compare(input: SignatureInput, provided: string, accessKeyId: string): void {
  const expected = expectedSignature(input);
  const a = Buffer.from(expected.signature);
  const b = Buffer.from(provided);
  if (a.length === b.length && timingSafeEqual(a, b)) return;
  throw new S3Error(
    'SignatureDoesNotMatch',
    'The request signature we calculated does not match the signature you provided. Check your key and signing method.',
    { AWSAccessKeyId: accessKeyId, StringToSign: expected.stringToSign, CanonicalRequest: expected.canonicalRequest },
  );
}

function signedHeaderList(value: string, malformed: (message: string) => S3Error): string[] {
  const names = value.split(';');
  if (!names.includes('host')) throw malformed('SignedHeaders must include host.');
  return names;
}

function checkHeaderAuth(request: SignableRequest, secrets: ReadonlyMap<string, string>, now: Date): void {
  const malformed = (message: string): S3Error => new S3Error('AuthorizationHeaderMalformed', message);
  const header = headerValue(request.headers, 'authorization');
  const fields = new Map(
    header
      .slice(ALGORITHM.length)
      .split(',')
      .map((field) => field.trim())
      .map((field) => [field.slice(0, field.indexOf('=')), field.slice(field.indexOf('=') + 1)] as const),
  );
  const credential = fields.get('Credential');
  const signedHeaders = fields.get('SignedHeaders');
  const signature = fields.get('Signature');
  if (!credential || !signedHeaders || !signature) {
    throw malformed('The authorization header is malformed; it requires Credential, SignedHeaders and Signature.');
  }
  const payloadHash = headerValue(request.headers, 'x-amz-content-sha256');
  if (!payloadHash) throw new S3Error('InvalidRequest', 'Missing required header for this request: x-amz-content-sha256');
  const amzDate = headerValue(request.headers, 'x-amz-date');
  const date = parseAmzDate(amzDate);
  if (!date) throw new S3Error('AccessDenied', 'AWS authentication requires a valid Date or x-amz-date header');
  if (Math.abs(now.getTime() - date.getTime()) > MAX_SKEW_MS) {
    throw new S3Error('RequestTimeTooSkewed', 'The difference between the request time and the current time is too large.', {
      RequestTime: amzDate,
      ServerTime: now.toISOString(),
    });
  }
  const { accessKeyId, scope } = parseCredential(credential, amzDate, malformed);
  const secret = secretFor(accessKeyId, secrets);
  const input = {
    request,
    pairs: parseQuery(request.rawQuery),
    signedHeaders: signedHeaderList(signedHeaders, malformed),
    payloadHash,
    amzDate,
    scope,
    secret,
  };
  compare(input, signature, accessKeyId);
}

function checkQueryAuth(request: SignableRequest, pairs: [string, string][], secrets: ReadonlyMap<string, string>, now: Date): void {
  const malformed = (message: string): S3Error => new S3Error('AuthorizationQueryParametersError', message);
  const param = (name: string): string | undefined => pairs.find(([key]) => key === name)?.[1];
  if (param('X-Amz-Algorithm') !== ALGORITHM) throw malformed(`X-Amz-Algorithm only supports "${ALGORITHM}"`);
  const [credential, amzDate, signedHeaders, expiresText, signature] = [
    'X-Amz-Credential',
    'X-Amz-Date',
    'X-Amz-SignedHeaders',
    'X-Amz-Expires',
    'X-Amz-Signature',
  ].map(param);
  if (!credential || !amzDate || !signedHeaders || !expiresText || !signature) {
    throw malformed(
      'Query-string authentication version 4 requires the X-Amz-Algorithm, X-Amz-Credential, X-Amz-Signature, X-Amz-Date, X-Amz-SignedHeaders, and X-Amz-Expires parameters.',
    );
  }
  const date = parseAmzDate(amzDate);
  if (!date) throw malformed("X-Amz-Date must be in the ISO8601 Long Format \"yyyyMMdd'T'HHmmss'Z'\"");
  const expires = /^\d+$/.test(expiresText) ? Number(expiresText) : NaN;
  if (!Number.isInteger(expires)) throw malformed('X-Amz-Expires should be a number');
  if (expires > MAX_PRESIGNED_SECONDS) {
    throw malformed(
      'X-Amz-Expires must be less than a week (in seconds); that is, the given X-Amz-Expires must be less than 604800 seconds',
    );
  }
  const expiresAt = new Date(date.getTime() + expires * 1000);
  if (now > expiresAt) {
    throw new S3Error('AccessDenied', 'Request has expired', {
      'X-Amz-Expires': expiresText,
      Expires: expiresAt.toISOString(),
      ServerTime: now.toISOString(),
    });
  }
  const { accessKeyId, scope } = parseCredential(credential, amzDate, malformed);
  const secret = secretFor(accessKeyId, secrets);
  // A presigned URL never signs its body: S3 takes the literal UNSIGNED-PAYLOAD as the payload hash.
  const input = {
    request,
    pairs,
    signedHeaders: signedHeaderList(signedHeaders, malformed),
    payloadHash: 'UNSIGNED-PAYLOAD',
    amzDate,
    scope,
    secret,
  };
  compare(input, signature, accessKeyId);
}

/**
 * Checks a request's SigV4 authentication (header or presigned query) and throws the S3 error a real
 * bucket would answer with. Anonymous and V2-signed requests are returned as such, unchecked.
 * Payload hashes are not checked against the body (s3rver does not either).
 */
export function checkSignature(request: SignableRequest, secrets: ReadonlyMap<string, string>, now: Date): AuthKind {
  const pairs = parseQuery(request.rawQuery);
  const names = new Set(pairs.map(([name]) => name));
  const authorization = headerValue(request.headers, 'authorization');
  const viaHeader = authorization !== '';
  const viaQueryV4 = names.has('X-Amz-Algorithm');
  const viaQueryV2 = names.has('Signature');
  if (Number(viaHeader) + Number(viaQueryV4) + Number(viaQueryV2) > 1) {
    throw new S3Error(
      'InvalidArgument',
      'Only one auth mechanism allowed; only the X-Amz-Algorithm query parameter, Signature query string parameter or the Authorization header should be specified',
      { ArgumentName: 'Authorization', ArgumentValue: authorization },
    );
  }
  if (viaQueryV4) {
    checkQueryAuth(request, pairs, secrets, now);
    return 'v4';
  }
  if (viaHeader && authorization.startsWith(`${ALGORITHM} `)) {
    checkHeaderAuth(request, secrets, now);
    return 'v4';
  }
  return viaHeader || viaQueryV2 ? 'v2' : 'anonymous';
}
