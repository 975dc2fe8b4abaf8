import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { RevisionDiffView } from "@/components/collaboration/revision-diff-view";
import { ConfigurationSide } from "@/components/configurations/configuration-side";
import { PageContainer } from "@/components/layout/page-container";
import { Alert } from "@/components/ui/alert";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import type { Actor } from "@/db/queries/actor";
import type { ConfigurationDto, ConfigurationSummaryDto } from "@/db/queries/configuration-dtos";
import { getConfiguration } from "@/db/queries/configurations";
import { listForksOfConfiguration } from "@/db/queries/forks";
import { getResultForRevision } from "@/db/queries/result-reads";
import { computeSpectrum } from "@/lib/boundary";
import type { SpectrumResult } from "@/lib/boundary/types";
import { ForbiddenError, NotFoundError } from "@/lib/errors";
import { bothSidesStacks, diffConfigurations, diffSpectra, type ConfigurationDiff } from "@/lib/revisions/diff";
import { requireUser } from "@/lib/server/session";
import { BackLink } from "@/components/layout/back-link";

export const metadata: Metadata = { title: "Compare" };

interface ComparePageProps {
  params: Promise<{ configurationId: string }>;
  searchParams: Promise<{ with?: string }>;
}

/**
 * Two configurations side by side (a fork and its source, a student's fork and the starter), with
 * what differs between them. The other one is `?with=<id>`, else this one's source.
 */
export default async function ComparePage({ params, searchParams }: ComparePageProps) {
  const { configurationId } = await params;
  const query = await searchParams;
  const actor = await requireUser(`/configurations/${configurationId}/compare`);
  const configuration = await getConfiguration(actor, configurationId).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  const otherId = query.with ?? configuration.forkedFrom?.configurationId ?? null;
  const other = otherId ? await readable(actor, otherId) : null;
  const forks = configuration.canEdit ? (await listForksOfConfiguration(actor, configurationId, { limit: 50 })).items : [];

  const back = (
    <BackLink href={`/configurations/${configurationId}`}>{configuration.title}</BackLink>
  );
  const choices = <CompareChoices configuration={configuration} forks={forks} current={other?.id ?? null} />;

  if (!other) {
    return (
      <PageContainer className="grid gap-6">
        <PageHeader eyebrow={back} title="Compare" description="Put this configuration beside its source or one of its forks." />
        {otherId ? <Alert variant="warning">The other configuration does not exist, or you cannot read it.</Alert> : null}
        {choices}
      </PageContainer>
    );
  }

  // The older side reads first: the source before the fork, a starter before a student's fork.
  const otherIsSource = other.id === configuration.forkedFrom?.configurationId || other.forkedFromConfigurationId !== configuration.id;
  const [before, after] = otherIsSource ? [other, configuration] : [configuration, other];
  const [beforeResult, afterResult] = await Promise.all([resultOf(actor, before), resultOf(actor, after)]);
  const documentDiff = diffConfigurations(before.document, after.document);
  const labels = { before: sideRole(before, after, configuration.id), after: sideRole(after, before, configuration.id) };

  return (
    <PageContainer className="grid gap-6">
      <PageHeader eyebrow={back} title={`Compare “${after.title}” with “${before.title}”`} description="Side by side, then what differs. Both at their current versions." />
      <div className="grid gap-4 lg:grid-cols-2">
        <ConfigurationSide {...sideProps(before, beforeResult, labels.before, differingStacks(documentDiff, "before"))} />
        <ConfigurationSide {...sideProps(after, afterResult, labels.after, differingStacks(documentDiff, "after"))} />
      </div>
      <Card aria-labelledby="compare-differences-title">
        <CardHeader>
          <CardTitle id="compare-differences-title">What differs</CardTitle>
          <CardDescription>From {labels.before.toLowerCase()} to {labels.after.toLowerCase()}.</CardDescription>
        </CardHeader>
        <CardContent>
          <RevisionDiffView
            fromNumber={before.version}
            toNumber={after.version}
            sideLabels={{ from: labels.before.toLowerCase(), to: labels.after.toLowerCase() }}
            configurationDiff={documentDiff}
            spectrumDiff={diffSpectra(beforeResult, afterResult)}
            stacks={bothSidesStacks(before.document, after.document)}
          />
        </CardContent>
      </Card>
      {choices}
    </PageContainer>
  );
}

async function readable(actor: Actor, id: string): Promise<ConfigurationDto | null> {
  try {
    return await getConfiguration(actor, id);
  } catch (error) {
    if (error instanceof NotFoundError || error instanceof ForbiddenError) return null;
    throw error;
  }
}

/** The stored result of the current revision; the same engine in this process when none is stored yet. */
async function resultOf(actor: Actor, configuration: ConfigurationDto): Promise<SpectrumResult> {
  if (configuration.currentRevision) {
    try {
      return (await getResultForRevision(actor, configuration.currentRevision.id)).result;
    } catch (error) {
      if (!(error instanceof NotFoundError)) throw error;
    }
  }
  return computeSpectrum(configuration.document);
}

function sideRole(side: ConfigurationDto, other: ConfigurationDto, thisId: string): string {
  if (side.forkedFromConfigurationId === other.id) return "The fork";
  if (other.forkedFromConfigurationId === side.id) return side.isStarter ? "The starter" : "The source";
  return side.id === thisId ? "This configuration" : "The other configuration";
}

function sideProps(configuration: ConfigurationDto, result: SpectrumResult, role: string, differing: Map<string, "changed" | "only here">) {
  return {
    role,
    id: configuration.id,
    title: configuration.title,
    version: configuration.version,
    spaceName: configuration.group.kind === "personal" ? "a personal space" : configuration.group.name,
    authorName: configuration.author.name,
    document: configuration.document,
    result,
    differing,
  };
}

function differingStacks(diff: ConfigurationDiff, side: "before" | "after"): Map<string, "changed" | "only here"> {
  const marks = new Map<string, "changed" | "only here">();
  for (const change of diff.changed) marks.set(change.id, "changed");
  for (const stack of side === "before" ? diff.removed : diff.added) marks.set(stack.id, "only here");
  return marks;
}

function CompareChoices({ configuration, forks, current }: { configuration: ConfigurationDto; forks: ConfigurationSummaryDto[]; current: string | null }) {
  const source = configuration.forkedFrom?.title ? configuration.forkedFrom : null;
  if (!source && forks.length === 0) {
    return <p className="text-sm text-muted-foreground">This configuration is not a fork and has no forks to compare with.</p>;
  }
  return (
    <Card aria-labelledby="compare-choices-title">
      <CardHeader>
        <CardTitle id="compare-choices-title">Compare with</CardTitle>
      </CardHeader>
      <CardContent>
        <ul className="grid gap-1 text-sm">
          {source ? (
            <li>
              <Link href={`/configurations/${configuration.id}/compare?with=${source.configurationId}`} aria-current={current === source.configurationId ? "page" : undefined} className="text-accent hover:underline">
                The source, {source.title}
              </Link>
            </li>
          ) : null}
          {forks.map((fork) => (
            <li key={fork.id}>
              <Link href={`/configurations/${configuration.id}/compare?with=${fork.id}`} aria-current={current === fork.id ? "page" : undefined} className="text-accent hover:underline">
                The fork {fork.title}
              </Link>{" "}
              <span className="text-muted-foreground">by {fork.author.name}</span>
            </li>
          ))}
        </ul>
      </CardContent>
    </Card>
  );
}
