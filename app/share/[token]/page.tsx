import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SharedConfigurationView } from "@/components/collaboration/shared-configuration-view";
import { PageContainer } from "@/components/layout/page-container";
import { Badge } from "@/components/ui/badge";
import { PageHeader } from "@/components/ui/page-header";
import { getSharedConfiguration } from "@/db/queries/share-links";
import { NotFoundError } from "@/lib/errors";
import { formatDateTime } from "@/lib/format-date";
import { shareTokenSchema } from "@/lib/validations/share-link";

export const metadata: Metadata = { title: "Shared configuration", robots: { index: false, follow: false } };

interface SharePageProps {
  params: Promise<{ token: string }>;
}

/** Read-only view through a share link; no sign-in needed. Unknown or revoked links are a 404. */
export default async function SharePage({ params }: SharePageProps) {
  const { token } = await params;
  if (!shareTokenSchema.safeParse(token).success) notFound();
  const shared = await getSharedConfiguration(token).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        eyebrow={
          <span className="inline-flex items-center gap-2">
            Shared from {shared.groupName} <Badge variant="outline">read-only</Badge>
          </span>
        }
        title={shared.title}
        description={`${shared.description ? `${shared.description} · ` : ""}Revision ${shared.revisionNumber}, last changed ${formatDateTime(shared.updatedAt)}.`}
      />
      <SharedConfigurationView shared={shared} />
    </PageContainer>
  );
}
