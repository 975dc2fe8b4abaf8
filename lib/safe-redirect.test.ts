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
