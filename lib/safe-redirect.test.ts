import { describe, expect, it } from "vitest";
import { toCallbackQuery, toSafeCallbackPath } from "@/lib/safe-redirect";

describe("toSafeCallbackPath", () => {
  it("keeps a same-site path with its query", () => {
    expect(toSafeCallbackPath("/groups/brane-engineering?tab=members")).toBe("/groups/brane-engineering?tab=members");
  });

  it("takes the first value of a repeated parameter", () => {
    expect(toSafeCallbackPath(["/account", "/admin"])).toBe("/account");
  });

  describe("edge cases", () => {
    it("falls back when nothing is given", () => {
      expect(toSafeCallbackPath(undefined)).toBe("/dashboard");
      expect(toSafeCallbackPath("", "/")).toBe("/");
    });

    it("refuses absolute and protocol-relative addresses", () => {
      expect(toSafeCallbackPath("https://elsewhere.example/x")).toBe("/dashboard");
      expect(toSafeCallbackPath("//elsewhere.example/x")).toBe("/dashboard");
      expect(toSafeCallbackPath("/\\elsewhere.example")).toBe("/dashboard");
      expect(toSafeCallbackPath("javascript:alert(1)")).toBe("/dashboard");
    });

    it("refuses paths that a browser or URL parser turns into another host", () => {
      // WHATWG URL (common practice): tab, CR and LF are removed and "\\" counts as "/" in http(s) URLs.
      expect(toSafeCallbackPath("/\t/evil.example")).toBe("/dashboard");
      expect(toSafeCallbackPath("/\n/evil.example")).toBe("/dashboard");
      expect(toSafeCallbackPath("/\r\n/evil.example")).toBe("/dashboard");
      expect(toSafeCallbackPath("/\t\\evil.example")).toBe("/dashboard");
      // Dot segments that collapse into a protocol-relative path.
      expect(toSafeCallbackPath("/.//evil.example")).toBe("/dashboard");
      expect(toSafeCallbackPath("/a/../..//evil.example")).toBe("/dashboard");
      expect(toSafeCallbackPath("/./%2e%2e//evil.example")).toBe("/dashboard");
    });

    it("refuses every control character, which would otherwise break the redirect header", () => {
      for (const code of [0, 1, 9, 10, 13, 27, 31, 127, 128, 133, 159]) {
        expect(toSafeCallbackPath(`/account${String.fromCharCode(code)}x`)).toBe("/dashboard");
      }
    });

    it("keeps percent-encoded text as it is, without decoding it into control characters", () => {
      expect(toSafeCallbackPath("/groups/a%0Ab")).toBe("/groups/a%0Ab");
      expect(toSafeCallbackPath("/%2F/evil.example")).toBe("/%2F/evil.example");
    });

    it("returns the resolved path, so what the browser opens is what was checked", () => {
      expect(toSafeCallbackPath("/groups/../account")).toBe("/account");
      expect(toSafeCallbackPath("/a b")).toBe("/a%20b");
      expect(toSafeCallbackPath("/results#sector-2")).toBe("/results#sector-2");
    });
  });
});

describe("toCallbackQuery", () => {
  it("encodes a path to come back to", () => {
    expect(toCallbackQuery("/invitations/abc?x=1")).toBe("?callbackUrl=%2Finvitations%2Fabc%3Fx%3D1");
  });

  it("is empty for the default destination", () => {
    expect(toCallbackQuery("/dashboard")).toBe("");
  });
});
