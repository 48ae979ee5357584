import 'fake-indexeddb/auto';
import { onlineManager } from '@tanstack/react-query';
import { act, screen, waitFor, within } from '@testing-library/react';
import { IDBFactory } from 'fake-indexeddb';
import { http, HttpResponse } from 'msw';
import { useEffect } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { ResponseSubmit, ViewingReport } from '@core/contracts';
import { paths } from '@/config/paths';
import { FakeVideoPlayer } from '@/features/player/fake-video-player';
import { mcAt, noteAt } from '@/features/player/logic/test-view';
import { gradeOf } from '@/features/player/player-test-support';
import type { VideoPlayerProps } from '@/features/player/video-player';
import { closeOutboxes } from '@/features/watch/outbox/outbox-registry';
import { indexedDbOutboxStore } from '@/features/watch/outbox/outbox-store';
import { buildMe, SCHOOL_ID } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { ASSIGNMENT_ID, completionOf, resultOf, watchViewOf } from './watch-test-support';

let fake: FakeVideoPlayer;

vi.mock('@/features/player/video-player', () => ({
  VideoPlayer: ({ onReady }: VideoPlayerProps) => {
    useEffect(() => onReady?.(fake.asPlayer()), [onReady]);
    return <div data-testid="video" />;
  },
}));

const base = `/api/student/assignments/${ASSIGNMENT_ID}`;
const me = buildMe(['student']);

/** A small fake of the server: the completion it reports follows the answers it recorded. */
let recorded = 0;
const completionNow = (watchedShare = 0) => completionOf({ watchedShare, requiredAnswered: Math.min(1, recorded) });

function serve(view = watchViewOf(), serverAheadMs = 0) {
  signInAs(me);
  const acks: number[] = [];
  const viewing: { body: ViewingReport; token: string | null; keepalive: boolean }[] = [];
  server.use(
    http.get(`${base}/watch`, () => HttpResponse.json(view)),
    http.post(`${base}/safety`, () => {
      acks.push(Date.now());
      return new HttpResponse(null, { status: 204 });
    }),
    http.post(`${base}/viewing`, async ({ request }) => {
      viewing.push({
        body: (await request.json()) as ViewingReport,
        token: request.headers.get('X-CSRF-Token'),
        keepalive: request.keepalive,
      });
      return HttpResponse.json({ completion: completionNow(0.25), serverTime: new Date(Date.now() + serverAheadMs).toISOString() });
    }),
  );
  return { acks, viewing };
}

/** Answers to POST …/responses: `reply` decides per request; every body is kept. */
function answersEndpoint(reply: (body: ResponseSubmit, n: number) => Response) {
  const bodies: ResponseSubmit[] = [];
  const tokens: (string | null)[] = [];
  server.use(
    http.post(`${base}/responses`, async ({ request }) => {
      const body = (await request.json()) as ResponseSubmit;
      bodies.push(body);
      tokens.push(request.headers.get('X-CSRF-Token'));
      const response = reply(body, bodies.length);
      if (response.ok) recorded += 1;
      return response;
    }),
  );
  return { bodies, tokens };
}

const playerReady = () => waitFor(() => expect(document.querySelector('[data-lesson-player][data-ready="true"]')).not.toBeNull());

async function answerGate(user: ReturnType<typeof renderApp>['user']) {
  await playerReady();
  act(() => void fake.play());
  act(() => fake.playTo(5100));
  const dialog = await screen.findByRole('dialog');
  await user.click(within(dialog).getByRole('radio', { name: 'Away from the coil' }));
  await user.click(within(dialog).getByRole('button', { name: 'Check my answer' }));
  return dialog;
}

function setOnline(online: boolean) {
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(online);
  act(() => void window.dispatchEvent(new Event(online ? 'online' : 'offline')));
}

beforeEach(() => {
  fake = new FakeVideoPlayer();
  globalThis.indexedDB = new IDBFactory();
  recorded = 0;
});
afterEach(() => {
  closeOutboxes();
  vi.restoreAllMocks();
  // TanStack Query follows the browser's online events: leave it online for the next test.
  onlineManager.setOnline(true);
});

