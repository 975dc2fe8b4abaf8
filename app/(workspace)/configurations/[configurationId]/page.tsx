import type { Metadata } from "next";
import { DesignerWorkspace } from "@/components/designer/designer-workspace";
import { getConfigurationOrNotFound, listWritableGroups } from "@/lib/server/configuration-pages";
import { toJson } from "@/lib/client/api-client";
import { requireUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Designer" };

export default async function ConfigurationDesignerPage({ params }: { params: Promise<{ configurationId: string }> }) {
  const { configurationId } = await params;
  const user = await requireUser(`/configurations/${configurationId}`);
  const [configuration, writableGroups] = await Promise.all([
    getConfigurationOrNotFound(user, configurationId),
    listWritableGroups(user),
  ]);
  return <DesignerWorkspace key={configuration.id} initial={toJson(configuration)} writableGroups={writableGroups} />;
}
