import nodemailer from 'nodemailer';
import type { Transporter } from 'nodemailer';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { RunningSmtpFake, StoredMessage } from './smtp';
import { startSmtpFake } from './smtp';

let fake: RunningSmtpFake;
let transport: Transporter;

beforeAll(async () => {
  fake = await startSmtpFake({ smtpPort: 0, webPort: 0 });
  transport = nodemailer.createTransport({ url: fake.smtpUrl });
});
afterAll(async () => {
  transport?.close();
  await fake?.close();
});
beforeEach(async () => {
  await fetch(`${fake.inboxUrl}/api/messages`, { method: 'DELETE' });
});

async function listMessages(query = ''): Promise<StoredMessage[]> {
  const response = await fetch(`${fake.inboxUrl}/api/messages${query}`);
  expect(response.status).toBe(200);
  return ((await response.json()) as { messages: StoredMessage[] }).messages;
}

async function sendSignInMail(to: string, subject: string): Promise<void> {
  await transport.sendMail({
    from: 'Pinfield Local <no-reply@pinfield.example>',
    to,
    subject,
    text: `Open https://127.0.0.1:4310/sign-in?t=abc&x=1. Thanks`,
    html: '<p>Open <a href="http://127.0.0.1:4310/sign-in?t=abc">the link</a></p><script>alert(1)</script>',
  });
}

describe('SMTP fake', () => {
  it('lists a message sent over SMTP with its sender, recipients, subject and bodies', async () => {
    await sendSignInMail('Ada.Quill@fernhollow.example', 'Your sign-in link');
    const [message, ...rest] = await listMessages();
    expect(rest).toHaveLength(0);
    expect(message).toMatchObject({
      from: '"Pinfield Local" <no-reply@pinfield.example>',
      to: ['Ada.Quill@fernhollow.example'],
      subject: 'Your sign-in link',
    });
    expect(message!.text.trim()).toBe('Open https://127.0.0.1:4310/sign-in?t=abc&x=1. Thanks');
    expect(message!.html).toContain('href="http://127.0.0.1:4310/sign-in?t=abc"');
    expect(Number.isNaN(Date.parse(message!.date))).toBe(false);

    const single = await fetch(`${fake.inboxUrl}/api/messages/${message!.id}`);
    expect(await single.json()).toEqual(message);
    const missing = await fetch(`${fake.inboxUrl}/api/messages/nope`);
    expect(missing.status).toBe(404);
    expect(await missing.json()).toEqual({ error: { code: 'not_found', message: 'No message has the id "nope".' } });
  });

  it('filters by recipient ignoring letter case, newest first', async () => {
    await sendSignInMail('ada.quill@fernhollow.example', 'first');
    await sendSignInMail('tomas.reed@fernhollow.example', 'other person');
    await sendSignInMail('ADA.QUILL@fernhollow.example', 'second');
    const forAda = await listMessages('?to=Ada.Quill%40Fernhollow.example');
    expect(forAda.map((message) => message.subject)).toEqual(['second', 'first']);
    expect((await listMessages()).map((message) => message.subject)).toEqual(['second', 'other person', 'first']);
    const bad = await fetch(`${fake.inboxUrl}/api/messages?to=`);
    expect(bad.status).toBe(400);
  });

  it('DELETE clears the inbox', async () => {
    await sendSignInMail('ada.quill@fernhollow.example', 'to be deleted');
    const cleared = await fetch(`${fake.inboxUrl}/api/messages`, { method: 'DELETE' });
    expect(await cleared.json()).toEqual({ deleted: 1 });
    expect(await listMessages()).toEqual([]);
  });

  it('shows the inbox page and a message with live links and a sandboxed HTML part', async () => {
    await sendSignInMail('ada.quill@fernhollow.example', 'Page <check>');
    const inbox = await (await fetch(`${fake.inboxUrl}/`)).text();
    expect(inbox).toContain('Page &lt;check&gt;');
    const [message] = await listMessages();
    const page = await fetch(`${fake.inboxUrl}/messages/${message!.id}`);
    expect(page.headers.get('content-security-policy')).toContain("default-src 'none'");
    const html = await page.text();
    expect(html).toContain(
      '<a href="https://127.0.0.1:4310/sign-in?t=abc&amp;x=1">https://127.0.0.1:4310/sign-in?t=abc&amp;x=1</a>. Thanks',
    );
    expect(html).toMatch(
      /<iframe title="HTML part of the message" sandbox="allow-popups allow-popups-to-escape-sandbox" srcdoc="[^"]*&lt;script&gt;/,
    );
    expect(html).not.toContain('<script>');
  });
});
