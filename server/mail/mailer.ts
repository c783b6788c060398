import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

/** Sends through SMTP (a real server in production, the local capture server otherwise). */
export function createSmtpMailer(smtpUrl: string, from: string): Mailer {
  const url = new URL(smtpUrl);
  const transport = nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || 25),
    secure: url.protocol === 'smtps:',
    ignoreTLS: url.searchParams.get('ignoreTLS') === 'true',
    auth: url.username
      ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) }
      : undefined,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
  };
}
