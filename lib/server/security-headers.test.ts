import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, securityHeaders } from "./security-headers";

/** The CSP as a map from directive to its sources. */
function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy.split(";").map((part) => {
      const [name = "", ...sources] = part.trim().split(/\s+/);
      return [name, sources];
    }),
  );
}

describe("contentSecurityPolicy", () => {
  const production = directives(contentSecurityPolicy({ development: false, https: false }));

  it("allows only this origin by default, no plugins, no framing, no foreign form targets", () => {
    expect(production.get("default-src")).toEqual(["'self'"]);
    expect(production.get("object-src")).toEqual(["'none'"]);
    expect(production.get("frame-ancestors")).toEqual(["'none'"]);
    expect(production.get("form-action")).toEqual(["'self'"]);
    expect(production.get("base-uri")).toEqual(["'self'"]);
    expect(production.get("connect-src")).toEqual(["'self'"]);
  });

  it("never allows eval in production, and loads no script from another origin", () => {
    expect(production.get("script-src")).toEqual(["'self'", "'unsafe-inline'"]);
  });

  it("allows what KaTeX, Konva and the PNG export need: inline styles, data: and blob: images", () => {
    expect(production.get("style-src")).toContain("'unsafe-inline'");
    expect(production.get("img-src")).toEqual(["'self'", "data:", "blob:"]);
    expect(production.get("font-src")).toContain("'self'");
  });

  it("adds eval and the hot-reload socket under next dev only", () => {
    const development = directives(contentSecurityPolicy({ development: true, https: false }));
    expect(development.get("script-src")).toContain("'unsafe-eval'");
    expect(development.get("connect-src")).toEqual(["'self'", "ws:", "wss:"]);
  });

  it("upgrades insecure requests only when the site is served over https", () => {
    expect(production.has("upgrade-insecure-requests")).toBe(false);
    expect(directives(contentSecurityPolicy({ development: false, https: true })).has("upgrade-insecure-requests")).toBe(true);
  });
});

describe("securityHeaders", () => {
  it("sends nosniff, frame denial, a referrer policy and the CSP; HSTS only over https", () => {
    const plain = new Map(securityHeaders({ development: false, https: false }).map((h) => [h.key, h.value]));
    expect(plain.get("X-Content-Type-Options")).toBe("nosniff");
    expect(plain.get("X-Frame-Options")).toBe("DENY");
    expect(plain.get("Referrer-Policy")).toBe("strict-origin-when-cross-origin");
    expect(plain.get("Content-Security-Policy")).toContain("default-src 'self'");
    expect(plain.has("Strict-Transport-Security")).toBe(false);
    const secure = new Map(securityHeaders({ development: false, https: true }).map((h) => [h.key, h.value]));
    expect(secure.get("Strict-Transport-Security")).toMatch(/^max-age=\d{7,}/);
  });
});
