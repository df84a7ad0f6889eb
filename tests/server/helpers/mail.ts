import { mailServiceOf } from '../../../server/app';
import type { StoredMessage } from '../../../server/modules/mail/fakeSmtpServer';
import type { TestApp } from './testApp';

/** Messages the app's fake SMTP server received so far, oldest first. */
export function sentMail(t: TestApp): StoredMessage[] {
  return [...(mailServiceOf(t.app)?.outbox() ?? [])].reverse();
}

/** Waits (up to 5 s) for a message to arrive that matches. */
export async function waitForMail(t: TestApp, matches: (message: StoredMessage) => boolean): Promise<StoredMessage> {
  const deadline = Date.now() + 5000;
  for (;;) {
    const found = sentMail(t).find(matches);
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No matching mail arrived; received: ${sentMail(t).map((m) => `${m.to.join(',')}: ${m.subject}`).join(' | ') || 'nothing'}`);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}

/** The first http(s) address in a mail's text that contains `part`. */
export function linkIn(message: StoredMessage, part: string): string {
  const url = message.text.match(/https?:\/\/\S+/g)?.find((candidate) => candidate.includes(part));
  if (!url) throw new Error(`No link with ${part} in: ${message.text}`);
  return url;
}
