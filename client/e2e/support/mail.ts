const SINK = process.env.MAIL_VIEWER_URL ?? 'http://127.0.0.1:1090';

export interface SinkMessage {
  id: number;
  to: string[];
  subject: string;
  text: string;
}

/** The newest message to an address whose subject matches, waiting for it to arrive over SMTP. */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 15000): Promise<SinkMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await fetch(`${SINK}/api/messages?to=${encodeURIComponent(to)}`);
    const hit = ((await res.json()) as SinkMessage[]).filter((m) => subject.test(m.subject)).pop();
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no mail to ${to} matching ${subject}`);
}

export function firstLink(message: SinkMessage): string {
  const match = /(https?:\/\/\S+)/.exec(message.text);
  if (!match?.[1]) throw new Error(`no link in "${message.subject}"`);
  return match[1];
}
