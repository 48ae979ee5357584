import express from 'express';
import type { Express, NextFunction, Request, Response } from 'express';
import { sendPage } from './html';
import type { MailStore } from './mail-store';
import { renderInbox, renderMessage, renderNotFound } from './smtp-inbox-pages';

// The HTML part renders in a srcdoc frame that inherits this policy: mail can show loopback
// images (the app's own), but nothing off this machine loads and no script runs.
const INBOX_CSP =
  "default-src 'none'; style-src 'unsafe-inline'; img-src 'self' data: http://127.0.0.1:* http://localhost:*; " +
  "font-src 'self' data:; frame-src 'self'; base-uri 'none'; form-action 'self'; frame-ancestors 'self'";

function apiError(res: Response, status: number, code: string, message: string): void {
  res.status(status).json({ error: { code, message } });
}

/** The inbox web app: a page for people and a JSON API for tests. */
export function createInboxApp(store: MailStore, smtpUrl: string): Express {
  const app = express();
  app.disable('x-powered-by');

  app.get('/api/messages', (req: Request, res: Response) => {
    const to = req.query['to'];
    if (to !== undefined && (typeof to !== 'string' || to.trim() === '')) {
      apiError(res, 400, 'invalid_query', 'The "to" filter must be one e-mail address, e.g. ?to=ada@school.example.');
      return;
    }
    res.set('Cache-Control', 'no-store').json({ messages: store.list(to) });
  });

  app.get('/api/messages/:id', (req: Request, res: Response) => {
    const message = store.get(String(req.params['id']));
    if (!message) {
      apiError(res, 404, 'not_found', `No message has the id "${String(req.params['id'])}".`);
      return;
    }
    res.set('Cache-Control', 'no-store').json(message);
  });

  app.delete('/api/messages', (_req: Request, res: Response) => {
    res.json({ deleted: store.clear() });
  });

  app.get('/', (_req: Request, res: Response) => {
    sendPage(res, 200, renderInbox(store.list(), smtpUrl), INBOX_CSP);
  });

  app.get('/messages/:id', (req: Request, res: Response) => {
    const message = store.get(String(req.params['id']));
    if (!message) sendPage(res, 404, renderNotFound(String(req.params['id'])), INBOX_CSP);
    else sendPage(res, 200, renderMessage(message, smtpUrl), INBOX_CSP);
  });

  // The page's "Delete all messages" button: a form post, since the page runs no script.
  app.post('/clear', (_req: Request, res: Response) => {
    store.clear();
    res.redirect(303, '/');
  });

  app.get('/favicon.ico', (_req: Request, res: Response) => {
    res.status(204).end();
  });

  app.use((req: Request, res: Response) => {
    apiError(res, 404, 'not_found', `Nothing at ${req.method} ${req.path} on the mail inbox.`);
  });
  app.use((error: unknown, _req: Request, res: Response, _next: NextFunction) => {
    console.error('[mail fake] request failed:', error);
    apiError(res, 500, 'internal', 'The mail inbox failed; see its log.');
  });
  return app;
}
