import { getEnv } from "@/lib/server/env";

// Only for `next dev` and tests without a configured secret; production refuses to run without one.
const developmentSecret = "mooring-development-secret-not-for-production";

/** The secret that signs and encrypts session tokens (NEXTAUTH_SECRET). Throws in production when unset. */
export function getAuthSecret(): string {
  const env = getEnv();
  if (env.NEXTAUTH_SECRET) return env.NEXTAUTH_SECRET;
  if (env.NODE_ENV === "production") throw new Error("NEXTAUTH_SECRET must be set in production.");
  return developmentSecret;
}