describe('watch page', { timeout: 30_000 }, () => {
  it('shows the assignment in school time, the safety notes first, and records the acknowledgement once', async () => {
    const { acks } = serve(
      watchViewOf([mcAt('gate01', 5000, 'gate')], { safetyNotes: 'Keep the cell **disconnected** while you rewire.' }),
    );
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    // The first test loads the lazy route chunk: give it longer on a busy machine.
    expect(await screen.findByRole('heading', { name: 'Coil and compass (demo)', level: 1 }, { timeout: 15_000 })).toBeInTheDocument();
    expect(screen.getByText('Year 10 Physics (test)')).toBeInTheDocument();
    // 17:00 UTC on 3 Dec 2026 is 17:00 GMT in London.
    expect(screen.getByText('Thu 3 Dec, 17:00 (GMT, school time)')).toBeInTheDocument();
    expect(screen.getByText('In progress')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Your results for this lesson' })).toHaveAttribute(
      'href',
      paths.student.results(ASSIGNMENT_ID),
    );
    expect(await screen.findByText(/Your school’s own safety rules and local regulations come first/)).toBeInTheDocument();
    await playerReady();
    act(() => void fake.play());
    expect(fake.isPaused).toBe(true);
    await user.click(screen.getByRole('button', { name: 'I have read the safety notes' }));
    await waitFor(() => expect(acks).toHaveLength(1));
    act(() => void fake.play());
    expect(fake.isPaused).toBe(false);
  });

  it('sends an answer with a fresh key on the server’s clock, shows its grade and the completion, and says "Saved"', async () => {
    const serverAhead = 60 * 60 * 1000;
    serve(watchViewOf(undefined, { serverTime: new Date(Date.now() + serverAhead).toISOString() }), serverAhead);
    const { bodies, tokens } = answersEndpoint(() =>
      HttpResponse.json(resultOf({ serverTime: new Date(Date.now() + serverAhead).toISOString() }), { status: 201 }),
    );
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    const before = Date.now();
    const dialog = await answerGate(user);
    expect(await within(dialog).findByText('Not right yet')).toBeInTheDocument();
    expect(within(dialog).getByText('Use the right-hand rule.')).toBeInTheDocument();
    expect(bodies).toHaveLength(1);
    const [body] = bodies;
    expect(body).toMatchObject({ checkpointKey: 'gate01', answer: { kind: 'multiple-choice', optionIds: ['b'] } });
    expect(body?.idempotencyKey).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    // The answer's time is on the server's clock: an hour ahead of this machine's.
    const answeredAt = Date.parse(body?.answeredAt ?? '');
    expect(answeredAt - before).toBeGreaterThan(serverAhead - 5000);
    expect(answeredAt - before).toBeLessThan(serverAhead + 5000);
    expect(tokens).toEqual([me.csrfToken]);
    expect(screen.getByText('1 of 1 required question answered')).toBeInTheDocument();
    expect(document.querySelector('[data-send-state="saved"]')).toHaveTextContent('Saved');
  });

  it('keeps an answer on the device when offline, opens the gate, and sends it once (same key) when the connection returns', async () => {
    serve();
    let up = false;
    const { bodies } = answersEndpoint(() => (up ? HttpResponse.json(resultOf(), { status: 201 }) : HttpResponse.error()));
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    await screen.findByRole('heading', { level: 1 });
    setOnline(false);
    const dialog = await answerGate(user);
    expect(await within(dialog).findByText('Saved on this device, not graded yet')).toBeInTheDocument();
    expect(await screen.findByText('Waiting for connection (1 answer)')).toBeInTheDocument();
    const stored = await indexedDbOutboxStore().list(me.user.id);
    expect(stored.map((e) => e.body.checkpointKey)).toEqual(['gate01']);
    expect(stored[0]).toMatchObject({ userId: me.user.id, schoolId: SCHOOL_ID, assignmentId: ASSIGNMENT_ID, attempt: 1 });
    // The gate let the video go on.
    await user.click(within(dialog).getByRole('button', { name: 'Continue' }));
    act(() => fake.seekByViewer(20_000));
    expect(fake.ms).toBe(20_000);

    up = true;
    setOnline(true);
    await waitFor(() => expect(document.querySelector('[data-send-state="saved"]')).not.toBeNull());
    expect(new Set(bodies.map((b) => b.idempotencyKey)).size).toBe(1);
    expect(await indexedDbOutboxStore().list(me.user.id)).toEqual([]);
    // The grade arrived: open the checkpoint to see it.
    await user.click(screen.getByRole('button', { name: /Checkpoint 1 of 1 at 0:05\.0/ }));
    expect(within(screen.getByRole('dialog')).getByText('Not right yet')).toBeInTheDocument();
    expect(screen.getByText('1 of 1 required question answered')).toBeInTheDocument();
  });

  it('after a reload, counts an answer still kept on the device and sends it', async () => {
    const store = indexedDbOutboxStore();
    const key = '00000000-0000-4000-8000-00000000c0de';
    await store.put({
      idempotencyKey: key,
      userId: me.user.id,
      schoolId: SCHOOL_ID,
      assignmentId: ASSIGNMENT_ID,
      attempt: 1,
      queuedAt: 1,
      body: {
        idempotencyKey: key,
        checkpointKey: 'gate01',
        answer: { kind: 'multiple-choice', optionIds: ['a'] },
        answeredAt: new Date().toISOString(),
      },
    });
    serve();
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => (release = resolve));
    const { bodies } = answersEndpoint(() =>
      HttpResponse.json(resultOf({ grade: gradeOf({ correct: true, score: 1, feedback: 'Right.' }) })),
    );
    server.use(
      http.post(`${base}/responses`, async ({ request }) => {
        bodies.push((await request.json()) as ResponseSubmit);
        await held;
        return HttpResponse.json(resultOf({ grade: gradeOf({ correct: true, score: 1, feedback: 'Right.' }) }));
      }),
    );
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    await playerReady();
    // Still on its way: the gate counts as answered already.
    expect(screen.getByRole('button', { name: /Checkpoint 1 of 1 at 0:05\.0: Question gate01, done/ })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: /Checkpoint 1 of 1/ }));
    expect(within(screen.getByRole('dialog')).getByText('Saved on this device, not graded yet')).toBeInTheDocument();
    release();
    expect(await within(screen.getByRole('dialog')).findByText('Right')).toBeInTheDocument();
    expect(bodies.map((b) => b.idempotencyKey)).toEqual([key]);
  });

  it('asks before signing out with unsent answers, naming how many', async () => {
    serve();
    answersEndpoint(() => HttpResponse.error());
    let signOuts = 0;
    server.use(
      http.post('/api/auth/sign-out', () => {
        signOuts += 1;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    const dialog = await answerGate(user);
    await within(dialog).findByText('Saved on this device, not graded yet');
    expect(await screen.findByText('Waiting to send (1 answer)')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Sign out' }));
    const ask = await screen.findByRole('alertdialog', { name: 'Sign out with 1 answer not sent?' });
    expect(within(ask).getByText(/saved on this device but not recorded by Pinfield yet/)).toBeInTheDocument();
    await user.click(within(ask).getByRole('button', { name: 'Stay signed in' }));
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(signOuts).toBe(0);
    await user.click(screen.getByRole('button', { name: 'Sign out' }));
    server.use(http.get('/api/me', () => apiError(401, 'unauthenticated', 'Sign in to continue.')));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Sign out anyway' }));
    await waitFor(() => expect(signOuts).toBe(1));
    expect(await screen.findByRole('heading', { name: 'Sign in', level: 1 })).toBeInTheDocument();
    expect(signOuts).toBe(1);
    // Kept on the device for the next sign-in.
    expect(await indexedDbOutboxStore().list(me.user.id)).toHaveLength(1);
  });

  it('says when a queued answer is refused later, with the server’s reason', async () => {
    serve();
    let up = false;
    answersEndpoint(() =>
      up ? apiError(409, 'assignment_closed', 'This lesson closed on Thu 3 Dec, 17:00 (school time).') : HttpResponse.error(),
    );
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    await screen.findByRole('heading', { level: 1 });
    const dialog = await answerGate(user);
    await within(dialog).findByText('Saved on this device, not graded yet');
    up = true;
    setOnline(true);
    expect(await screen.findByText('An answer was not recorded: Question gate01 at 0:05.0')).toBeInTheDocument();
    expect(screen.getAllByText('This lesson closed on Thu 3 Dec, 17:00 (school time).').length).toBeGreaterThan(0);
    expect(await within(dialog).findByRole('button', { name: 'Check my answer' })).toBeEnabled();
    expect(within(dialog).getByText('The answer was not sent')).toBeInTheDocument();
  });

  it('says when a queued answer came back unreadable (nothing recorded), with the engine’s message', async () => {
    serve();
    let up = false;
    answersEndpoint(() =>
      up
        ? HttpResponse.json(
            resultOf({ responseId: null, attempt: null, grade: gradeOf({ invalid: true, feedback: 'Choose one of the options.' }) }),
          )
        : HttpResponse.error(),
    );
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    const dialog = await answerGate(user);
    await within(dialog).findByText('Saved on this device, not graded yet');
    up = true;
    setOnline(true);
    expect(await screen.findByText('An answer was not recorded: Question gate01 at 0:05.0')).toBeInTheDocument();
    expect(await within(dialog).findByText('This answer could not be read (no attempt used)')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Dismiss' }));
    expect(screen.queryByText('An answer was not recorded: Question gate01 at 0:05.0')).toBeNull();
  });

  it('offers to resume where the student stopped; notes before that point were seen, unanswered questions come once', async () => {
    serve(watchViewOf([noteAt('note01', 3000), mcAt('pause1', 5000)], { progress: { resumeMs: 161_000, safetyAcknowledged: true } }));
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    await user.click(await screen.findByRole('button', { name: 'Resume at 02:41' }));
    expect(fake.ms).toBe(161_000);
    expect(screen.queryByRole('button', { name: 'Resume at 02:41' })).toBeNull();
    // The unanswered pause question passed on the way is shown once; the note before it is not shown again.
    const dialog = screen.getByRole('dialog', { name: 'Question pause1' });
    expect(within(dialog).getByText(/You moved past the checkpoint at 0:05\.0/)).toBeInTheDocument();
    expect(screen.queryByRole('dialog', { name: 'Note note01' })).toBeNull();
    expect(screen.getByRole('button', { name: /Note note01, done/ })).toBeInTheDocument();
  });

  it('from the beginning instead, the notes come again as the video reaches them', async () => {
    serve(watchViewOf([noteAt('note01', 3000)], { progress: { resumeMs: 161_000, safetyAcknowledged: true } }));
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    await user.click(await screen.findByRole('button', { name: 'Start from the beginning' }));
    await playerReady();
    act(() => void fake.play());
    act(() => fake.playTo(3100));
    expect(screen.getByRole('dialog', { name: 'Note note01' })).toBeInTheDocument();
  });

  it('says "Done" in the header once a reply says the lesson is complete', async () => {
    serve();
    answersEndpoint(() =>
      HttpResponse.json(
        resultOf({
          completion: completionOf({ requiredAnswered: 1, watchedShare: 0.95, done: true, completedAt: new Date().toISOString() }),
        }),
        {
          status: 201,
        },
      ),
    );
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    expect(await screen.findByText('In progress')).toBeInTheDocument();
    await answerGate(user);
    expect(await screen.findByText('Lesson complete')).toBeInTheDocument();
    const header = screen.getByRole('heading', { level: 1 }).closest('header');
    expect(header).not.toBeNull();
    expect(within(header as HTMLElement).getByText('Done')).toBeInTheDocument();
    expect(screen.queryByText('In progress')).toBeNull();
  });

  it('says "Saved" only once an answer was given; before that, that none was', async () => {
    serve();
    answersEndpoint(() => HttpResponse.json(resultOf(), { status: 201 }));
    const { user } = renderApp(paths.student.watch(ASSIGNMENT_ID));
    await playerReady();
    const before = document.querySelector('[data-send-state]');
    expect(before).toHaveAttribute('data-send-state', 'none');
    expect(before).toHaveTextContent('No answers yet');
    expect(before).not.toHaveTextContent('Saved');
    await answerGate(user);
    await waitFor(() => expect(document.querySelector('[data-send-state="saved"]')).toHaveTextContent('Saved'));
  });

  it('says "Saved" at once for answers recorded on an earlier visit', async () => {
    const view = watchViewOf();
    view.book = { gate01: { used: 1, answer: { kind: 'multiple-choice', optionIds: ['a'] }, grade: gradeOf({ correct: true, score: 1 }) } };
    serve(view);
    renderApp(paths.student.watch(ASSIGNMENT_ID));
    await playerReady();
    expect(document.querySelector('[data-send-state="saved"]')).toHaveTextContent('Saved');
  });

  it('reports the intervals played with the CSRF header and keepalive, on pause', async () => {
    const { viewing } = serve(watchViewOf([mcAt('pause1', 50_000)]));
    renderApp(paths.student.watch(ASSIGNMENT_ID));
    await playerReady();
    act(() => void fake.play());
    for (let ms = 250; ms <= 3000; ms += 250) act(() => fake.playTo(ms));
    act(() => fake.pause());
    await waitFor(() => expect(viewing).toHaveLength(1));
    expect(viewing[0]).toEqual({
      body: { intervals: [{ startMs: 0, endMs: 3000 }], positionMs: 3000 },
      token: me.csrfToken,
      keepalive: true,
    });
    expect(await screen.findByText('Watched 25 % of the recording (90 % needed)')).toBeInTheDocument();
  });

  it('says the lesson has closed and links to the results', async () => {
    signInAs(me);
    server.use(
      http.get(`${base}/watch`, () =>
        apiError(409, 'assignment_closed', 'This lesson closed on Thu 3 Dec, 17:00. Your results are ready.'),
      ),
    );
    renderApp(paths.student.watch(ASSIGNMENT_ID));
    expect(await screen.findByText('This lesson has closed')).toBeInTheDocument();
    expect(screen.getByText('This lesson closed on Thu 3 Dec, 17:00. Your results are ready.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See your results' })).toHaveAttribute('href', paths.student.results(ASSIGNMENT_ID));
  });
});
