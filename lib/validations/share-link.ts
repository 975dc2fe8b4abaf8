import { z } from "./zod";

/** A share token as it appears in `/share/[token]`: 32 random bytes in base64url (43 characters). */
export const shareTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, "Not a share link.");
