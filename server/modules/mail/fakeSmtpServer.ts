import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** A message the fake SMTP server received, as the outbox shows it. */
export interface StoredMessage {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

const KEEP_AT_MOST = 500;

/**
 * A local SMTP server (the smtp-server package) that accepts every message on 127.0.0.1 and keeps
 * the newest 500 in memory, parsed with mailparser. Development and tests send real SMTP to it.
 */
export async function startFakeSmtpServer(port = 0): Promise<{ port: number; messages: StoredMessage[]; close(): Promise<void> }> {
  const messages: StoredMessage[] = [];
  let nextId = 1;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    banner: 'Slotwise development mail catcher',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const envelopeTo = session.envelope.rcptTo.map((address) => address.address);
          messages.push({
            id: nextId++,
            from: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            to: envelopeTo,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            receivedAt: new Date().toISOString(),
          });
          if (messages.length > KEEP_AT_MOST) messages.splice(0, messages.length - KEEP_AT_MOST);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    messages,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
