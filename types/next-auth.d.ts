import type { DefaultSession } from "next-auth";
import type { SiteRole } from "@/db/schema";

declare module "next-auth" {
  interface Session {
    user: DefaultSession["user"] & { id: string; siteRole: SiteRole; sessionId?: string };
  }

  interface User {
    siteRole: SiteRole;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    id?: string;
    siteRole?: SiteRole;
    /** The `sessions` row this token belongs to. */
    sid?: string;
  }
}
