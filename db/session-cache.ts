import "server-only";
import { Client } from "pg";
import { getEnv } from "../lib/server/env";
import type { Actor } from "./queries/actor";

/*
 * What this process remembers of recent session checks (`getActorForSession` in
 * db/queries/actor.ts), so that a browser's requests do not each ask PostgreSQL again whether its
 * session is still open. It is only used while this process listens on the channel that
 * migration 0008's triggers notify when a session row or an account's e-mail, name, site role or
 * deletion changes: a notification drops what is remembered of that account, so a revocation made
 * by any process or tool ends the session here too, as soon as the notification arrives. Without
 * the listener (not yet connected, or its connection lost) nothing is remembered and every check
 * asks PostgreSQL, as before. The functions that revoke sessions in this process also drop them
 * here once their transaction has committed (`forgetSessionsOf`), so that a request following
 * the revocation in this process never waits on the notification. An entry lives at most
 * `rememberMs`, which bounds what a lost notification could cost.
 */

/** The channel of migration 0008's triggers; the payload is the account's id. */
const channel = "mooring_session_change";
/** How long a checked session is remembered. */
export const rememberMs = 10_000;
/** Accounts remembered at most; the oldest goes first. */
const maxAccounts = 10_000;
/** Waits between attempts to listen again after the connection was lost, growing to the last. */
const retryDelaysMs = [250, 1_000, 2_000, 5_000];

interface Remembered {
  actor: Readonly<Actor>;
  at: number;
}

interface State {
  /** Account id -> session id -> the check's answer. */
  accounts: Map<string, Map<string, Remembered>>;
  /** Bumped by every forgetting and by every change of the listener: a check that began before it is not remembered. */
  generation: number;
  listening: boolean;
  client: Client | null;
  failures: number;
  /** No new attempt to listen before this time (ms since the epoch), after a lost connection. */
  retryAt: number;
  /** Waiting for the listener to be up (tests). */
  waiters: Array<() => void>;
}

// Next's dev server re-evaluates modules on every change; keep one listener per process.
const holder = globalThis as typeof globalThis & { __mooringSessionCache?: State };

function state(): State {
  holder.__mooringSessionCache ??= { accounts: new Map(), generation: 0, listening: false, client: null, failures: 0, retryAt: 0, waiters: [] };
  return holder.__mooringSessionCache;
}

/** The remembered answer of a session check, or undefined when there is none to trust. Starts the listener on first use. */
export function rememberedActor(userId: string, sessionId: string): Readonly<Actor> | undefined {
  const current = state();
  if (!current.listening) {
    listen(current);
    return undefined;
  }
  const sessions = current.accounts.get(userId);
  const entry = sessions?.get(sessionId);
  if (!entry) return undefined;
  if (Date.now() - entry.at > rememberMs) {
    sessions?.delete(sessionId);
    if (sessions?.size === 0) current.accounts.delete(userId);
    return undefined;
  }
  return entry.actor;
}

/** Taken before a session check's query; pass it to {@link rememberActor} with the answer. */
export function checkTicket(): number | null {
  const current = state();
  return current.listening ? current.generation : null;
}

/**
 * Remembers an open session's actor, unless anything was forgotten, or the listener changed,
 * since `ticket` was taken (the answer may predate a revocation). Returns the frozen actor.
 */
export function rememberActor(ticket: number | null, userId: string, sessionId: string, actor: Actor): Readonly<Actor> {
  const frozen = Object.freeze(actor);
  const current = state();
  if (ticket === null || !current.listening || ticket !== current.generation) return frozen;
  let sessions = current.accounts.get(userId);
  if (!sessions) {
    if (current.accounts.size >= maxAccounts) current.accounts.delete(current.accounts.keys().next().value as string);
    sessions = new Map();
    current.accounts.set(userId, sessions);
  }
  sessions.set(sessionId, { actor: frozen, at: Date.now() });
  return frozen;
}

/** Drops what is remembered of an account's sessions; call it once a change to them has committed. */
export function forgetSessionsOf(userId: string): void {
  const current = state();
  current.generation += 1;
  current.accounts.delete(userId);
}

/** Resolves once this process listens for session changes (tests wait for it before counting on the cache). */
export function sessionChangesHeard(): Promise<void> {
  const current = state();
  if (current.listening) return Promise.resolve();
  listen(current);
  return new Promise((resolve) => current.waiters.push(resolve));
}

function forgetAll(current: State): void {
  current.generation += 1;
  current.accounts.clear();
}

/** Connects the listener unless it is connected or connecting, or waiting to try again. */
function listen(current: State): void {
  if (current.client || Date.now() < current.retryAt) return;
  const client = new Client({ connectionString: getEnv().DATABASE_URL, application_name: "mooring-session-changes", connectionTimeoutMillis: 5_000 });
  current.client = client;
  let lost = false;
  const onLost = (error?: Error) => {
    if (lost) return;
    lost = true;
    const wasListening = current.listening;
    current.listening = false;
    forgetAll(current);
    if (current.client === client) current.client = null;
    client.end().catch(() => {});
    if (wasListening) console.error(`Session changes: the listener lost its connection${error ? ` (${error.message})` : ""}; checking every session in PostgreSQL until it is back.`);
    const delay = retryDelaysMs[Math.min(current.failures, retryDelaysMs.length - 1)] ?? 5_000;
    current.failures += 1;
    current.retryAt = Date.now() + delay;
    setTimeout(() => listen(current), delay).unref();
  };
  client.on("error", onLost);
  client.on("end", () => onLost());
  client.on("notification", (message) => {
    if (message.channel === channel && message.payload) forgetSessionsOf(message.payload);
  });
  client
    .connect()
    .then(() => client.query(`LISTEN ${channel}`))
    .then(() => {
      if (lost) return;
      // The process must be able to exit while the listener is connected (scripts, tests).
      (client as unknown as { connection?: { stream?: { unref?: () => void } } }).connection?.stream?.unref?.();
      forgetAll(current);
      current.listening = true;
      current.failures = 0;
      for (const resolve of current.waiters.splice(0)) resolve();
    })
    .catch((error: Error) => onLost(error));
}
