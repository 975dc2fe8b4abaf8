import "server-only";
import type { NextAuthOptions, User } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import type { Actor } from "@/db/queries/actor";
import { endSession, startSession } from "@/db/queries/sessions";
import { consumeSignInLinkToken, verifyPassword } from "@/db/queries/users";
import { getAuthSecret } from "@/lib/server/auth-secret";
import { clientAddress } from "@/lib/server/rate-limit";
import { limitSignInAttempt } from "@/lib/server/sign-in-limit";
import { toDomainError } from "@/lib/errors";
import { signInLinkSchema, signInSchema } from "@/lib/validations/auth";

/**
 * Sessions last 30 days. Each sign-in opens a row in `sessions` whose id the token carries; every
 * request checks that row and re-reads the user's role (lib/server/session.ts), so a session ends
 * at once when it is signed out or revoked.
 */
const sessionMaxAgeSeconds = 30 * 24 * 60 * 60;

/**
 * next-auth v4 options: JWT sessions and two Credentials providers,
 * "password" (e-mail + password with lockout) and "email-link" (a single-use token from an e-mailed link).
 * A thrown Error's message reaches the client as `signIn(...).error`, so messages here are user-facing.
 */
export const authOptions: NextAuthOptions = {
  // A getter, so the environment is read on the first request rather than at import (e.g. during `next build`).
  get secret() {
    return getAuthSecret();
  },
  session: { strategy: "jwt", maxAge: sessionMaxAgeSeconds },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      id: "password",
      name: "E-mail and password",
      credentials: {
        email: { label: "E-mail", type: "email" },
        password: { label: "Password", type: "password" },
      },
      async authorize(credentials, req) {
        const parsed = signInSchema.safeParse(credentials);
        if (!parsed.success) throw new Error(parsed.error.issues[0]?.message ?? "Enter your e-mail and password.");
        const { email, password } = parsed.data;
        // Failed attempts are counted per e-mail and per client address in PostgreSQL (lib/server/sign-in-limit.ts).
        return toUser(
          await authorizeWith(() =>
            limitSignInAttempt(email, clientAddress(req.headers), () => verifyPassword(null, email, password)),
          ),
        );
      },
    }),
    CredentialsProvider({
      id: "email-link",
      name: "E-mail link",
      credentials: { token: { label: "Token", type: "text" } },
      async authorize(credentials) {
        const parsed = signInLinkSchema.safeParse(credentials);
        if (!parsed.success) throw new Error("This link is not valid.");
        return toUser(await authorizeWith(() => consumeSignInLinkToken(null, parsed.data.token)));
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      // `user` is present only right after authorize(); later calls keep what the token holds.
      if (user) {
        token.sid = await startSession(user.id);
        token.id = user.id;
        token.siteRole = user.siteRole;
        token.name = user.name;
        token.email = user.email;
      }
      return token;
    },
    session({ session, token }) {
      if (token.id && token.siteRole) {
        session.user = {
          ...session.user,
          id: token.id,
          siteRole: token.siteRole,
          sessionId: token.sid,
          name: token.name,
          email: token.email,
        };
      }
      return session;
    },
  },
  events: {
    // Signing out ends the session on the server too, so a copied token stops working with it.
    async signOut({ token }) {
      if (token?.id && token.sid) await endSession(token.id, token.sid);
    },
  },
};

/** Runs a DAL check and rethrows expected failures with their user-facing message. */
async function authorizeWith(check: () => Promise<Actor>): Promise<Actor> {
  try {
    return await check();
  } catch (error) {
    const known = toDomainError(error);
    if (known) throw new Error(known.message);
    console.error("Sign-in failed unexpectedly:", error);
    throw new Error("Signing in is not possible right now. Please try again shortly.");
  }
}

function toUser(actor: Actor): User {
  return { id: actor.id, name: actor.name, email: actor.email, siteRole: actor.siteRole };
}
