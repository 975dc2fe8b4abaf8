import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PageContainer } from "@/components/layout/page-container";
import { SweepView } from "@/components/sweeps/sweep-view";
import { PageHeader } from "@/components/ui/page-header";
import { getSweep } from "@/db/queries/sweeps";
import { toJson } from "@/lib/client/api-client";
import { NotFoundError } from "@/lib/errors";
import { listWritableGroups } from "@/lib/server/configuration-pages";
import { requireUser } from "@/lib/server/session";
import { dimensionLabel } from "@/lib/sweeps";
import { BackLink } from "@/components/layout/back-link";

export const metadata: Metadata = { title: "Sweep" };

export default async function SweepPage({ params }: { params: Promise<{ configurationId: string; sweepId: string }> }) {
  const { configurationId, sweepId } = await params;
  const actor = await requireUser(`/configurations/${configurationId}/sweeps/${sweepId}`);
  const [sweep, groups] = await Promise.all([getSweep(actor, sweepId), listWritableGroups(actor)]).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  if (sweep.configurationId !== configurationId) notFound();
  const personal = groups.find((group) => group.kind === "personal") ?? null;
  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        eyebrow={
          <BackLink href={`/configurations/${configurationId}/sweeps`}>Sweeps of {sweep.configurationTitle}</BackLink>
        }
        title={sweep.title || `Sweep over ${sweep.definition.dimensions.map(dimensionLabel).join("; ")}`}
      />
      <SweepView initial={toJson(sweep)} personalGroupId={personal?.id ?? null} />
    </PageContainer>
  );
}
