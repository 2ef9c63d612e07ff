/** Mail caught by the local SMTP catcher (maildev's REST API at MAIL_INBOX_URL). Plain fetch: usable from Vitest and Playwright. */
export interface CaughtMail {
  subject: string;
  to: { address: string }[];
  text: string;
  html: string;
}

/** Every caught message. */
export async function allMail(): Promise<CaughtMail[]> {
  const base = process.env.MAIL_INBOX_URL ?? 'http://127.0.0.1:2581';
  let res = await fetch(`${base}/email`);
  if (res.status === 404) res = await fetch(`${base}/api/email`);
  return (await res.json()) as CaughtMail[];
}

/** Caught mail whose subject contains the text, waiting up to timeoutMs for `expected` messages. */
export async function caughtMail(subjectContains: string, expected = 1, timeoutMs = 4000): Promise<CaughtMail[]> {
  return waitForMail((m) => m.subject.includes(subjectContains), expected, timeoutMs);
}

/** Caught mail that passes `match`, waiting up to timeoutMs for `expected` messages. */
export async function waitForMail(match: (m: CaughtMail) => boolean, expected = 1, timeoutMs = 4000): Promise<CaughtMail[]> {
  const deadline = Date.now() + timeoutMs;
  let found: CaughtMail[] = [];
  while (Date.now() < deadline) {
    found = (await allMail()).filter(match);
    if (found.length >= expected) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  return found;
}
