import { describe, expect, it } from "vitest";
import { checkCrossSiteRequest, crossSiteRejection } from "./csrf";

const app = "http://127.0.0.1:3000";

function request(method: string, headers: Record<string, string>, url = `${app}/api/configurations`): Request {
  return new Request(url, { method, headers });
}

describe("checkCrossSiteRequest", () => {
  it("lets safe methods through whatever their origin", () => {
    for (const method of ["GET", "HEAD", "OPTIONS"]) {
      expect(checkCrossSiteRequest(request(method, { "sec-fetch-site": "cross-site", origin: "https://evil.example" }))).toEqual({ ok: true });
    }
  });

  it("refuses state-changing requests a browser marks as cross-site or same-site", () => {
    for (const method of ["POST", "PUT", "PATCH", "DELETE"]) {
      expect(checkCrossSiteRequest(request(method, { "sec-fetch-site": "cross-site" })).ok).toBe(false);
    }
    // A sibling subdomain is "same-site" but not this origin.
    expect(checkCrossSiteRequest(request("POST", { "sec-fetch-site": "same-site" }))).toEqual({
      ok: false,
      reason: 'Sec-Fetch-Site is "same-site"',
    });
  });

  it("accepts same-origin requests from the app's pages", () => {
    expect(checkCrossSiteRequest(request("POST", { "sec-fetch-site": "same-origin", origin: app }))).toEqual({ ok: true });
    expect(checkCrossSiteRequest(request("DELETE", { origin: app }))).toEqual({ ok: true });
  });

  it("compares Origin with the request's own origin and the configured public origins", () => {
    expect(checkCrossSiteRequest(request("POST", { origin: "https://evil.example" })).ok).toBe(false);
    expect(checkCrossSiteRequest(request("POST", { origin: "null" })).ok).toBe(false);
    // Behind a proxy the request URL is internal; NEXTAUTH_URL names the public origin (a path is ignored).
    const behindProxy = request("POST", { origin: "https://mooring.example.org" }, "http://10.0.0.5:3000/api/spectrum");
    expect(checkCrossSiteRequest(behindProxy).ok).toBe(false);
    expect(checkCrossSiteRequest(behindProxy, ["https://mooring.example.org/app"])).toEqual({ ok: true });
    // A different port is a different origin.
    expect(checkCrossSiteRequest(request("POST", { origin: "http://127.0.0.1:3001" })).ok).toBe(false);
    // The Host header names the address the browser used, even when the URL was rewritten.
    const rewritten = request("POST", { origin: app, host: "127.0.0.1:3000" }, "http://localhost:3000/api/spectrum");
    expect(checkCrossSiteRequest(rewritten)).toEqual({ ok: true });
    expect(checkCrossSiteRequest(request("POST", { origin: "https://evil.example", host: "127.0.0.1:3000" })).ok).toBe(false);
  });

  it("lets requests without browser headers through (scripts and load tests carry no ambient cookies)", () => {
    expect(checkCrossSiteRequest(request("POST", {}))).toEqual({ ok: true });
  });

  it("treats a user-typed navigation (Sec-Fetch-Site none) as same-origin but still checks Origin", () => {
    expect(checkCrossSiteRequest(request("POST", { "sec-fetch-site": "none" }))).toEqual({ ok: true });
    expect(checkCrossSiteRequest(request("POST", { "sec-fetch-site": "none", origin: "https://evil.example" })).ok).toBe(false);
  });
});

describe("crossSiteRejection", () => {
  it("answers 403 in the API's error shape", async () => {
    const response = crossSiteRejection();
    expect(response.status).toBe(403);
    expect(await response.json()).toEqual({ error: "cross_site_request", message: expect.stringContaining("another site") });
  });
});
