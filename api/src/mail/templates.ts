import type { MailMessage } from './mailer';

const escape = (text: string): string =>
  text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function layout(lines: string[], action: { label: string; url: string }, footer: string): string {
  return `<!doctype html><html><body style="font-family:sans-serif;color:#1b2430;line-height:1.5">
${lines.map((line) => `<p>${escape(line)}</p>`).join('\n')}
<p><a href="${escape(action.url)}" style="background:#8a4519;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none">${escape(action.label)}</a></p>
<p style="color:#4a5563;font-size:14px">${escape(footer)}</p></body></html>`;
}

/** The e-mail with a one-time sign-in link. */
export function signInLinkMail(to: string, url: string, minutes: number): MailMessage {
  const lines = ['Here is your link to sign in to Pinfield.', `It works once and expires in ${minutes} minutes.`];
  const footer = 'If you did not ask to sign in, ignore this e-mail: nobody can sign in without the link.';
  return {
    to,
    subject: 'Your Pinfield sign-in link',
    text: `${lines.join('\n')}\n\nSign in: ${url}\n\n${footer}\n`,
    html: layout(lines, { label: 'Sign in to Pinfield', url }, footer),
  };
}

/** The e-mail that lets a student join a class after checking their address. */
export function joinLinkMail(to: string, url: string, className: string, schoolName: string, minutes: number): MailMessage {
  const lines = [`You asked to join ${className} at ${schoolName} on Pinfield.`, `The link works once and expires in ${minutes} minutes.`];
  const footer = 'If you did not ask to join a class, ignore this e-mail.';
  return {
    to,
    subject: `Join ${className} on Pinfield`,
    text: `${lines.join('\n')}\n\nJoin the class: ${url}\n\n${footer}\n`,
    html: layout(lines, { label: 'Join the class', url }, footer),
  };
}

/** The e-mail an admin's invitation sends. */
export function invitationMail(to: string, name: string, schoolName: string, roles: string, url: string): MailMessage {
  const lines = [
    `Hello ${name},`,
    `You have been invited to ${schoolName} on Pinfield as: ${roles}.`,
    'Sign in with Google or ask for an e-mail link, using this address.',
  ];
  const footer = 'If you were not expecting this, you can ignore it.';
  return {
    to,
    subject: `You're invited to ${schoolName} on Pinfield`,
    text: `${lines.join('\n')}\n\nSign in: ${url}\n\n${footer}\n`,
    html: layout(lines, { label: 'Open Pinfield', url }, footer),
  };
}
