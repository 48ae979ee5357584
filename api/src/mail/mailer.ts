import nodemailer from 'nodemailer';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Sends e-mail; the app gets one at composition so tests can capture what was sent. */
export interface Mailer {
  send(message: MailMessage): Promise<void>;
  close(): void;
}

/** A mailer over SMTP (the local fake in development, a relay in production). */
export function createSmtpMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(message) {
      await transport.sendMail({ from, ...message });
    },
    close: () => transport.close(),
  };
}
