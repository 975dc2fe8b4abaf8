import { describe, expect, it } from "vitest";
import { createSecureToken, hashSecureToken } from "./secure-token";

describe("createSecureToken", () => {
  it("returns 43 base64url characters (32 bytes, RFC 4648 section 5, no padding)", () => {
    const token = createSecureToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(token, "base64url").length).toBe(32);
  });

  it("returns a different token each time", () => {
    const tokens = new Set(Array.from({ length: 50 }, () => createSecureToken()));
    expect(tokens.size).toBe(50);
  });
});

describe("hashSecureToken", () => {
  it("is SHA-256 in hex (FIPS 180-2 appendix B.1 test vector for 'abc')", () => {
    expect(hashSecureToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });
});
