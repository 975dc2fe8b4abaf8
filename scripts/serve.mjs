#!/usr/bin/env node
// Serves the production build (`.next`, or NEXT_DIST_DIR) through Next's custom-server API, so that
// the client address the rate limits key on comes from the socket (or from TRUSTED_PROXY_COUNT hops
// of X-Forwarded-For behind proxies) instead of whatever X-Forwarded-For a client sends: `next start`
// keeps a client's own X-Forwarded-For. Every request gets the resolved address in the
// x-mooring-client-address header, replacing any copy the client sent.
//
//   node scripts/serve.mjs [-H 127.0.0.1] [-p 3000]      (NODE_ENV=production is implied)
import { createServer } from "node:http";
import { fileURLToPath } from "node:url";
import { parseArgs } from "node:util";
import { parseTrustedProxyCount, withClientAddress } from "./lib/client-address.mjs";

const repoRoot = fileURLToPath(new URL("..", import.meta.url));

const { values } = parseArgs({
  options: {
    hostname: { type: "string", short: "H", default: "127.0.0.1" },
    port: { type: "string", short: "p", default: process.env.PORT || "3000" },
  },
});
const port = Number(values.port);
if (!Number.isInteger(port) || port < 1 || port > 65535) {
  console.error(`[serve] not a port: ${values.port}`);
  process.exit(2);
}
let trustedProxyCount;
try {
  trustedProxyCount = parseTrustedProxyCount(process.env.TRUSTED_PROXY_COUNT);
} catch (error) {
  console.error(`[serve] ${error.message}`);
  process.exit(2);
}
process.env.NODE_ENV = "production";

// Imported only now: Next reads NODE_ENV when it loads.
const { default: next } = await import("next");
const app = next({ dev: false, dir: repoRoot, hostname: values.hostname, port });
await app.prepare();
const handle = app.getRequestHandler();

const server = createServer(
  withClientAddress((req, res) => {
    handle(req, res).catch((error) => {
      console.error("[serve] request failed:", error);
      if (!res.headersSent) res.writeHead(500, { "content-type": "text/plain; charset=utf-8" });
      res.end("Internal server error");
    });
  }, trustedProxyCount),
);

// Idle keep-alive connections are closed after 65 s rather than Node's 5 s: a client (a browser, a
// script, a load balancer with the usual 60 s idle timeout) that reuses a connection just as the server
// closes it meets ECONNRESET, and the longer wait makes that race rare. Headers must come sooner than
// that wait ends, as Node requires.
server.keepAliveTimeout = 65_000;
server.headersTimeout = 66_000;

server.listen(port, values.hostname, () => {
  const proxies = trustedProxyCount === 0 ? "no trusted proxies" : `${trustedProxyCount} trusted ${trustedProxyCount === 1 ? "proxy" : "proxies"}`;
  console.log(`[serve] Mooring on http://${values.hostname}:${port} (${proxies})`);
});

let closing = false;
for (const signal of ["SIGINT", "SIGTERM"]) {
  process.on(signal, () => {
    if (closing) return;
    closing = true;
    // Finish the requests in flight, then stop; a stuck connection does not hold the exit forever.
    server.close(() => process.exit(0));
    server.closeIdleConnections();
    setTimeout(() => process.exit(0), 5_000).unref();
  });
}
