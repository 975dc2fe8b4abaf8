import { randomUUID } from "node:crypto";
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, afterEach, describe, expect, it, vi } from "vitest";
import { consumeRateLimit, resetRateLimits } from "@/lib/server/rate-limit";
import { signInLimitPerAddress } from "@/lib/server/sign-in-limit";
import {
  clientAddressHeader,
  parseTrustedProxyCount,
  resolveClientAddress,
  withClientAddress,
} from "@/scripts/lib/client-address.mjs";

// Client addresses for rate limits come from the socket, or from a configured number of trusted
// proxies, never from what a client writes into X-Forwarded-For (issue 15, item 1). The servers
// here are node:http servers wrapped the way scripts/serve.mjs wraps Next's request handler.

describe("resolveClientAddress", () => {
  const resolve = (socketAddress: string | undefined, forwardedFor: string | undefined, trustedProxyCount: number) =>
    resolveClientAddress({ socketAddress, forwardedFor, trustedProxyCount });

  it("uses the socket's peer and ignores X-Forwarded-For without trusted proxies", () => {
    expect(resolve("203.0.113.9", "198.51.100.1", 0)).toBe("203.0.113.9");
    // IPv4-mapped IPv6, as Node reports IPv4 clients of a dual-stack socket.
    expect(resolve("::ffff:203.0.113.9", undefined, 0)).toBe("203.0.113.9");
    expect(resolve(undefined, "198.51.100.1", 0)).toBe("unknown");
  });

  it("takes the entry the outermost trusted proxy wrote, whatever the client put in front of it", () => {
    // Each proxy appends the address it saw (common practice; MDN, X-Forwarded-For).
    expect(resolve("10.0.0.1", "198.51.100.66, 203.0.113.9", 1)).toBe("203.0.113.9");
    expect(resolve("10.0.0.2", "198.51.100.66, 203.0.113.9, 10.0.0.1", 2)).toBe("203.0.113.9");
    // Ports and brackets as some proxies write them.
    expect(resolve("10.0.0.1", "203.0.113.9:51000", 1)).toBe("203.0.113.9");
    // A chain shorter than declared: its leftmost entry; nothing usable there: the socket.
    expect(resolve("10.0.0.1", "203.0.113.9", 3)).toBe("203.0.113.9");
    expect(resolve("10.0.0.1", "not an address", 1)).toBe("10.0.0.1");
    expect(resolve("10.0.0.1", undefined, 1)).toBe("10.0.0.1");
  });

  it("counts an IPv6 client by its /64 network, which one subscriber usually holds whole", () => {
    expect(resolve("2001:db8:1:2:aaaa:bbbb:cccc:dddd", undefined, 0)).toBe("2001:db8:1:2::/64");
    expect(resolve("2001:db8:1:2::9", undefined, 0)).toBe("2001:db8:1:2::/64");
    expect(resolve("10.0.0.1", "[2001:db8::7]:443", 1)).toBe("2001:db8:0:0::/64");
    expect(resolve("::1", undefined, 0)).toBe("::1");
  });
});

describe("parseTrustedProxyCount", () => {
  it("reads a small whole number and refuses anything else", () => {
    expect(parseTrustedProxyCount(undefined)).toBe(0);
    expect(parseTrustedProxyCount("")).toBe(0);
    expect(parseTrustedProxyCount("2")).toBe(2);
    for (const bad of ["-1", "1.5", "many", "11"]) expect(() => parseTrustedProxyCount(bad)).toThrow(/TRUSTED_PROXY_COUNT/);
  });
});

const servers: Server[] = [];

/** Starts a server on loopback whose requests go through `withClientAddress` to `listener`. */
async function serve(trustedProxyCount: number, listener: (req: IncomingMessage, res: ServerResponse) => void): Promise<string> {
  const server = createServer(withClientAddress(listener, trustedProxyCount));
  servers.push(server);
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  return `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
}

afterAll(async () => {
  await Promise.all(servers.map((server) => new Promise((resolve) => server.close(resolve))));
});

describe("the app server's client address", () => {
  const echo = (req: IncomingMessage, res: ServerResponse) => {
    res.setHeader("content-type", "application/json");
    res.end(JSON.stringify({ address: req.headers[clientAddressHeader], raw: req.rawHeaders }));
  };

  it("comes from the socket; a client's own X-Forwarded-For and client-address header are replaced", async () => {
    const url = await serve(0, echo);
    const response = await fetch(url, { headers: { "x-forwarded-for": "203.0.113.50", [clientAddressHeader]: "198.51.100.1" } });
    const { address, raw } = (await response.json()) as { address: string; raw: string[] };
    expect(address).toBe("127.0.0.1");
    // Not even the raw header list keeps the client's copy.
    expect(raw.filter((_, index) => index % 2 === 1 && raw[index - 1]?.toLowerCase() === clientAddressHeader)).toEqual(["127.0.0.1"]);
  });

  it("behind one trusted proxy is the address that proxy appended", async () => {
    const url = await serve(1, echo);
    const response = await fetch(url, { headers: { "x-forwarded-for": "198.51.100.66, 203.0.113.9" } });
    expect(((await response.json()) as { address: string }).address).toBe("203.0.113.9");
  });
});

describe("a flood of sign-ins with a fresh X-Forwarded-For each", () => {
  afterEach(async () => {
    vi.useRealTimers();
    await resetRateLimits("sign-in:ip:127.0.0.1");
  });

  it("counts against the one socket address and runs into the per-address limit", async () => {
    const { authOptions } = await import("@/lib/server/auth");
    type Authorize = (credentials: Record<string, string>, req: { headers: Record<string, unknown> }) => Promise<unknown>;
    const provider = (authOptions.providers as unknown as { options: { id?: string; authorize: Authorize } }[]).find(
      (candidate) => candidate.options.id === "password",
    );
    if (!provider) throw new Error("lib/server/auth.ts has no password provider");
    // What next-auth does with a sign-in POST: authorize() with the request's headers as a plain object.
    const url = await serve(0, (req, res) => {
      let body = "";
      req.on("data", (chunk: Buffer) => (body += chunk.toString()));
      req.on("end", () => {
        const credentials = JSON.parse(body) as Record<string, string>;
        provider.options.authorize(credentials, { headers: { ...req.headers } }).then(
          () => res.end("signed in"),
          (error: Error) => res.end(error.message),
        );
      });
    });
    // Windows are fixed slices of the clock: keep the whole flood inside one (only Date is faked).
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2030-01-01T00:00:01Z"));
    // The flood so far, without paying a bcrypt check for each: all but three of the window's failures.
    for (let i = 0; i < signInLimitPerAddress.limit - 3; i += 1) await consumeRateLimit("sign-in:ip:127.0.0.1", signInLimitPerAddress);

    const answers: string[] = [];
    for (let i = 0; i < 6; i += 1) {
      const response = await fetch(url, {
        method: "POST",
        headers: { "x-forwarded-for": `203.0.113.${i + 1}`, "content-type": "application/json" },
        body: JSON.stringify({ email: `nobody-${randomUUID()}@test.mooring`, password: "guess" }),
      });
      answers.push(await response.text());
    }
    expect(answers.slice(0, 3)).toEqual(Array(3).fill("Wrong e-mail or password."));
    for (const answer of answers.slice(3)) expect(answer).toMatch(/^Too many failed sign-ins from your network/);
  });
});
