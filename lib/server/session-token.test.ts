import { decode, encode } from "next-auth/jwt";
import { describe, expect, it } from "vitest";
import { decodeSessionToken } from "./session-token";

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
