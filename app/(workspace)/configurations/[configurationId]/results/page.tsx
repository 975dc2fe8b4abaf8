import type { Metadata } from "next";
import { getResultHead } from "@/db/queries/result-reads";
import { getRevisionOfConfiguration, listRevisions } from "@/db/queries/revisions";
import { ConfigurationCollaboration } from "@/components/collaboration/configuration-collaboration";
import { ResultsView } from "@/components/results/results-view";
import { EmptyState } from "@/components/ui/empty-state";
import { ButtonLink } from "@/components/ui/button";
import { getConfigurationOrNotFound, listWritableGroups } from "@/lib/server/configuration-pages";
import { toJson } from "@/lib/client/api-client";
import { requireUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Results" };

interface ResultsPageProps {
  params: Promise<{ configurationId: string }>;
  searchParams: Promise<{ revision?: string }>;
}

export default async function ConfigurationResultsPage({ params, searchParams }: ResultsPageProps) {
  const [{ configurationId }, { revision: revisionParam }] = await Promise.all([params, searchParams]);
  const user = await requireUser(`/configurations/${configurationId}/results`);
  const [configuration, revisions, writableGroups] = await Promise.all([
    getConfigurationOrNotFound(user, configurationId),
    listRevisions(user, configurationId),
    listWritableGroups(user),
  ]);
  const revision = revisions.find((r) => r.id === revisionParam) ?? revisions.find((r) => r.isCurrent) ?? revisions[0];
  if (!revision || !revision.hasResult) {
    return (
      <div className="mx-auto max-w-xl px-4 py-12">
        <EmptyState
          title="No stored result yet"
          description="Save the configuration in the designer; the server computes and stores the spectrum of every revision."
          action={<ButtonLink href={`/configurations/${configurationId}`}>Open the designer</ButtonLink>}
        />
      </div>
    );
  }
  // The head only: further sectors and each sector's levels load on demand.
  const [result, revisionDocument] = await Promise.all([
    getResultHead(user, configurationId, revision.id),
    getRevisionOfConfiguration(user, configurationId, revision.id),
  ]);
  return (
    <>
      <ResultsView
        key={revision.id}
        configuration={toJson(configuration)}
        revisions={toJson(revisions)}
        revision={toJson(revision)}
        initialResult={toJson(result)}
        writableGroups={writableGroups}
        document={revisionDocument.document}
      />
      <div className="mx-auto w-full max-w-7xl px-4 pb-10 sm:px-6">
        <ConfigurationCollaboration
          configurationId={configuration.id}
          canEdit={configuration.canEdit}
          revisionId={revision.id}
          revisionNumber={revision.number}
        />
      </div>
    </>
  );
}
