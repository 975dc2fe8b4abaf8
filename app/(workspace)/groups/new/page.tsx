import type { Metadata } from "next";
import { CreateGroupForm } from "@/components/collaboration/create-group-form";
import { PageContainer } from "@/components/layout/page-container";
import { Card, CardContent } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { requireUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "New group" };

export default async function NewGroupPage() {
  await requireUser("/groups/new");
  return (
    <PageContainer className="grid max-w-2xl gap-6">
      <PageHeader title="New group" description="A research group shares configurations among collaborators; a lab publishes starters for students to fork." />
      <Card>
        <CardContent className="pt-5">
          <CreateGroupForm />
        </CardContent>
      </Card>
    </PageContainer>
  );
}
