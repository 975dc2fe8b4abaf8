import "server-only";
import { z } from "zod";
import { getEnv } from "@/lib/server/env";

const addressSchema = z.object({ address: z.string(), name: z.string().optional().default("") });

const messageSchema = z.object({
  id: z.string(),
  subject: z.string().default("(no subject)"),
  to: z.array(addressSchema).default([]),
  from: z.array(addressSchema).default([]),
  text: z.string().optional(),
  time: z.coerce.date(),
});

/** One message captured by the local fake SMTP server. */
export type CapturedMail = z.infer<typeof messageSchema>;

/** True when the app sends mail to the local fake server and its mailbox can be read. */
export function isMailboxEnabled(): boolean {
  return Boolean(getEnv().MAILBOX_URL);
}

/**
 * The captured messages, newest first, from maildev's REST API (`GET ${MAILBOX_URL}/email`).
 * Callers must check that the viewer is a site admin first.
 */
export async function listCapturedMail(limit = 100): Promise<CapturedMail[]> {
  const base = getEnv().MAILBOX_URL;
  if (!base) return [];
  const response = await fetch(`${base.replace(/\/$/, "")}/email`, { cache: "no-store", signal: AbortSignal.timeout(5_000) });
  if (!response.ok) throw new Error(`The mailbox answered ${response.status}.`);
  const messages = z.array(messageSchema).parse(await response.json());
  return messages.sort((a, b) => b.time.getTime() - a.time.getTime()).slice(0, limit);
}
