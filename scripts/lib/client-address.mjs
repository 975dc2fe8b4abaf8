// Who is on the other end of a request, for rate limiting: the socket's peer address, or, behind a
// configured number of trusted proxies, the address the outermost of them saw. The result travels to
// the app in a header of our own that scripts/serve.mjs always overwrites, so a client cannot choose
// it (lib/server/rate-limit.ts reads only that header). Node built-ins only.
import { isIP } from "node:net";

/** The request header that carries the resolved client address into the app. */
export const clientAddressHeader = "x-mooring-client-address";

/** Most proxies a deployment may declare; more is almost certainly a typo. */
const maxTrustedProxies = 10;

/**
 * Reads TRUSTED_PROXY_COUNT: a whole number of proxies between the clients and this server
 * (0 when unset or empty). Throws a readable error for anything else.
 */
export function parseTrustedProxyCount(value) {
  if (value === undefined || value.trim() === "") return 0;
  const count = Number(value);
  if (!Number.isInteger(count) || count < 0 || count > maxTrustedProxies) {
    throw new Error(`TRUSTED_PROXY_COUNT must be a whole number from 0 to ${maxTrustedProxies} (got "${value}")`);
  }
  return count;
}

/**
 * The client address of one request. With no trusted proxies it is the socket's peer. With `n`,
 * the socket's peer is the nearest proxy and each proxy appended the address it saw to
 * X-Forwarded-For, so the client is the n-th entry from the right; anything further left was
 * written by the client and is ignored. A shorter chain than declared uses its leftmost entry.
 * IPv4-mapped IPv6 addresses are written as IPv4, other IPv6 addresses as their /64 network (one
 * subscriber usually holds a whole /64). "unknown" when there is no usable address.
 */
export function resolveClientAddress({ socketAddress, forwardedFor, trustedProxyCount }) {
  const nearest = normalizeAddress(socketAddress);
  if (!trustedProxyCount) return nearest ?? "unknown";
  const forwarded = (Array.isArray(forwardedFor) ? forwardedFor.join(",") : forwardedFor ?? "")
    .split(",")
    .map((entry) => entry.trim())
    .filter(Boolean);
  const hops = [...forwarded, socketAddress ?? ""];
  const picked = hops[Math.max(0, hops.length - 1 - trustedProxyCount)];
  return normalizeAddress(picked) ?? nearest ?? "unknown";
}

/**
 * Replaces every inbound copy of the client-address header of `req` (a node:http IncomingMessage)
 * with the address resolved from its socket and X-Forwarded-For.
 */
export function stampClientAddress(req, trustedProxyCount) {
  const address = resolveClientAddress({
    socketAddress: req.socket?.remoteAddress,
    forwardedFor: req.headers["x-forwarded-for"],
    trustedProxyCount,
  });
  req.headers[clientAddressHeader] = address;
  const raw = [];
  for (let index = 0; index + 1 < req.rawHeaders.length; index += 2) {
    if (req.rawHeaders[index].toLowerCase() !== clientAddressHeader) raw.push(req.rawHeaders[index], req.rawHeaders[index + 1]);
  }
  raw.push(clientAddressHeader, address);
  req.rawHeaders = raw;
  return address;
}

/**
 * Wraps a node:http request listener so that every request reaches it with the resolved client
 * address in its header (scripts/serve.mjs wraps Next's request handler with it).
 */
export function withClientAddress(listener, trustedProxyCount) {
  return (req, res) => {
    stampClientAddress(req, trustedProxyCount);
    return listener(req, res);
  };
}

/** A canonical address, or null for anything that is not an IP address. */
function normalizeAddress(value) {
  if (typeof value !== "string") return null;
  let address = value.trim();
  // "[2001:db8::1]:443" and "203.0.113.9:51000" as some proxies write them.
  const bracketed = address.match(/^\[([^\]]+)\](?::\d+)?$/);
  if (bracketed) address = bracketed[1];
  else if (/^[\d.]+:\d+$/.test(address)) address = address.slice(0, address.lastIndexOf(":"));
  address = address.replace(/%.*$/, "");
  const mapped = address.match(/^::ffff:(\d+\.\d+\.\d+\.\d+)$/i);
  if (mapped) address = mapped[1];
  const version = isIP(address);
  if (version === 4) return address;
  if (version === 6) return address === "::1" ? address : ipv6Network(address);
  return null;
}

/** The /64 network of a valid IPv6 address, e.g. "2001:db8:0:7::/64". */
function ipv6Network(address) {
  const [head, tail] = address.includes("::") ? address.split("::") : [address, undefined];
  const groups = (part) => (part ? part.split(":").flatMap(expandEmbeddedIpv4) : []);
  const left = groups(head);
  const right = groups(tail);
  const full = tail === undefined ? left : [...left, ...Array(8 - left.length - right.length).fill("0"), ...right];
  return `${full.slice(0, 4).map((group) => parseInt(group, 16).toString(16)).join(":")}::/64`;
}

function expandEmbeddedIpv4(group) {
  if (!group.includes(".")) return [group];
  const [a, b, c, d] = group.split(".").map(Number);
  return [((a << 8) | b).toString(16), ((c << 8) | d).toString(16)];
}
