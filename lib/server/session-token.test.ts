import { createRequire } from "node:module";
import { RequestCookies } from "next/dist/compiled/@edge-runtime/cookies";
import { decode, encode } from "next-auth/jwt";
import { afterEach, describe, expect, it, vi } from "vitest";
import { decodeSessionToken, sessionCookieName, sessionTokenFromCookieHeader } from "./session-token";

// The reference is next-auth's own encode and decode (the registry package): the cached-key decoder
// must read exactly the tokens it issues and refuse what it refuses.
const secret = "a test secret of some length, not the app's";
const claims = { id: "0b8f0c1e-6a0e-4f55-9f6a-2f1f6a1b2c3d", sid: "5d2a9c4e-1b7f-4e0a-8c3d-9e8f7a6b5c4d", name: "Ada", email: "ada@example.test" };

describe("decodeSessionToken", () => {
  it("reads a token next-auth issued exactly as next-auth's decode does, twice (the cached key)", async () => {
    const token = await encode({ token: claims, secret });
    const expected = await decode({ token, secret });
    expect(await decodeSessionToken({ token, secret })).toEqual(expected);
    expect(await decodeSessionToken({ token, secret })).toMatchObject(claims);
  });

  it("derives a salted key as next-auth does", async () => {
    const token = await encode({ token: claims, secret, salt: "authjs.session-token" });
    expect(await decodeSessionToken({ token, secret, salt: "authjs.session-token" })).toMatchObject(claims);
    await expect(decodeSessionToken({ token, secret })).rejects.toThrow();
  });

  it("refuses a token of another secret, an expired token and a malformed one, as next-auth's decode does", async () => {
    const other = await encode({ token: claims, secret: "another secret entirely, also long" });
    await expect(decode({ token: other, secret })).rejects.toThrow();
    await expect(decodeSessionToken({ token: other, secret })).rejects.toThrow();
    // Expired a minute ago: beyond the 15 s clock tolerance.
    const expired = await encode({ token: claims, secret, maxAge: -60 });
    await expect(decode({ token: expired, secret })).rejects.toThrow();
    await expect(decodeSessionToken({ token: expired, secret })).rejects.toThrow();
    await expect(decodeSessionToken({ token: "not.a.token", secret })).rejects.toThrow();
  });

  it("answers null without a token", async () => {
    expect(await decodeSessionToken({ token: undefined, secret })).toBeNull();
  });
});

describe("decodeSessionToken, a token seen before", () => {
  afterEach(() => {
    vi.useRealTimers();
  });

  it("answers the same frozen payload without decrypting again", async () => {
    const token = await encode({ token: claims, secret });
    const first = await decodeSessionToken({ token, secret });
    const again = await decodeSessionToken({ token, secret });
    expect(again).toBe(first);
    expect(Object.isFrozen(again)).toBe(true);
    // Another secret still refuses it: what was decrypted is kept per key.
    await expect(decodeSessionToken({ token, secret: "another secret entirely, also long" })).rejects.toThrow();
  });

  it("refuses it once it has expired, as a fresh decryption would", async () => {
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2026-06-01T12:00:00Z"));
    const token = await encode({ token: claims, secret, maxAge: 60 });
    expect(await decodeSessionToken({ token, secret })).toMatchObject(claims);
    // Within the 15 s clock tolerance past expiry it still reads, as next-auth's decode does...
    vi.setSystemTime(new Date("2026-06-01T12:01:10Z"));
    expect(await decodeSessionToken({ token, secret })).toMatchObject(claims);
    expect(await decode({ token, secret })).toMatchObject(claims);
    // ...and beyond it both refuse it.
    vi.setSystemTime(new Date("2026-06-01T12:01:20Z"));
    await expect(decode({ token, secret })).rejects.toThrow();
    await expect(decodeSessionToken({ token, secret })).rejects.toThrow();
    await expect(decodeSessionToken({ token, secret })).rejects.toThrow();
  });
});

// The reference is what getToken read before: Next's own cookie parser (RequestCookies, the
// registry package's copy) feeding next-auth's session store, which joins chunked tokens.
// next-auth does not export its session store, so it is loaded from its file.
const { SessionStore } = createRequire(import.meta.url)("../../node_modules/next-auth/core/lib/cookie.js") as {
  SessionStore: new (option: { name: string; options: object }, request: { cookies: unknown; headers: object }, logger: Console) => { value: string };
};
function referenceToken(header: string, name: string): string | null {
  const store = new SessionStore({ name, options: {} }, { cookies: new RequestCookies(new Headers({ cookie: header })), headers: {} }, console);
  return store.value || null;
}

describe("sessionTokenFromCookieHeader", () => {
  const name = "next-auth.session-token";
  const headers = [
    "",
    "theme=dark",
    `${name}=abc.def.ghi`,
    `theme=dark; ${name}=abc.def.ghi; other=1`,
    `${name}.1=second; ${name}.0=first; ${name}.2=third`,
    `${name}=%7Bquoted%7D; x=%E0%A4%A`,
    `${name}=bad%E0%A4%A`,
    `${name}=one; ${name}=two`,
    `__Secure-${name}=secure; ${name}=plain`,
    `${name}`,
    `x-${name}=not-it;${name}=tight`,
  ];
  it.each(headers)("reads %j as Next's parser and next-auth's session store do", (header) => {
    expect(sessionTokenFromCookieHeader(header, name)).toBe(referenceToken(header, name));
  });

  it("reads the __Secure- cookie for an https site and the plain one otherwise", () => {
    const header = `__Secure-${name}=secure; ${name}=plain`;
    expect(sessionTokenFromCookieHeader(header, sessionCookieName("https://mooring.example"))).toBe("secure");
    expect(sessionTokenFromCookieHeader(header, sessionCookieName("http://127.0.0.1:3000"))).toBe("plain");
    expect(sessionTokenFromCookieHeader(null, name)).toBeNull();
  });
});
