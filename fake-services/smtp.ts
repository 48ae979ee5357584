import { createServer } from 'node:http';
import type { AddressObject } from 'mailparser';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { SMTPServerDataStream, SMTPServerSession } from 'smtp-server';
import { MailStore } from './mail-store';
import { createInboxApp } from './smtp-inbox';
import { closeHttpServer, httpUrl, listenOn } from './server-lifecycle';

export type { StoredMessage } from './mail-store';

export interface SmtpFakeOptions {
  smtpPort: number;
  /** Port of the inbox page and its JSON API. */
  webPort: number;
  host?: string;
}

export interface RunningSmtpFake {
  smtpUrl: string;
  inboxUrl: string;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

function addressText(value: AddressObject | AddressObject[] | undefined): string | undefined {
  if (value === undefined) return undefined;
  return (Array.isArray(value) ? value : [value]).map((item) => item.text).join(', ') || undefined;
}

async function receive(stream: SMTPServerDataStream, session: SMTPServerSession, store: MailStore): Promise<void> {
  const parsed = await simpleParser(stream);
  if (stream.sizeExceeded) throw Object.assign(new Error('Message is larger than 25 MB.'), { responseCode: 552 });
  const sender = session.envelope.mailFrom;
  store.add({
    from: addressText(parsed.from) ?? (sender ? sender.address : ''),
    to: session.envelope.rcptTo.map((recipient) => recipient.address),
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    html: typeof parsed.html === 'string' ? parsed.html : null,
    date: new Date().toISOString(),
  });
}

function closeSmtp(server: SMTPServer): Promise<void> {
  if (!server.server.listening) return Promise.resolve();
  return new Promise((resolve) => server.close(() => resolve()));
}

/** Starts an SMTP server that keeps mail in memory and an inbox page + JSON API over HTTP. */
export async function startSmtpFake(options: SmtpFakeOptions): Promise<RunningSmtpFake> {
  const host = options.host ?? '127.0.0.1';
  const store = new MailStore(500);
  const smtp = new SMTPServer({
    authOptional: true,
    // Any user name and password are fine if a client insists on AUTH; no TLS on loopback.
    allowInsecureAuth: true,
    onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? 'anyone' }),
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    banner: 'local mail stand-in (development only)',
    // Let close() finish quickly even if a client keeps its connection open.
    closeTimeout: 500,
    onData(stream, session, callback) {
      receive(stream, session, store).then(
        () => callback(),
        (error: unknown) => {
          stream.resume();
          callback(error instanceof Error ? error : new Error(String(error)));
        },
      );
    },
  });
  smtp.on('error', (error) => console.error('[mail fake] SMTP error:', error.message));

  const smtpPort = await listenOn(smtp.server, options.smtpPort, host, 'SMTP fake');
  const smtpUrl = `smtp://${host.includes(':') ? `[${host}]` : host}:${smtpPort}`;
  const web = createServer(createInboxApp(store, smtpUrl));
  let webPort: number;
  try {
    webPort = await listenOn(web, options.webPort, host, 'Mail inbox');
  } catch (error) {
    await closeSmtp(smtp);
    throw error;
  }
  return {
    smtpUrl,
    inboxUrl: httpUrl(host, webPort),
    close: async () => {
      await Promise.all([closeSmtp(smtp), closeHttpServer(web)]);
    },
  };
}
