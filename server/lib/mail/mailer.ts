import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send: (mail: OutgoingMail) => Promise<void>;
}

/** A mailer over SMTP: `SMTP_URL` in production, the local fake receiver otherwise. */
export function createSmtpMailer(options: { url?: string; port?: number; from: string }): Mailer {
  const transport: Transporter = options.url
    ? nodemailer.createTransport(options.url)
    : nodemailer.createTransport({ host: '127.0.0.1', port: options.port, secure: false, ignoreTLS: true });
  return {
    async send(mail) {
      await transport.sendMail({ from: options.from, to: mail.to, subject: mail.subject, text: mail.text });
    },
  };
}
