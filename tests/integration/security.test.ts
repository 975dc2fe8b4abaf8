import { execFileSync } from "node:child_process";
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import fc from "fast-check";
import { afterEach, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { bcryptCost } from "@/db/queries/users";
import { users } from "@/db/schema";
import { authOptions } from "@/lib/server/auth";
import { checkCrossSiteRequest } from "@/lib/server/csrf";
import { config as proxyConfig, proxy } from "@/proxy";
import { createTestUser } from "@/tests/fixtures/users";
import { signInCookies } from "@/tests/support/next-auth";

const root = path.resolve(import.meta.dirname, "..", "..");

describe("CSRF protection in proxy.ts", () => {
  const app = "http://127.0.0.1:3000";
  const call = (pathname: string, method: string, headers: Record<string, string>) =>
    proxy(new NextRequest(`${app}${pathname}`, { method, headers }));

  it("refuses cross-site state-changing requests to every /api route with 403", async () => {
    for (const [pathname, method] of [
      ["/api/configurations", "POST"],
      ["/api/configurations/00000000-0000-4000-8000-000000000000", "PUT"],
      ["/api/configurations/00000000-0000-4000-8000-000000000000", "DELETE"],
      ["/api/groups/00000000-0000-4000-8000-000000000000/members/x", "PATCH"],
      ["/api/spectrum", "POST"],
    ] as const) {
      const forged = await call(pathname, method, { origin: "https://evil.example", "sec-fetch-site": "cross-site" });
      expect(forged.status).toBe(403);
      expect(((await forged.json()) as { error: string }).error).toBe("cross_site_request");
      // An older browser that sends Origin but no Sec-Fetch-Site is refused too.
      expect((await call(pathname, method, { origin: "https://evil.example" })).status).toBe(403);
    }
  });

  it("refuses a cross-site server action with 403, on any page, and lets a same-origin one through", async () => {
    for (const pathname of ["/sign-up", "/account", "/groups/some-group"]) {
      const forged = await call(pathname, "POST", { "next-action": "7f00aa", origin: "https://evil.example", "sec-fetch-site": "cross-site" });
      expect(forged.status).toBe(403);
      expect(((await forged.json()) as { error: string }).error).toBe("cross_site_request");
      expect((await call(pathname, "POST", { "next-action": "7f00aa", origin: "https://evil.example" })).status).toBe(403);
      const own = await call(pathname, "POST", { "next-action": "7f00aa", origin: app, "sec-fetch-site": "same-origin" });
      expect(own.headers.get("x-middleware-next")).toBe("1");
    }
  });

  it("passes same-origin mutations, reads from anywhere, and next-auth's own routes on to the handlers", async () => {
    const passes = (response: Response) => response.headers.get("x-middleware-next") === "1";
    expect(passes(await call("/api/configurations", "POST", { origin: app, "sec-fetch-site": "same-origin" }))).toBe(true);
    expect(passes(await call("/api/configurations", "GET", { origin: "https://evil.example", "sec-fetch-site": "cross-site" }))).toBe(true);
    // next-auth checks its own double-submit CSRF token on /api/auth/*.
    expect(passes(await call("/api/auth/callback/password", "POST", { origin: "https://evil.example" }))).toBe(true);
  });
});

describe("which /api requests reach the CSRF check (proxy.ts matcher)", () => {
  const app = "http://127.0.0.1:3000";
  let doesMatch: typeof import("next/experimental/testing/server").unstable_doesMiddlewareMatch;
  beforeAll(async () => {
    // Loaded only once the proxy tests above have run: imported earlier, Next's testing helper makes
    // NextResponse there fail with "AsyncLocalStorage accessed in runtime where it is not available".
    doesMatch = (await import("next/experimental/testing/server")).unstable_doesMiddlewareMatch;
  });
  const matches = (pathname: string, headers: Record<string, string>) =>
    doesMatch({ config: proxyConfig, url: `${app}${pathname}`, headers });

  it("runs the check for requests that may come from another site", () => {
    expect(matches("/api/configurations", { "sec-fetch-site": "cross-site", origin: "https://evil.example" })).toBe(true);
    expect(matches("/api/configurations", { "sec-fetch-site": "same-site" })).toBe(true);
    expect(matches("/api/configurations", { "sec-fetch-site": "none", origin: "https://evil.example" })).toBe(true);
    expect(matches("/api/spectrum", { origin: "https://evil.example" })).toBe(true);
    expect(matches("/api/spectrum", { origin: "null" })).toBe(true);
  });

  it("runs the check for server actions on every page", () => {
    expect(matches("/sign-up", { "next-action": "7f00aa", origin: "https://evil.example" })).toBe(true);
    expect(matches("/", { "next-action": "7f00aa" })).toBe(true);
    expect(matches("/sign-up", {})).toBe(false);
  });

  it("skips the app's own requests and clients without browser headers", () => {
    expect(matches("/api/configurations", { "sec-fetch-site": "same-origin", origin: app })).toBe(false);
    expect(matches("/api/spectrum", {})).toBe(false);
  });

  it("skips only requests that lib/server/csrf.ts would let through, whatever the method (fast-check)", () => {
    const headerValue = (choices: string[]) =>
      fc.option(fc.oneof(fc.constantFrom(...choices), fc.string({ maxLength: 12 })), { nil: undefined });
    fc.assert(
      fc.property(
        fc.constantFrom("GET", "POST", "PUT", "PATCH", "DELETE"),
        headerValue(["same-origin", "none", "same-site", "cross-site", "Same-Origin", "same-origin ", ""]),
        headerValue([app, "https://evil.example", "null", "http://localhost:3000", ""]),
        (method, site, origin) => {
          const headers: Record<string, string> = {};
          if (site !== undefined) headers["sec-fetch-site"] = site;
          if (origin !== undefined) headers.origin = origin;
          if (matches("/api/configurations", headers)) return;
          // A request with an empty Origin or Sec-Fetch-Site counts as lacking it here; browsers never send one.
          const sent = Object.fromEntries(Object.entries(headers).filter(([, value]) => value !== ""));
          const verdict = checkCrossSiteRequest(new Request(`${app}/api/configurations`, { method, headers: sent }));
          expect(verdict).toEqual({ ok: true });
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe("session cookies (next-auth, lib/server/auth.ts)", () => {
  const originalUrl = process.env.NEXTAUTH_URL;
  afterEach(() => {
    process.env.NEXTAUTH_URL = originalUrl;
  });

  it("are httpOnly and SameSite=Lax, and the session is a JWT naming its session row", async () => {
    process.env.NEXTAUTH_URL = "http://127.0.0.1:3000";
    const user = await createTestUser({ label: "cookie", password: "correct horse battery" });
    const cookies = await signInCookies(user.actor.email, "correct horse battery");
    const session = cookies.find((c) => c.name === "next-auth.session-token");
    expect(session).toBeDefined();
    // A JWE: five dot-separated base64url parts (header, key, iv, ciphertext, tag).
    expect(session?.value.split(".")).toHaveLength(5);
    expect(authOptions.session?.strategy).toBe("jwt");
    for (const cookie of cookies) {
      expect(cookie.attributes.has("httponly")).toBe(true);
      expect(cookie.attributes.get("samesite")?.toLowerCase()).toBe("lax");
      expect(cookie.attributes.has("secure")).toBe(false);
    }
  });

  it("are Secure (with __Secure-/__Host- names) when NEXTAUTH_URL is https", async () => {
    process.env.NEXTAUTH_URL = "https://mooring.example.org";
    const user = await createTestUser({ label: "secure", password: "correct horse battery" });
    const cookies = await signInCookies(user.actor.email, "correct horse battery");
    expect(cookies.map((c) => c.name)).toEqual(
      expect.arrayContaining(["__Host-next-auth.csrf-token", "__Secure-next-auth.session-token"]),
    );
    for (const cookie of cookies) {
      expect(cookie.attributes.has("secure")).toBe(true);
      expect(cookie.attributes.has("httponly")).toBe(true);
      expect(cookie.attributes.get("samesite")?.toLowerCase()).toBe("lax");
      expect(cookie.name).toMatch(/^__(Secure|Host)-/);
    }
  });
});

describe("password hashes", () => {
  it("are bcrypt with cost 12 or more, as stored", async () => {
    expect(bcryptCost).toBeGreaterThanOrEqual(12);
    const user = await createTestUser({ label: "hash", password: "correct horse battery" });
    const [row] = await db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, user.actor.id));
    // Modular crypt format: $2a$ / $2b$ / $2y$, two-digit cost, 53 characters of salt and hash.
    const match = row?.hash?.match(/^\$2[aby]\$(\d{2})\$[./A-Za-z0-9]{53}$/);
    expect(match).not.toBeNull();
    expect(Number(match?.[1])).toBeGreaterThanOrEqual(12);
    expect(row?.hash).not.toContain("correct horse battery");
  });
});

/** The files git tracks (or, outside a checkout, every file but dependencies and build output). */
function repositoryFiles(): string[] {
  try {
    return execFileSync("git", ["ls-files", "-z"], { cwd: root, encoding: "utf8" }).split("\0").filter(Boolean);
  } catch {
    const found: string[] = [];
    const walk = (dir: string) => {
      for (const entry of readdirSync(path.join(root, dir), { withFileTypes: true })) {
        const relative = path.join(dir, entry.name);
        if (entry.isDirectory()) {
          if (!/^(node_modules|\.next.*|\.data|\.git|test-results|playwright-report)$/.test(entry.name)) walk(relative);
        } else found.push(relative);
      }
    };
    walk("");
    return found;
  }
}

/** Text of a tracked file, or null for binary and large files. */
function readText(file: string): string | null {
  const full = path.join(root, file);
  try {
    if (statSync(full).size > 2_000_000) return null;
    const bytes = readFileSync(full);
    return bytes.includes(0) ? null : bytes.toString("utf8");
  } catch {
    return null;
  }
}

describe("the repository", () => {
  const files = repositoryFiles();

  it("tracks no private key, access token, hard-coded NEXTAUTH_SECRET or .env file", () => {
    const rules: [string, RegExp][] = [
      ["private key", /-----BEGIN [A-Z ]*PRIVATE KEY-----/],
      ["NEXTAUTH_SECRET value", /NEXTAUTH_SECRET\s*[=:]\s*["'`]?[A-Za-z0-9+/_=-]{12,}/],
      ["AWS access key", /AKIA[0-9A-Z]{16}/],
      ["GitHub token", /gh[pousr]_[A-Za-z0-9]{36}/],
      ["Slack token", /xox[abprs]-[A-Za-z0-9-]{10,}/],
      ["live payment key", /sk_live_[A-Za-z0-9]{16,}/],
      // The local development role (mooring:mooring) and documentation placeholders are not secrets.
      ["password in a URL", /\b(?:postgres(?:ql)?|smtps?|mysql|redis):\/\/(?!mooring:mooring@|user:password@)[^\s:/@"'`]+:[^\s@"'`$]{6,}@/],
    ];
    const findings: string[] = [];
    for (const file of files) {
      if (/(^|\/)\.env(\.|$)/.test(file) && !file.endsWith(".example")) findings.push(`${file}: an .env file is tracked`);
      const text = readText(file);
      if (text === null) continue;
      for (const [what, pattern] of rules) {
        if (pattern.test(text)) findings.push(`${file}: ${what}`);
      }
    }
    expect(findings).toEqual([]);
    expect(files.length).toBeGreaterThan(50);
  });

  it("sends all SQL through Drizzle's parameters: no sql.raw or string-built queries in runtime code", () => {
    const runtime = files.filter((file) => /^(db\/queries|app|lib)\/.*\.tsx?$/.test(file) && !/\.test\.tsx?$/.test(file));
    const rules: [string, RegExp][] = [
      ["sql.raw", /\bsql\.raw\s*\(/],
      ["sql.identifier", /\bsql\.identifier\s*\(/],
      ["query built from a template string", /\.query\s*\(\s*`[^`]*\$\{/],
      ["query built by concatenation", /\.(query|execute)\s*\(\s*["'`][^"'`]*["'`]\s*\+/],
    ];
    const findings: string[] = [];
    for (const file of runtime) {
      const text = readText(file) ?? "";
      for (const [what, pattern] of rules) {
        if (pattern.test(text)) findings.push(`${file}: ${what}`);
      }
    }
    expect(findings).toEqual([]);
    // The scan did look at the data-access layer.
    expect(runtime.filter((file) => file.startsWith("db/queries/")).length).toBeGreaterThan(5);
  });
});
