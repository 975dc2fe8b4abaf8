// Drives next-auth's real handler (lib/server/auth.ts options) in its API-route form, as a browser
// would: CSRF token first, then the credentials callback or sign-out. For integration tests of
// session cookies and session revocation.
import NextAuth from "next-auth";
import { authOptions } from "@/lib/server/auth";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";

/** One Set-Cookie header, parsed. */
export interface SetCookie {
  name: string;
  value: string;
  /** Attribute names in lower case (httponly, secure, samesite, path, ...) with their values. */
  attributes: Map<string, string>;
}

export function parseSetCookie(header: string): SetCookie {
  const [pair = "", ...attributes] = header.split(";").map((part) => part.trim());
  const cut = pair.indexOf("=");
  return {
    name: pair.slice(0, cut),
    value: pair.slice(cut + 1),
    attributes: new Map(
      attributes.map((attribute) => {
        const [key = "", value = ""] = attribute.split("=");
        return [key.toLowerCase(), value];
      }),
    ),
  };
}

/** Calls next-auth's handler for `action` (e.g. ["callback", "password"]) and returns the cookies it set and its body. */
export async function callNextAuth(
  action: string[],
  method: string,
  cookies: Record<string, string>,
  body: Record<string, string> = {},
): Promise<{ setCookies: SetCookie[]; body: unknown }> {
  const host = new URL(process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3000").host;
  const headers = new Map<string, string | string[]>();
  let sent: unknown;
  const res = {
    status: () => res,
    setHeader: (key: string, value: string | string[]) => {
      headers.set(key.toLowerCase(), value);
      return res;
    },
    getHeader: (key: string) => headers.get(key.toLowerCase()),
    send: (value: unknown) => {
      sent = value;
    },
    json: (value: unknown) => {
      sent = value;
    },
    end: () => undefined,
  };
  const req = {
    method,
    query: { nextauth: action },
    // One documentation address (RFC 5737) stands in for the client, as scripts/serve.mjs would set it.
    headers: { host, [clientAddressHeader]: "192.0.2.44" },
    cookies,
    body,
  };
  await (NextAuth as unknown as (req: unknown, res: unknown, options: typeof authOptions) => Promise<void>)(req, res, authOptions);
  const raw = headers.get("set-cookie") ?? [];
  return { setCookies: (Array.isArray(raw) ? raw : [raw]).map(parseSetCookie), body: sent };
}

/** The cookies a browser would send back (values URL-decoded, as next-auth expects them). */
export function cookieJar(cookies: SetCookie[]): Record<string, string> {
  return Object.fromEntries(cookies.filter((c) => c.value !== "").map((c) => [c.name, decodeURIComponent(c.value)]));
}

/** Signs in with the password provider (CSRF token first, as a browser does) and returns every cookie set. */
export async function signInCookies(email: string, password: string): Promise<SetCookie[]> {
  const csrf = await callNextAuth(["csrf"], "GET", {});
  const token = (csrf.body as { csrfToken: string }).csrfToken;
  const callback = await callNextAuth(["callback", "password"], "POST", cookieJar(csrf.setCookies), {
    email,
    password,
    csrfToken: token,
    json: "true",
  });
  return [...csrf.setCookies, ...callback.setCookies];
}

/** Signs out the browser holding `cookies` through next-auth's sign-out route (CSRF token and all). */
export async function signOutWith(cookies: SetCookie[]): Promise<void> {
  const jar = cookieJar(cookies);
  const csrf = await callNextAuth(["csrf"], "GET", jar);
  const token = (csrf.body as { csrfToken: string }).csrfToken;
  await callNextAuth(["signout"], "POST", { ...jar, ...cookieJar(csrf.setCookies) }, { csrfToken: token, json: "true" });
}
