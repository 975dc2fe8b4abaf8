import type { Metadata } from "next";
import { NewConfigurationForm } from "@/components/designer/new-configuration-form";
import { PageContainer } from "@/components/layout/page-container";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { listWritableGroups } from "@/lib/server/configuration-pages";
import { requireUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "New configuration" };

export default async function NewConfigurationPage({ searchParams }: { searchParams: Promise<{ group?: string }> }) {
  const user = await requireUser("/configurations/new");
  const [{ group }, groups] = await Promise.all([searchParams, listWritableGroups(user)]);
  return (
    <PageContainer className="grid gap-6">
      <PageHeader title="New configuration" description="Pick where it lives and which string theory it uses; you place the stacks in the designer." />
      {groups.length === 0 ? (
        <EmptyState title="No space to write in" description="You need to be an editor or owner of a group to create configurations there." />
      ) : (
        <NewConfigurationForm groups={groups} defaultGroupId={group} />
      )}
    </PageContainer>
  );
}
