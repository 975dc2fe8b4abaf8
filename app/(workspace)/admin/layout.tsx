import type { ReactNode } from "react";
import { notFound } from "next/navigation";
import { isSiteAdmin } from "@/db/queries/actor";
import { requireUser } from "@/lib/server/session";

/**
 * Admin pages answer 404 to everyone but site admins, so the area does not announce itself.
 * Checked here, outside the loading boundary, so the status code is a real 404; each page and
 * the DAL check again.
 */
export default async function AdminLayout({ children }: { children: ReactNode }) {
  const user = await requireUser("/admin");
  if (!isSiteAdmin(user)) notFound();
  return children;
}
