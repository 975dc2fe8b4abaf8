import { z } from "zod";

/*
 * In the browser, zod runs "jitless". Its compiled object parsers are built with `new Function`,
 * and it probes for that with a caught `new Function("")`; the content security policy (no
 * 'unsafe-eval', see lib/server/security-headers.ts) blocks the probe and reports a violation for it.
 * Jitless mode skips the probe. The server, which has no CSP, keeps the faster compiled parsers.
 * Imported once for its effect by app/providers.tsx, the root client component.
 */
if (typeof window !== "undefined") z.config({ jitless: true });
