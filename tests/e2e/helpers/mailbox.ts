// Reads the mail captured by the local fake SMTP server (maildev) through its REST API.
// MAILBOX_URL is set by scripts/test.mjs (e.g. http://127.0.0.1:1081).

import { expect } from "@playwright/test";

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

/** The newest message to `address` if it matches the options, else null. */
async function findMatchingMessage(address: string, options: WaitForMessageOptions): Promise<MailMessage | null> {
  const message = await findNewestMessageTo(address);
  if (!message) return null;
  const fresh = !options.after || new Date(message.time).getTime() >= options.after.getTime();
  const subjectMatches = !options.subjectIncludes || message.subject.includes(options.subjectIncludes);
  return fresh && subjectMatches ? message : null;
}

/** Polls the mailbox until a message to `address` matching the options arrives. */
export async function waitForMessageTo(address: string, options: WaitForMessageOptions = {}): Promise<MailMessage> {
  const wanted = `mail to ${address}${options.subjectIncludes ? ` about "${options.subjectIncludes}"` : ""}`;
  await expect
    .poll(async () => (await findMatchingMessage(address, options)) !== null, { message: `no ${wanted} arrived`, timeout: options.timeoutMs ?? 15_000 })
    .toBe(true);
  // Captured mail stays in the mailbox, so the message found by the poll is still there (or a newer match).
  const message = await findMatchingMessage(address, options);
  if (!message) throw new Error(`the ${wanted} left the mailbox`);
  return message;
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
