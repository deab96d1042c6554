export interface SinkMessage {
  id: number;
  to: string[];
  subject: string;
  text: string;
}

const sinkUrl = (): string => process.env.MAIL_VIEWER_URL ?? 'http://127.0.0.1:1090';

/** Waits for a message to an address to reach the mail sink over the real SMTP path. */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 10000): Promise<SinkMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await fetch(`${sinkUrl()}/api/messages?to=${encodeURIComponent(to)}`);
    const found = ((await res.json()) as SinkMessage[]).filter((m) => subject.test(m.subject)).pop();
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

/** The token query parameter of the first link in a message. */
export function tokenFrom(message: SinkMessage): string {
  const match = /[?&]token=([^\s&]+)/.exec(message.text);
  if (!match?.[1]) throw new Error(`no token link in "${message.subject}"`);
  return decodeURIComponent(match[1]);
}
