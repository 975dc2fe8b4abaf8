import type { ReactNode } from "react";
import { getConfigurationOrNotFound } from "@/lib/server/configuration-pages";
import { requireUser } from "@/lib/server/session";

/**
 * Every page of a configuration checks access here, outside the pages' loading boundary, so a
 * missing configuration answers HTTP 404 and a hidden one 403 before anything streams (a check
 * inside the boundary could only swap the content of a 200). Each page and the DAL check again.
 */
export default async function ConfigurationLayout({ children, params }: { children: ReactNode; params: Promise<{ configurationId: string }> }) {
  const { configurationId } = await params;
  const user = await requireUser(`/configurations/${configurationId}`);
  await getConfigurationOrNotFound(user, configurationId);
  return children;
}
