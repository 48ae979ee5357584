import { ViewingResultDtoSchema, type ViewingBeacon, type ViewingReport, type ViewingResultDto } from '@core/contracts';
import { isApiError } from '@/lib/api-client';
import { serverClock } from '../server-clock';
import { assignmentApi } from './paths';
import { readBody } from '@/lib/api-client';
import { postWithToken } from './post-with-token';
import type { SessionToken } from './session-token';

/** Sends the intervals watched, with `keepalive` so a report made as the page goes away still arrives. */
export async function postViewing(assignmentId: string, report: ViewingReport, session: SessionToken): Promise<ViewingResultDto> {
  const url = assignmentApi(assignmentId, '/viewing');
  let response: Response;
  try {
    response = await postWithToken(url, report, session.current(), { keepalive: true });
  } catch (error) {
    // A refused token: the same student's session may have a new one; someone else's never gets this report.
    if (!(isApiError(error) && error.status === 403 && error.code === 'csrf_invalid')) throw error;
    const now = await session.check();
    if (now.kind !== 'signed-in' || now.userId !== session.userId) throw error;
    response = await postWithToken(url, report, session.current(), { keepalive: true });
  }
  const result = await readBody(response, ViewingResultDtoSchema);
  serverClock.observe(result.serverTime);
  return result;
}

/** Whether this browser's fetch can outlive the page (Request.keepalive). */
export function fetchKeepsAlive(): boolean {
  return typeof Request !== 'undefined' && 'keepalive' in Request.prototype;
}

/**
 * The last report as the page is hidden for good: a keepalive fetch where the browser has one,
 * else navigator.sendBeacon, which cannot set headers, so the token travels in its text/plain body.
 * Nobody waits for either reply.
 */
export function sendViewingOnHide(assignmentId: string, report: ViewingReport, session: SessionToken): void {
  const token = session.current();
  if (!token) return;
  const beacon = () => {
    if (typeof navigator.sendBeacon !== 'function') return;
    const body: ViewingBeacon = { ...report, csrfToken: token };
    navigator.sendBeacon(assignmentApi(assignmentId, '/viewing/beacon'), new Blob([JSON.stringify(body)], { type: 'text/plain' }));
  };
  if (!fetchKeepsAlive()) {
    beacon();
    return;
  }
  postWithToken(assignmentApi(assignmentId, '/viewing'), report, token, { keepalive: true }).catch((error: unknown) => {
    // Refused before it left (a keepalive quota), or no connection: the beacon is the last chance.
    if (!isApiError(error) || error.status === 0) beacon();
  });
}
