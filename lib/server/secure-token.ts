import { createHash, randomBytes } from "node:crypto";

/**
 * A fresh secret for links sent by e-mail or shared by hand (invitations, share links):
 * 32 random bytes as base64url, 43 characters, 256 bits of entropy.
 *
 * @example
 * createSecureToken().length // => 43
 */
export function createSecureToken(): string {
  return randomBytes(32).toString("base64url");
}

/**
 * The SHA-256 hex digest stored in place of a token (the schema keeps only digests, so a
 * leaked database does not leak working links).
 *
 * @example
 * hashSecureToken("abc") // => "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"
 */
export function hashSecureToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
