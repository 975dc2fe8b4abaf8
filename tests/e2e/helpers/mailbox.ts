// Reads the mail captured by the local fake SMTP server (maildev) through its REST API.
// MAILBOX_URL is set by scripts/test.mjs (e.g. http://127.0.0.1:1081).

export interface MailAddress {
  address: string;
  name: string;
}

export interface MailMessage {
  id: string;
  subject: string;
  from: MailAddress[];
  to: MailAddress[];
  text?: string;
  html?: string;
  time: string;
}

/** Base URL of the maildev REST API; throws when the test run did not provide one. */
export function mailboxUrl(): string {
  const url = process.env.MAILBOX_URL;
  if (!url) throw new Error("MAILBOX_URL is not set: run the browser tests through `npm test` or `node scripts/test.mjs e2e`");
  return url.replace(/\/$/, "");
}

/** Every captured message, oldest first. */
export async function listMessages(): Promise<MailMessage[]> {
  const response = await fetch(`${mailboxUrl()}/email`);
  if (!response.ok) throw new Error(`mailbox answered ${response.status}`);
  return (await response.json()) as MailMessage[];
}

/** The newest message addressed to `address` (case-insensitive), or null when there is none. */
export async function findNewestMessageTo(address: string): Promise<MailMessage | null> {
  const wanted = address.toLowerCase();
  const matching = (await listMessages()).filter((message) =>
    message.to.some((recipient) => recipient.address.toLowerCase() === wanted),
  );
  matching.sort((a, b) => new Date(b.time).getTime() - new Date(a.time).getTime());
  return matching[0] ?? null;
}

/** Options for {@link waitForMessageTo}. */
export interface WaitForMessageOptions {
  /** Only accept messages whose subject contains this text. */
  subjectIncludes?: string;
  /** Only accept messages captured after this moment. */
  after?: Date;
  /** Give up after this many milliseconds (default 15 000). */
  timeoutMs?: number;
}

/** Polls the mailbox until a message to `address` matching the options arrives. */
export async function waitForMessageTo(address: string, options: WaitForMessageOptions = {}): Promise<MailMessage> {
  const deadline = Date.now() + (options.timeoutMs ?? 15_000);
  while (Date.now() < deadline) {
    const message = await findNewestMessageTo(address);
    const fresh = !options.after || new Date(message?.time ?? 0).getTime() >= options.after.getTime();
    const subjectMatches = !options.subjectIncludes || message?.subject.includes(options.subjectIncludes);
    if (message && fresh && subjectMatches) return message;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`no mail to ${address}${options.subjectIncludes ? ` about "${options.subjectIncludes}"` : ""} arrived`);
}

/** The first http(s) link in a message: from the HTML `href`s when present, else from the text. */
export function extractFirstLink(message: MailMessage): string | null {
  const href = message.html?.match(/href="(https?:\/\/[^"]+)"/i)?.[1];
  if (href) return href.replace(/&amp;/g, "&");
  return message.text?.match(/https?:\/\/\S+/)?.[0] ?? null;
}

/** Deletes every captured message (use in a test's setup when it needs an empty mailbox). */
export async function clearMailbox(): Promise<void> {
  const response = await fetch(`${mailboxUrl()}/email/all`, { method: "DELETE" });
  if (!response.ok) throw new Error(`mailbox answered ${response.status} to DELETE /email/all`);
}
