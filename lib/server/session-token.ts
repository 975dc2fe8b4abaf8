import { hkdfSync } from "node:crypto";
import { jwtDecrypt } from "jose";
import type { JWT, JWTDecodeParams } from "next-auth/jwt";

/**
 * next-auth's session-token decoding with its key derived once per secret. next-auth v4 derives the
 * token's encryption key (HKDF-SHA256 of the secret) on every decode, which costs about ten times
 * the decryption itself; this derives the same key with Node's HKDF, keeps it, and decrypts as
 * next-auth's `decode` does (JWE "dir" with A256GCM, 15 s clock tolerance, expiry checked), once
 * per token. Tokens are still issued by next-auth's own `encode`. Pass it as `decode` to `getToken`
 * (the proxy), or read the token with `sessionTokenFromCookieHeader` (lib/server/session.ts).
 */

const keys = new Map<string, Uint8Array>();

/** next-auth's "NextAuth.js Generated Encryption Key" for a secret and salt. */
function encryptionKey(secret: string | Buffer, salt: string): Uint8Array {
  const id = `${typeof secret === "string" ? secret : secret.toString("hex")}\u0000${salt}`;
  let key = keys.get(id);
  if (!key) {
    key = new Uint8Array(hkdfSync("sha256", secret, salt, `NextAuth.js Generated Encryption Key${salt ? ` (${salt})` : ""}`, 32));
    keys.set(id, key);
  }
  return key;
}

/** Seconds of clock difference allowed on a token's expiry, as next-auth's decode allows. */
const clockToleranceSeconds = 15;

/** Tokens already decrypted, per key, most recent last; bounded. */
const decrypted = new Map<Uint8Array, Map<string, Readonly<JWT>>>();
/** Decrypted tokens kept per key (a few kilobytes each at most). */
const decryptedTokensKept = 2048;

/**
 * The payload of a session token, or null without one. Throws, as next-auth's decode does, for a
 * token that is malformed, encrypted with another secret, or expired. A token decrypted before is
 * not decrypted again: a browser sends the same cookie with every request, and the decryption is
 * a pure function of token and key. Its expiry is checked again on every call; the payload is
 * frozen, since callers share it.
 */
export async function decodeSessionToken({ token, secret, salt = "" }: JWTDecodeParams): Promise<JWT | null> {
  if (!token) return null;
  const key = encryptionKey(secret, salt);
  let seen = decrypted.get(key);
  if (!seen) {
    seen = new Map();
    decrypted.set(key, seen);
  }
  const known = seen.get(token);
  if (known) {
    if (typeof known.exp === "number" && known.exp + clockToleranceSeconds < Date.now() / 1000) {
      seen.delete(token);
      throw new Error("The session token has expired.");
    }
    return known;
  }
  const { payload } = await jwtDecrypt(token, key, { clockTolerance: clockToleranceSeconds });
  const frozen = Object.freeze(payload) as Readonly<JWT>;
  if (seen.size >= decryptedTokensKept) seen.delete(seen.keys().next().value as string);
  seen.set(token, frozen);
  return frozen;
}

/** next-auth's session cookie name: the `__Secure-` one when the site is served over https. */
export function sessionCookieName(siteUrl: string | undefined): string {
  return siteUrl?.startsWith("https://") ? "__Secure-next-auth.session-token" : "next-auth.session-token";
}

/**
 * The session token in a Cookie header, as getToken read it from Next's cookie store: the header
 * parsed as Next parses it (pairs split at "; ", values percent-decoded, a pair that does not
 * decode left out, a repeated name keeping its last value), then every cookie whose name starts
 * with `cookieName` (the token, or its chunks `name.0`, `name.1`, ... when it is long) joined in
 * the order of their numeric suffix, as next-auth's session store does. Null when there is none.
 */
export function sessionTokenFromCookieHeader(header: string | null, cookieName: string): string | null {
  if (!header || !header.includes(cookieName)) return null;
  const chunks = new Map<string, string>();
  for (const pair of header.split(/; */)) {
    const cut = pair.indexOf("=");
    const name = cut === -1 ? pair : pair.slice(0, cut);
    if (!name.startsWith(cookieName)) continue;
    try {
      chunks.set(name, cut === -1 ? "true" : decodeURIComponent(pair.slice(cut + 1)));
    } catch {
      // Next's parser leaves such a pair out.
    }
  }
  const suffix = (name: string) => Number.parseInt(name.split(".").pop() ?? "0", 10);
  const names = [...chunks.keys()].sort((a, b) => suffix(a) - suffix(b));
  return names.map((name) => chunks.get(name)).join("") || null;
}
