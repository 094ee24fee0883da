import { SMTPServer } from 'smtp-server';
import { findLinks, parseMail } from './mime';

export interface MailboxMessage {
  id: number;
  receivedAt: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  links: string[];
}

/** Messages received by the fake SMTP receiver, newest first, kept in memory only. */
export class Mailbox {
  private messages: MailboxMessage[] = [];
  private nextId = 1;
  private readonly limit: number;

  constructor(limit = 200) {
    this.limit = limit;
  }

  add(raw: string): MailboxMessage {
    const mail = parseMail(raw);
    const message: MailboxMessage = {
      id: this.nextId++,
      receivedAt: new Date().toISOString(),
      from: mail.from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      links: findLinks(mail.text),
    };
    this.messages = [message, ...this.messages].slice(0, this.limit);
    return message;
  }

  list(): MailboxMessage[] {
    return [...this.messages];
  }

  /** The newest message sent to an address (case-insensitive). */
  latestTo(address: string): MailboxMessage | undefined {
    const wanted = address.toLowerCase();
    return this.messages.find((m) => m.to.toLowerCase().includes(wanted));
  }
}

export interface FakeSmtp {
  port: number;
  mailbox: Mailbox;
  close: () => Promise<void>;
}

/**
 * A local SMTP receiver for development and tests: accepts any message on 127.0.0.1 and keeps
 * it in a Mailbox. Never started in production.
 */
export async function startFakeSmtp(port = 0): Promise<FakeSmtp> {
  const mailbox = new Mailbox();
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        mailbox.add(Buffer.concat(chunks).toString('utf8'));
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  const actualPort = typeof address === 'object' && address ? address.port : port;
  return {
    port: actualPort,
    mailbox,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
