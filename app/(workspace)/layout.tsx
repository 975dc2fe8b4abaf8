import type { ReactNode } from "react";
import { requireUser } from "@/lib/server/session";

/** The signed-in area. The proxy already redirects visitors; this re-checks on the server. */
export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  await requireUser();
  return <div className="flex flex-1 flex-col">{children}</div>;
}
