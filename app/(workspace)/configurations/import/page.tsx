import type { Metadata } from "next";
import { ImportConfigurationForm } from "@/components/collaboration/import-configuration-form";
import { PageContainer } from "@/components/layout/page-container";
import { Card, CardContent } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { roleAtLeast } from "@/db/queries/actor";
import { listGroupsForUser } from "@/db/queries/groups";
import { requireUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Import a configuration" };

interface ImportPageProps {
  searchParams: Promise<{ group?: string }>;
}

export default async function ImportPage({ searchParams }: ImportPageProps) {
  const { group } = await searchParams;
  const actor = await requireUser("/configurations/import");
  const groups = (await listGroupsForUser(actor)).filter((candidate) => roleAtLeast(candidate.role, "editor"));
  const spaces = groups.map((candidate) => ({
    id: candidate.id,
    name: candidate.kind === "personal" ? "My space" : candidate.name,
  }));
  const initialGroupId = spaces.find((space) => space.id === group)?.id ?? spaces[0]?.id ?? "";
  return (
    <PageContainer className="grid max-w-3xl gap-6">
      <PageHeader
        title="Import a configuration"
        description="Upload a Mooring configuration file (JSON, format 1 or 2, up to 256 kB). Every problem is listed with its place in the file; nothing is saved from an invalid file."
      />
      <Card>
        <CardContent className="pt-5">
          <ImportConfigurationForm spaces={spaces} initialGroupId={initialGroupId} />
        </CardContent>
      </Card>
    </PageContainer>
  );
}
