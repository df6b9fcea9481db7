// Read what the app sent, from the fake SMTP server's JSON endpoint.
const MAIL_UI_URL = process.env.MAIL_UI_URL ?? "http://127.0.0.1:1091";

export interface SentMail { id: string; at: string; to: string[]; subject: string; text: string }

export async function messagesTo(address: string): Promise<SentMail[]> {
  const res = await fetch(`${MAIL_UI_URL}/api/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as SentMail[];
}

/** Wait until a message to `address` whose subject matches arrives. */
export async function waitForMail(address: string, subject: RegExp, timeoutMs = 20_000): Promise<SentMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const found = (await messagesTo(address)).find((m) => subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`no mail to ${address} matching ${subject} within ${timeoutMs} ms`);
}

export function firstLink(text: string): string {
  const m = text.match(/https?:\/\/\S+/);
  if (!m) throw new Error("no link in the message");
  return m[0];
}
