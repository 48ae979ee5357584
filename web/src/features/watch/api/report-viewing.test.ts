import { http, HttpResponse } from 'msw';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ViewingBeacon, ViewingReport } from '@core/contracts';
import { server } from '@/testing/mocks/server';
import { postViewing, sendViewingOnHide } from './report-viewing';
import { SessionToken, type SessionCheck } from './session-token';

const ID = '00000000-0000-4000-8000-00000000a551';
const USER = '00000000-0000-4000-8000-0000000000a1';
const report: ViewingReport = { intervals: [{ startMs: 0, endMs: 4000 }], positionMs: 4000 };
const reply = {
  completion: { watchedShare: 0.1, watchShareNeeded: 0.9, requiredAnswered: 0, requiredTotal: 0, done: false, completedAt: null },
  serverTime: '2026-12-01T10:00:00.000Z',
};

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

describe('viewing reports', () => {
  it('posts with keepalive and the CSRF header, and takes the same student’s fresh token once when it was refused', async () => {
    const seen: { token: string | null; keepalive: boolean }[] = [];
    server.use(
      http.post(`/api/student/assignments/${ID}/viewing`, ({ request }) => {
        seen.push({ token: request.headers.get('X-CSRF-Token'), keepalive: request.keepalive });
        if (request.headers.get('X-CSRF-Token') === 'old')
          return HttpResponse.json({ error: { code: 'csrf_invalid', message: 'The form expired.' } }, { status: 403 });
        return HttpResponse.json(reply);
      }),
    );
    const same: SessionCheck = { kind: 'signed-in', userId: USER, role: 'student', schoolId: USER, token: 'new' };
    const session = new SessionToken(USER, 'old', () => Promise.resolve(same));
    await expect(postViewing(ID, report, session)).resolves.toEqual(reply);
    expect(seen).toEqual([
      { token: 'old', keepalive: true },
      { token: 'new', keepalive: true },
    ]);
  });

  it('never hands the report to someone else’s session', async () => {
    server.use(
      http.post(`/api/student/assignments/${ID}/viewing`, () =>
        HttpResponse.json({ error: { code: 'csrf_invalid', message: 'The form expired.' } }, { status: 403 }),
      ),
    );
    const other: SessionCheck = { kind: 'signed-in', userId: ID, role: 'student', schoolId: USER, token: 'theirs' };
    const session = new SessionToken(USER, 'old', () => Promise.resolve(other));
    await expect(postViewing(ID, report, session)).rejects.toMatchObject({ status: 403 });
    expect(session.current()).toBe('old');
  });

  it('falls back to sendBeacon with the token in a text/plain body where fetch cannot outlive the page', async () => {
    // A Request without `keepalive`, as in browsers that lack it.
    vi.stubGlobal('Request', class {});
    const beacon = vi.fn<(url: string, data: Blob) => boolean>().mockReturnValue(true);
    Object.defineProperty(navigator, 'sendBeacon', { value: beacon, configurable: true });
    sendViewingOnHide(ID, report, new SessionToken(USER, 'token-1'));
    expect(beacon).toHaveBeenCalledTimes(1);
    const [url, blob] = beacon.mock.calls[0] ?? [];
    expect(url).toBe(`/api/student/assignments/${ID}/viewing/beacon`);
    expect(blob?.type).toBe('text/plain');
    const body = JSON.parse((await blob?.text()) ?? '') as ViewingBeacon;
    expect(body).toEqual({ ...report, csrfToken: 'token-1' });
  });

  it('uses a keepalive fetch on page hide where the browser has one', async () => {
    const beacon = vi.fn().mockReturnValue(true);
    Object.defineProperty(navigator, 'sendBeacon', { value: beacon, configurable: true });
    const sent = new Promise<{ token: string | null; keepalive: boolean }>((resolve) =>
      server.use(
        http.post(`/api/student/assignments/${ID}/viewing`, ({ request }) => {
          resolve({ token: request.headers.get('X-CSRF-Token'), keepalive: request.keepalive });
          return HttpResponse.json(reply);
        }),
      ),
    );
    sendViewingOnHide(ID, report, new SessionToken(USER, 'token-1'));
    await expect(sent).resolves.toEqual({ token: 'token-1', keepalive: true });
    expect(beacon).not.toHaveBeenCalled();
  });
});
