import type { Metadata } from "next";
import { PageContainer } from "@/components/layout/page-container";
import { SweepDefinitionForm } from "@/components/sweeps/sweep-definition-form";
import { SweepList } from "@/components/sweeps/sweep-list";
import { Alert } from "@/components/ui/alert";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { listSweeps } from "@/db/queries/sweeps";
import { toJson } from "@/lib/client/api-client";
import { getConfigurationOrNotFound } from "@/lib/server/configuration-pages";
import { requireUser } from "@/lib/server/session";
import { BackLink } from "@/components/layout/back-link";

export const metadata: Metadata = { title: "Sweeps" };

export default async function SweepsPage({ params }: { params: Promise<{ configurationId: string }> }) {
  const { configurationId } = await params;
  const actor = await requireUser(`/configurations/${configurationId}/sweeps`);
  const configuration = await getConfigurationOrNotFound(actor, configurationId);
  const sweeps = await listSweeps(actor, configurationId);
  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        eyebrow={
          <BackLink href={`/configurations/${configurationId}`}>{configuration.title}</BackLink>
        }
        title="Sweeps"
        description="Vary the saved revision over boundary choices, positions, counts, orientations and compact radii; every combination is one point, computed by the workers."
      />
      <Card aria-labelledby="sweeps-title">
        <CardHeader>
          <CardTitle id="sweeps-title">Sweeps of this configuration</CardTitle>
        </CardHeader>
        <CardContent>
          <SweepList configurationId={configurationId} initial={toJson(sweeps)} />
        </CardContent>
      </Card>
      <Card aria-labelledby="new-sweep-title">
        <CardHeader>
          <CardTitle id="new-sweep-title">New sweep</CardTitle>
          <CardDescription>
            Of revision {configuration.currentRevision?.number ?? 1}, as saved; unsaved changes in the designer are not included.
          </CardDescription>
        </CardHeader>
        <CardContent>
          {configuration.canEdit ? (
            <SweepDefinitionForm
              configurationId={configurationId}
              base={configuration.document}
              isStarter={configuration.isStarter}
              suggested={toJson(sweeps.suggested)}
            />
          ) : (
            <Alert variant="info">You can view this configuration&apos;s sweeps but not start one. Fork it into your own space to sweep it.</Alert>
          )}
        </CardContent>
      </Card>
    </PageContainer>
  );
}
