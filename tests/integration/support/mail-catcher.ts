/**
 * A client for the local mail catcher (scripts/mail-catcher.mjs) that scripts/test.sh starts and
 * points MAIL_CATCHER_URL at. Plain fetch and no path aliases, so Playwright specs can import it
 * too. Test files run in parallel against one catcher: use unique addresses and filter by `to`
 * rather than clearing the catcher.
 */
export interface CaughtMail {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

export function mailCatcherUrl(): string {
  const url = process.env.MAIL_CATCHER_URL;
  if (!url) throw new Error("MAIL_CATCHER_URL is not set: run through `npm test` (scripts/test.sh starts the catcher)");
  return url.replace(/\/+$/, "");
}

/** Every caught message, or only those addressed to `to`, oldest first. */
export async function listCaughtMail(to?: string): Promise<CaughtMail[]> {
  const query = to ? `?to=${encodeURIComponent(to.toLowerCase())}` : "";
  const res = await fetch(`${mailCatcherUrl()}/messages${query}`);
  if (!res.ok) throw new Error(`mail catcher answered ${res.status}`);
  return (await res.json()) as CaughtMail[];
}

/**
 * Waits until a message for `to` arrives (optionally matching `subject` and newer than the message
 * id `after`) and returns the newest match.
 */
export async function waitForMail(
  to: string,
  options: { subject?: string | RegExp; after?: number; timeoutMs?: number } = {},
): Promise<CaughtMail> {
  const deadline = Date.now() + (options.timeoutMs ?? 10_000);
  for (;;) {
    const matches = (await listCaughtMail(to)).filter(
      (m) =>
        m.id > (options.after ?? 0) &&
        (options.subject === undefined ||
          (typeof options.subject === "string" ? m.subject.includes(options.subject) : options.subject.test(m.subject))),
    );
    const last = matches[matches.length - 1];
    if (last) return last;
    if (Date.now() > deadline) throw new Error(`no mail for ${to} arrived within ${options.timeoutMs ?? 10_000} ms`);
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
}

/** The first http(s) link in the message's text whose path starts with `pathPrefix`. */
export function linkFrom(mail: CaughtMail, pathPrefix: string): URL {
  for (const match of mail.text.matchAll(/https?:\/\/[^\s<>"')]+/g)) {
    const url = new URL(match[0]);
    if (url.pathname.startsWith(pathPrefix)) return url;
  }
  throw new Error(`no link to ${pathPrefix} in the mail "${mail.subject}"`);
}

/** Empties the catcher. Only for a run that owns the catcher alone; parallel tests should filter by address. */
export async function clearCaughtMail(): Promise<void> {
  await fetch(`${mailCatcherUrl()}/messages`, { method: "DELETE" });
}
