import { z } from "zod";

/*
 * The one zod import of the validation schemas. In the browser, zod runs "jitless": its compiled
 * object parsers are built with `new Function`, and it probes for that with a caught
 * `new Function("")`, which the content security policy (no 'unsafe-eval', see
 * lib/server/security-headers.ts) blocks and reports. Setting it here, where the schemas get zod,
 * means every page that parses with zod has it set, and pages that do not never load zod. The
 * server, which has no CSP, keeps the faster compiled parsers.
 */
if (typeof window !== "undefined") z.config({ jitless: true });

export { z };
